// Where to send someone after sign-in: only a path on this site. Browsers read "/\evil" and "/\tevil" as
// "//evil" (another host), so any backslash or control character, raw or percent-encoded (once or more),
// refuses the value.

const FALLBACK = "/";

/**
 * The path to return to, or "/" when `value` could leave the site. Absolute URLs on the app's own origin are
 * reduced to their path; everything else must start with exactly one "/".
 */
export function safeCallbackPath(value: unknown, appBaseUrl: string): string {
  const raw = Array.isArray(value) ? value[0] : value;
  if (typeof raw !== "string" || raw.length === 0 || raw.length > 2048) return FALLBACK;
  let candidate = raw;
  const own = new URL(appBaseUrl).origin;
  if (!candidate.startsWith("/")) {
    // next-auth hands over absolute URLs; only our own origin is kept.
    if (!candidate.startsWith(`${own}/`) && candidate !== own) return FALLBACK;
    candidate = candidate.slice(own.length) || "/";
  }
  if (!isPlainPath(candidate)) return FALLBACK;
  // Check every decoding, so "%2F%5C" or "%252F" cannot turn into "//" or "/\" later.
  let decoded = candidate;
  for (let round = 0; round < 4; round++) {
    let next: string;
    try {
      next = decodeURIComponent(decoded);
    } catch {
      return FALLBACK;
    }
    if (!isPlainPath(next)) return FALLBACK;
    if (next === decoded) break;
    decoded = next;
  }
  // The URL parser is what the browser will use: it must stay on our origin.
  const resolved = new URL(candidate, own);
  if (resolved.origin !== own) return FALLBACK;
  return candidate;
}

const UNSAFE = /[\\\u0000-\u001f\u007f-\u009f\u2028\u2029]/;

function isPlainPath(path: string): boolean {
  return path.startsWith("/") && !path.startsWith("//") && !UNSAFE.test(path);
}
