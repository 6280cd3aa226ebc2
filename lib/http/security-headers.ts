// The response headers every answer carries, pages and API alike, built in one place: proxy.ts sets them on
// pages (with a fresh script nonce per request) and the route-handler wrapper on every API answer.

/** A fresh, unguessable script nonce (16 random bytes, base64). */
export function createNonce(): string {
  return Buffer.from(crypto.getRandomValues(new Uint8Array(16))).toString("base64");
}

/**
 * Content-Security-Policy. Scripts only from this origin or with the request's nonce ('strict-dynamic' lets
 * Next's own loader add its chunks); no inline script without the nonce. Styles may be inline: React and the
 * charts set style attributes. Development adds 'unsafe-eval' for React's debugging and the reload socket.
 */
export function contentSecurityPolicy(options: { nonce?: string; development?: boolean } = {}): string {
  const { nonce, development = false } = options;
  const script = nonce
    ? `'self' 'nonce-${nonce}' 'strict-dynamic'${development ? " 'unsafe-eval'" : ""}`
    : `'self'${development ? " 'unsafe-eval'" : ""}`;
  return [
    "default-src 'self'",
    `script-src ${script}`,
    "style-src 'self' 'unsafe-inline'",
    "img-src 'self' blob: data:",
    "font-src 'self'",
    `connect-src 'self'${development ? " ws: wss:" : ""}`,
    "object-src 'none'",
    "base-uri 'self'",
    "form-action 'self'",
    "frame-ancestors 'none'",
    "frame-src 'none'",
    "worker-src 'self' blob:",
    "manifest-src 'self'",
  ].join("; ");
}

/** Everything but the CSP: framing, referrer, powerful features, sniffing and transport. */
export const BASE_SECURITY_HEADERS: Readonly<Record<string, string>> = {
  "x-frame-options": "DENY",
  "referrer-policy": "strict-origin-when-cross-origin",
  "permissions-policy": "camera=(self), microphone=(), geolocation=(), payment=(), usb=()",
  "x-content-type-options": "nosniff",
  // Browsers ignore HSTS over plain http (the local setup), and keep it once the app is served over https.
  "strict-transport-security": "max-age=63072000; includeSubDomains",
  "cross-origin-opener-policy": "same-origin",
};

/** All security headers for one answer. API answers hold no script, so their CSP forbids everything. */
export function securityHeaders(kind: { page: { nonce: string; development?: boolean } } | "api"): Record<string, string> {
  const csp = kind === "api" ? "default-src 'none'; frame-ancestors 'none'; base-uri 'none'; form-action 'none'" : contentSecurityPolicy(kind.page);
  return { ...BASE_SECURITY_HEADERS, "content-security-policy": csp };
}

export function applySecurityHeaders(headers: Headers, values: Record<string, string>): void {
  for (const [name, value] of Object.entries(values)) headers.set(name, value);
}
