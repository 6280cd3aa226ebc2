import { parse, type Submission } from "@conform-to/dom";
import type { SignOffFields, SignOffInput } from "./sign-off-schema";

// The phone's own check of a sign-off before it is sent: only what a machinist can fix at once (an empty or
// garbled box, an overlong note), in the server's words, without loading the schema library onto the phone.
// The server checks everything again with signOffSchema (sign-off-schema.ts) and answers beside the box.

const NOTE_LIMIT = 2000;

function typedFigure(raw: unknown): string {
  return typeof raw === "string" ? raw.trim().replace(",", ".") : "";
}

/** Conform's submission for the sign-off form: errors by field name, or the value to send. */
export function checkSignOff(formData: FormData): Submission<SignOffFields, string[], SignOffInput> {
  return parse(formData, {
    resolve(value) {
      const error: Record<string, string[]> = {};
      const readings = Array.isArray(value.readings) ? (value.readings as { value?: unknown }[]) : [];
      readings.forEach((reading, index) => {
        const text = typedFigure(reading?.value);
        if (text === "") error[`readings[${index}].value`] = ["Enter the measured value."];
        else if (!Number.isFinite(Number(text))) error[`readings[${index}].value`] = ["The measured value must be a number."];
      });
      const note = typeof value.note === "string" ? value.note.trim() : "";
      if (note.length > NOTE_LIMIT) error.note = [`Keep the note under ${NOTE_LIMIT} characters.`];
      // The value is only a preview: the server parses the submission itself.
      return Object.keys(error).length ? { error } : { value: value as unknown as SignOffInput };
    },
  });
}
