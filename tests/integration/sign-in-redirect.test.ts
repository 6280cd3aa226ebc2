// After sign-in a person lands on this site, whatever callbackUrl an attacker put in the link.
import { beforeEach, describe, expect, it } from "vitest";
import SignInPage from "@/app/(auth)/sign-in/page";
import { authOptions } from "@/lib/auth/options";
import { actAs, resetDatabase } from "./support/database";
import { settle } from "./support/redirect";

const APP = "http://127.0.0.1:3000"; // APP_BASE_URL's default
const PAYLOADS = ["/%5Cevil.example/", "/\\evil.example/", "/%09/evil.example/", "//evil.example/", "/%2F%5Cevil.example", "https://evil.example/"];

beforeEach(resetDatabase);

describe("the sign-in page sends a signed-in visitor on", () => {
  it.each(PAYLOADS)("callbackUrl=%s ends on this site", async (payload) => {
    await actAs("tuner");
    const { redirectTo } = await settle(SignInPage({ searchParams: Promise.resolve({ callbackUrl: payload }) }));
    expect(redirectTo).toBe("/");
    expect(new URL(redirectTo!, APP).origin).toBe(APP);
  });

  it("a path on this site is kept", async () => {
    await actAs("tuner");
    const { redirectTo } = await settle(SignInPage({ searchParams: Promise.resolve({ callbackUrl: "/jobs?state=draft" }) }));
    expect(redirectTo).toBe("/jobs?state=draft");
  });
});

describe("next-auth's redirect after sign-in and sign-out", () => {
  const redirect = authOptions.callbacks!.redirect!;
  it.each(PAYLOADS)("url=%s ends on this site", async (payload) => {
    const target = await redirect({ url: payload, baseUrl: APP });
    expect(new URL(target).origin).toBe(APP);
    expect(target).toBe(`${APP}/`);
  });

  it("keeps its own absolute URLs", async () => {
    expect(await redirect({ url: `${APP}/jobs`, baseUrl: APP })).toBe(`${APP}/jobs`);
  });
});
