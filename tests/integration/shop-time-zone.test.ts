// SHOP_TIME_ZONE is read once, with the rest of the configuration: an IANA name, UTC when unset, and a name
// Intl does not know stops the app with a message naming the variable.
import { afterEach, describe, expect, it, vi } from "vitest";

async function freshEnv(zone: string | undefined) {
  if (zone === undefined) delete process.env.SHOP_TIME_ZONE;
  else process.env.SHOP_TIME_ZONE = zone;
  vi.resetModules();
  return import("@/lib/server/env");
}

afterEach(() => {
  delete process.env.SHOP_TIME_ZONE;
  vi.resetModules();
});

describe("SHOP_TIME_ZONE", () => {
  it("is UTC when unset", async () => {
    expect((await freshEnv(undefined)).shopTimeZone()).toBe("UTC");
  });

  it("takes an IANA zone, spelled as the tz database spells it", async () => {
    expect((await freshEnv("America/Chicago")).shopTimeZone()).toBe("America/Chicago");
    expect((await freshEnv("europe/berlin")).shopTimeZone()).toBe("Europe/Berlin");
  });

  it("refuses a name that is no zone, naming the variable", async () => {
    const env = await freshEnv("Central Time");
    expect(() => env.getEnv()).toThrow(/SHOP_TIME_ZONE: SHOP_TIME_ZONE must be an IANA time zone/);
  });
});
