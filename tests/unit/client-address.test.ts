import { describe, expect, it } from "vitest";
import { clientAddress, UNKNOWN_ADDRESS } from "@/lib/auth/client-address";

describe("the address a sign-in comes from", () => {
  it("ignores X-Forwarded-For unless a proxy is trusted: any client can write it", () => {
    expect(clientAddress({ "x-forwarded-for": "203.0.113.9" }, 0)).toBe(UNKNOWN_ADDRESS);
  });

  it("behind one proxy, takes the entry that proxy appended (the last), not the client's own claim", () => {
    expect(clientAddress({ "x-forwarded-for": "198.51.100.1, 203.0.113.9" }, 1)).toBe("203.0.113.9");
    expect(clientAddress(new Headers({ "x-forwarded-for": "198.51.100.1, 203.0.113.9, 10.0.0.2" }), 2)).toBe("203.0.113.9");
  });

  it("refuses what is not an address", () => {
    expect(clientAddress({ "x-forwarded-for": "evil\\nheader" }, 1)).toBe(UNKNOWN_ADDRESS);
    expect(clientAddress({}, 1)).toBe(UNKNOWN_ADDRESS);
    expect(clientAddress({ "x-forwarded-for": "2001:db8::1" }, 1)).toBe("2001:db8::1");
  });
});
