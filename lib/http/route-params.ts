import { z } from "zod";

/** Parses a route's [id] segment as a uuid; the error names the segment. */
export function parseIdParam(id: string, name = "id"): { ok: true; id: string } | { ok: false; error: z.ZodError } {
  const parsed = z.uuid({ error: `${name} must be an id` }).safeParse(id);
  if (parsed.success) return { ok: true, id: parsed.data };
  return { ok: false, error: new z.ZodError(parsed.error.issues.map((issue) => ({ ...issue, path: [name] }))) };
}

/** The zod shape of a route's id segments, e.g. idParams("blockId"): each must be a uuid, named in the error. */
export function idParams<const N extends string>(...names: N[]) {
  return z.object(Object.fromEntries(names.map((name) => [name, z.uuid({ error: `${name} must be an id` })])) as Record<N, z.ZodUUID>);
}
