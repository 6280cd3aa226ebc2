import "server-only";
import { NextResponse } from "next/server";
import type { z } from "zod";
import { RequestRefusal, type UnprocessableCode } from "@/lib/errors";

export type ApiErrorCode = "invalid_input" | "unauthenticated" | "forbidden" | "not_found" | "conflict" | "internal" | UnprocessableCode;

export interface ApiError {
  error: {
    code: ApiErrorCode;
    message: string;
    field?: string;
    issues?: { field: string; message: string }[];
    warnings?: readonly { code: string; level: string; message: string }[];
  };
}

export function apiError(status: number, code: ApiErrorCode, message: string, extra: Partial<ApiError["error"]> = {}) {
  return NextResponse.json<ApiError>({ error: { code, message, ...extra } }, { status });
}

/** A 400 that names the first offending field, with every issue listed. */
export function invalidInput(error: z.ZodError) {
  const issues = error.issues.map((issue) => ({
    field: issue.path.length ? issue.path.map(String).join(".") : "(body)",
    message: issue.message,
  }));
  const first = issues[0] ?? { field: "(body)", message: "Invalid input" };
  return apiError(400, "invalid_input", `${first.field}: ${first.message}`, { field: first.field, issues });
}

export type ParsedJson = { ok: true; value: unknown } | { ok: false; response: NextResponse };

export async function readJson(request: Request): Promise<ParsedJson> {
  try {
    return { ok: true, value: await request.json() };
  } catch {
    return { ok: false, response: apiError(400, "invalid_input", "(body): the request body is not valid JSON", { field: "(body)" }) };
  }
}

/** Maps a refusal from the shared work to its JSON answer; anything else is logged and hidden. */
export function refusalResponse(error: unknown) {
  if (error instanceof RequestRefusal) {
    const code: ApiErrorCode =
      error.detail.code !== undefined
        ? error.detail.code
        : error.status === 404 ? "not_found" : error.status === 409 ? "conflict" : error.status === 403 ? "forbidden" : "invalid_input";
    return apiError(error.status, code, error.field ? `${error.field}: ${error.message}` : error.message, {
      field: error.field,
      ...(error.detail.warnings ? { warnings: error.detail.warnings } : {}),
    });
  }
  console.error(error);
  return apiError(500, "internal", "Something went wrong on the server.");
}

/**
 * A public calculator endpoint: the JSON body is parsed with the calculator form's own schema (400 naming the
 * field), then its computation runs; a refusal it raises answers with its status and code, anything else 500.
 */
export function calculatorRoute<Schema extends z.ZodType, Result>(schema: Schema, compute: (input: z.output<Schema>) => Result) {
  return async function POST(request: Request): Promise<NextResponse> {
    const json = await readJson(request);
    if (!json.ok) return json.response;
    const parsed = schema.safeParse(json.value);
    if (!parsed.success) return invalidInput(parsed.error);
    try {
      return NextResponse.json(compute(parsed.data));
    } catch (error) {
      return refusalResponse(error);
    }
  };
}
