// Cross-site request refusal for state-changing requests (a CSRF defence of the API's own, beside the
// cookie's SameSite=Lax). Browsers send Origin on every POST, PUT, PATCH and DELETE, and current ones also
// Sec-Fetch-Site; a request with neither comes from a tool (curl, a script), which holds no victim's cookie.

const STATE_CHANGING = new Set(["POST", "PUT", "PATCH", "DELETE"]);

export function isStateChanging(method: string): boolean {
  return STATE_CHANGING.has(method.toUpperCase());
}

/**
 * True when a state-changing request may go on: its Origin is the app's own (from the configured base URL),
 * or the browser says it is same-origin, or it carries neither header (not a browser). A same-site page on
 * another host ("same-site", another Origin) and a sandboxed one (Origin "null") are refused.
 */
export function isSameOriginRequest(headers: Headers, appBaseUrl: string): boolean {
  const origin = headers.get("origin");
  const fetchSite = headers.get("sec-fetch-site");
  if (fetchSite !== null && fetchSite.toLowerCase() === "same-origin") return true;
  if (origin !== null) return origin === new URL(appBaseUrl).origin;
  return fetchSite === null;
}
