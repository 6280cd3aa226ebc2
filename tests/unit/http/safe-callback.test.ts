import { describe, expect, it } from "vitest";
import { safeCallbackPath } from "@/lib/http/safe-callback";

const APP = "https://shop.blockwright.test";

// Payloads that browsers or URL parsers turn into another host (WHATWG URL: "\" is read as "/" in http(s)
// URLs, and tab and newline are removed anywhere in a URL).
const LEAVING = [
  "//evil.example/",
  "/\\evil.example/",
  "/%5Cevil.example/",
  "/%5cevil.example/",
  "/%09/evil.example/",
  "/\t/evil.example/",
  "/\n/evil.example/",
  "/%0a/evil.example/",
  "/%0d/evil.example/",
  "/%2F/evil.example/",
  "/%2f%2fevil.example",
  "/%252F/evil.example/",
  "/%25255C/evil.example/",
  "\\\\evil.example",
  "https://evil.example/",
  "https:evil.example",
  "javascript:alert(1)",
  "//shop.blockwright.test@evil.example/",
  "https://shop.blockwright.test.evil.example/",
  "/%00/evil.example",
  "/%E2%80%A8/evil.example",
  "",
];

describe("where sign-in sends you afterwards", () => {
  it.each(LEAVING)("%j stays on this site (falls back to /)", (payload) => {
    const path = safeCallbackPath(payload, APP);
    expect(path).toBe("/");
    expect(new URL(path, APP).origin).toBe(APP);
  });

  it("keeps ordinary paths with their query", () => {
    expect(safeCallbackPath("/jobs/123?tab=plan", APP)).toBe("/jobs/123?tab=plan");
    expect(safeCallbackPath("/jobs?q=Wren%20Halloway", APP)).toBe("/jobs?q=Wren%20Halloway");
  });

  it("reduces an absolute URL on the app's own origin to its path", () => {
    expect(safeCallbackPath(`${APP}/bench/abc`, APP)).toBe("/bench/abc");
    expect(safeCallbackPath(APP, APP)).toBe("/");
  });

  it("takes the first of repeated query values", () => {
    expect(safeCallbackPath(["/jobs", "//evil.example"], APP)).toBe("/jobs");
    expect(safeCallbackPath(["//evil.example", "/jobs"], APP)).toBe("/");
  });
});
