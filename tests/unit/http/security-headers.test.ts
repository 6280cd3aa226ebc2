import { NextRequest, type NextFetchEvent } from "next/server";
import { describe, expect, it } from "vitest";
import { proxy } from "@/proxy";
import { contentSecurityPolicy, securityHeaders } from "@/lib/http/security-headers";

const event = { waitUntil: () => undefined } as unknown as NextFetchEvent;

function directives(csp: string): Map<string, string> {
  return new Map(csp.split(";").map((d) => d.trim()).filter(Boolean).map((d) => [d.split(" ")[0]!, d.slice(d.indexOf(" ") + 1)]));
}

describe("the Content-Security-Policy of a page", () => {
  it("runs only this origin's scripts and those with the request's nonce; never inline ones", () => {
    const csp = directives(contentSecurityPolicy({ nonce: "abc123" }));
    const script = csp.get("script-src")!;
    expect(script).toContain("'nonce-abc123'");
    expect(script).not.toContain("'unsafe-inline'");
    expect(script).not.toContain("'unsafe-eval'");
    expect(csp.get("frame-ancestors")).toBe("'none'");
    expect(csp.get("object-src")).toBe("'none'");
    expect(csp.get("base-uri")).toBe("'self'");
    expect(csp.get("form-action")).toBe("'self'");
  });

  it("allows eval only in development (React's debugging needs it)", () => {
    expect(contentSecurityPolicy({ nonce: "n", development: true })).toContain("'unsafe-eval'");
  });

  it("an API answer may load nothing at all", () => {
    expect(directives(securityHeaders("api")["content-security-policy"]!).get("default-src")).toBe("'none'");
  });
});

describe("proxy.ts sets the headers on every answer", () => {
  const required = ["content-security-policy", "x-frame-options", "referrer-policy", "permissions-policy", "x-content-type-options", "strict-transport-security"];

  it("a page gets a fresh nonce per request, in its CSP and handed on to Next in the request", async () => {
    const first = await proxy(new NextRequest("http://127.0.0.1:3000/sign-in"), event);
    const second = await proxy(new NextRequest("http://127.0.0.1:3000/sign-in"), event);
    for (const name of required) expect(first.headers.get(name), name).toBeTruthy();
    const nonceOf = (r: Response) => /'nonce-([^']+)'/.exec(r.headers.get("content-security-policy")!)?.[1];
    expect(nonceOf(first)).toBeTruthy();
    expect(nonceOf(first)).not.toBe(nonceOf(second));
    // NextResponse.next({ request: { headers } }) passes request headers on as x-middleware-request-*.
    expect(first.headers.get("x-middleware-request-x-nonce")).toBe(nonceOf(first));
    expect(first.headers.get("x-middleware-request-content-security-policy")).toBe(first.headers.get("content-security-policy"));
  });

  it("an anonymous visit to an office page is sent to sign-in, with the headers too", async () => {
    process.env.NEXTAUTH_SECRET ??= "unit-test-secret-0123456789";
    const response = await proxy(new NextRequest("http://127.0.0.1:3000/jobs"), event);
    expect(response.status).toBe(307);
    expect(new URL(response.headers.get("location")!).pathname).toBe("/sign-in");
    for (const name of required) expect(response.headers.get(name), name).toBeTruthy();
  });

  it("the API and next-auth's own routes get the API policy", async () => {
    const response = await proxy(new NextRequest("http://127.0.0.1:3000/api/auth/session"), event);
    expect(response.headers.get("content-security-policy")).toMatch(/^default-src 'none'/);
    expect(response.headers.get("x-frame-options")).toBe("DENY");
  });
});
