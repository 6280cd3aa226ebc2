// The address a sign-in comes from, for throttling. X-Forwarded-For is written by whoever sends the request,
// so it is believed only when the operator says how many reverse proxies stand in front (TRUSTED_PROXY):
// each appends the address it saw, so the client is that many entries from the end. Without a proxy Next's
// route handlers cannot see the socket's address, and the throttle keys on the account alone.

export const UNKNOWN_ADDRESS = "unknown";

export function clientAddress(headers: Record<string, unknown> | Headers | undefined, trustedProxies: number): string {
  if (!headers || trustedProxies < 1) return UNKNOWN_ADDRESS;
  const raw = headers instanceof Headers ? headers.get("x-forwarded-for") : headers["x-forwarded-for"];
  const forwarded = Array.isArray(raw) ? raw.join(",") : raw;
  if (typeof forwarded !== "string") return UNKNOWN_ADDRESS;
  const hops = forwarded.split(",").map((part) => part.trim()).filter(Boolean);
  const address = hops[hops.length - trustedProxies];
  return address && /^[0-9a-fA-F:.]{2,45}$/.test(address) ? address : UNKNOWN_ADDRESS;
}
