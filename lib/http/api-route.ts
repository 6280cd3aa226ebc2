import "server-only";
import { NextResponse } from "next/server";
import type { z } from "zod";
import type { UserRole } from "@/db/schema";
import { checkRole, type SessionUser } from "@/lib/auth/session";
import { getEnv } from "@/lib/server/env";
import { RequestRefusal, type UnprocessableCode } from "@/db/refusal";
import { DATABASE_RETRY_AFTER_S, DATABASE_UNAVAILABLE_MESSAGE, isDatabaseUnavailable } from "@/db/faults";
import { BodyTooLarge, readLimitedForm, readLimitedText } from "@/lib/http/body-limit";
import { CONTROL_CHARACTER_MESSAGE, findControlCharacter, findControlCharacterInForm } from "@/lib/http/control-characters";
import { isSameOriginRequest, isStateChanging } from "@/lib/http/same-origin";
import { applySecurityHeaders, securityHeaders } from "@/lib/http/security-headers";
import { log } from "@/lib/server/log";

export type ApiErrorCode =
  | "invalid_input"
  | "unauthenticated"
  | "forbidden"
  | "not_found"
  | "conflict"
  | "unsupported_media_type"
  | "payload_too_large"
  | "internal"
  | "unavailable"
  | UnprocessableCode;

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

function controlCharacterRefusal(field: string) {
  return apiError(400, "invalid_input", `${field}: ${CONTROL_CHARACTER_MESSAGE}`, { field });
}

/** Maps a refusal from the shared work to its JSON answer; anything else is logged (redacted) and hidden. */
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
  if (error instanceof BodyTooLarge) {
    return apiError(413, "payload_too_large", `(body): the request may be at most ${sizeText(error.limitBytes)}`, { field: "(body)" });
  }
  if (isDatabaseUnavailable(error)) {
    // Not a fault of the request or the code: the caller tries again once the database is back.
    log.warn({ err: error }, "route handler: database not answering");
    const response = apiError(503, "unavailable", DATABASE_UNAVAILABLE_MESSAGE);
    response.headers.set("retry-after", String(DATABASE_RETRY_AFTER_S));
    return response;
  }
  log.error({ err: error }, "route handler failed");
  return apiError(500, "internal", "Something went wrong on the server.");
}

function sizeText(bytes: number): string {
  return bytes >= 1024 * 1024 ? `${Math.round((bytes / 1024 / 1024) * 10) / 10} MB` : `${Math.ceil(bytes / 1024)} kB`;
}

// ---------------------------------------------------------------------------------------------------------
// The one way into a route handler.

/** JSON bodies larger than this are refused (413); the largest real one, a job with its blocks, is a few kB. */
export const MAX_JSON_BYTES = 256 * 1024;

type Roles = readonly UserRole[] | "public";
type Output<S> = S extends z.ZodType ? z.output<S> : undefined;

export interface RouteSpec<R extends Roles, P, Q, B> {
  /** Who may call: roles checked first (401 anonymous, 403 wrong role); "public" for shop-free reference data. */
  roles: R;
  /** The dynamic segments, e.g. z.object({ id: z.uuid() }). */
  params?: P;
  /** The query string, as an object of strings. */
  query?: Q;
  /** A JSON body (application/json only, else 415). */
  body?: B;
  /** A multipart body instead (multipart/form-data only, else 415), read within this many bytes (else 413). */
  multipart?: { maxBytes: number; field: string };
}

export interface RouteInput<R extends Roles, P, Q, B> {
  request: Request;
  user: R extends "public" ? null : SessionUser;
  params: Output<P>;
  query: Output<Q>;
  body: Output<B>;
  form: FormData | undefined;
}

type RouteContext = { params: Promise<Record<string, string>> };

function mediaType(request: Request): string {
  return (request.headers.get("content-type") ?? "").split(";")[0]!.trim().toLowerCase();
}

async function parseWith(schema: z.ZodType | undefined, value: unknown): Promise<{ ok: true; value: unknown } | { ok: false; response: Response }> {
  if (!schema) return { ok: true, value: undefined };
  const field = findControlCharacter(value);
  if (field) return { ok: false, response: controlCharacterRefusal(field) };
  const parsed = await schema.safeParseAsync(value);
  return parsed.success ? { ok: true, value: parsed.data } : { ok: false, response: invalidInput(parsed.error) };
}

/**
 * Wraps a route handler so that every one runs in the same order: a cross-site state change is refused
 * (403), the caller is authenticated and authorized (401/403), the body's type is checked (415), params,
 * query and body are parsed (400 naming the field, control characters included), then the work runs.
 * The work loads what it needs and answers 404 for anything the caller may not see. Refusals it throws
 * (RequestRefusal) become their JSON answer; a database that is not answering is 503 with Retry-After; any
 * other error is logged redacted and answered 500 without details. Every answer carries the security headers.
 */
export function apiRoute<R extends Roles, P extends z.ZodType | undefined = undefined, Q extends z.ZodType | undefined = undefined, B extends z.ZodType | undefined = undefined>(
  spec: RouteSpec<R, P, Q, B>,
  work: (input: RouteInput<R, P, Q, B>) => Promise<Response>,
): (request: Request, context?: RouteContext) => Promise<Response> {
  return async function handle(request, context) {
    let response: Response;
    try {
      response = await run(spec, work, request, context);
    } catch (error) {
      response = refusalResponse(error);
    }
    applySecurityHeaders(response.headers, securityHeaders("api"));
    return response;
  };
}

async function run<R extends Roles, P, Q, B>(
  spec: RouteSpec<R, P, Q, B>,
  work: (input: RouteInput<R, P, Q, B>) => Promise<Response>,
  request: Request,
  context: RouteContext | undefined,
): Promise<Response> {
  if (isStateChanging(request.method) && !isSameOriginRequest(request.headers, getEnv().APP_BASE_URL)) {
    return apiError(403, "forbidden", "Cross-site requests may not change anything.");
  }
  let user: SessionUser | null = null;
  if (spec.roles !== "public") {
    const access = await checkRole(spec.roles);
    if (!access.ok) return apiError(access.status, access.status === 401 ? "unauthenticated" : "forbidden", access.message);
    user = access.user;
  }
  if (spec.body && mediaType(request) !== "application/json") {
    return apiError(415, "unsupported_media_type", "(body): send the body as application/json", { field: "(body)" });
  }
  if (spec.multipart && mediaType(request) !== "multipart/form-data") {
    return apiError(415, "unsupported_media_type", "(body): send the body as multipart/form-data", { field: "(body)" });
  }
  const params = await parseWith(spec.params as z.ZodType | undefined, context ? await context.params : {});
  if (!params.ok) return params.response;
  const query = await parseWith(spec.query as z.ZodType | undefined, Object.fromEntries(new URL(request.url).searchParams));
  if (!query.ok) return query.response;
  let body: { ok: true; value: unknown } | { ok: false; response: Response } = { ok: true, value: undefined };
  if (spec.body) {
    const text = await readLimitedText(request, MAX_JSON_BYTES);
    let json: unknown;
    try {
      json = JSON.parse(text);
    } catch {
      return apiError(400, "invalid_input", "(body): the request body is not valid JSON", { field: "(body)" });
    }
    body = await parseWith(spec.body as unknown as z.ZodType, json);
    if (!body.ok) return body.response;
  }
  let form: FormData | undefined;
  if (spec.multipart) {
    try {
      form = await readLimitedForm(request, spec.multipart.maxBytes);
    } catch (error) {
      if (error instanceof BodyTooLarge) {
        const { field } = spec.multipart;
        return apiError(413, "payload_too_large", `${field}: uploads may be at most ${sizeText(error.limitBytes)}`, { field });
      }
      return apiError(400, "invalid_input", "(body): the multipart body could not be read", { field: "(body)" });
    }
    const field = findControlCharacterInForm(form);
    if (field) return controlCharacterRefusal(field);
  }
  return work({
    request,
    user: user as RouteInput<R, P, Q, B>["user"],
    params: params.value as Output<P>,
    query: query.value as Output<Q>,
    body: body.value as Output<B>,
    form,
  });
}

/**
 * A public calculator endpoint: the JSON body is parsed with the calculator form's own schema (400 naming the
 * field), then its computation runs; a refusal it raises answers with its status and code.
 */
export function calculatorRoute<Schema extends z.ZodType, Result>(schema: Schema, compute: (input: z.output<Schema>) => Result) {
  return apiRoute({ roles: "public", body: schema }, async ({ body }) => NextResponse.json(compute(body as z.output<Schema>)));
}
