import { z } from "zod";

const CONTROL = /[\u0000-\u0008\u000b\u000c\u000e-\u001f\u007f]/;

/**
 * Text typed into a form or sent as JSON: trimmed, within its length, and without control characters
 * (PostgreSQL refuses NUL; the others hide text). Line breaks and tabs are kept only in `multiline` fields.
 */
export function formText(label: string, bound: { min?: number; max: number; multiline?: boolean }) {
  const { min = 0, max, multiline = false } = bound;
  let schema = z.string({ error: `Enter the ${label}.` }).refine((v) => !CONTROL.test(v) && (multiline || !/[\t\n\r]/.test(v)), {
    error: `The ${label} must not contain control characters${multiline ? "" : " or line breaks"}.`,
  });
  if (min > 0) schema = schema.refine((v) => v.trim().length >= min, { error: min === 1 ? `Enter the ${label}.` : `The ${label} must be at least ${min} characters.` });
  return schema.refine((v) => v.trim().length <= max, { error: `Keep the ${label} under ${max} characters.` }).transform((v) => v.trim());
}
