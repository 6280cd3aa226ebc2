import { describe, expect, it } from "vitest";
import { MAX_PASSWORD_BYTES, passwordProblem } from "@/lib/auth/password-policy";

const person = { email: "odile.marsh@blockwright.test", name: "Odile Marsh" };

describe("password rules (OWASP ASVS 4.0.3, 2.1)", () => {
  it.each([
    ["ten spaces", " ".repeat(10)],
    ["twelve spaces", " ".repeat(12)],
    ["eleven characters", "kettle-rain"],
    ["the e-mail itself", "odile.marsh@blockwright.test"],
    ["the e-mail's name part with digits", "odile.marsh1984"],
    ["the person's name", "Odile Marsh 2026!"],
    ["one character repeated", "aaaaaaaaaaaaaaaa"],
    ["a run of digits", "123456789012"],
    ["a run of letters", "abcdefghijklm"],
    ["over 72 bytes", "ä".repeat(37)], // 37 x 2 bytes in UTF-8 = 74 bytes, only 37 characters
    ["a NUL inside", "quiet-lathe\u0000harbor"],
  ])("refuses %s", (_what, password) => {
    expect(passwordProblem(password, person)).toBeTruthy();
  });

  it.each([
    ["four plain words", "copper lathe quiet harbor"],
    ["exactly 72 bytes", "q".repeat(10) + "w".repeat(10) + "e".repeat(10) + "r".repeat(10) + "t".repeat(10) + "y".repeat(10) + "u".repeat(12)],
    ["spaces and accents", "brûlée à la forge 7"],
  ])("accepts %s", (_what, password) => {
    expect(passwordProblem(password, person)).toBeUndefined();
  });

  it("counts the limit in bytes, as bcrypt reads them", () => {
    expect(MAX_PASSWORD_BYTES).toBe(72); // bcrypt uses at most 72 bytes of the key (Provos & Mazières, 1999)
    expect(passwordProblem("x".repeat(50) + "é".repeat(12) + "yz", {})).toMatch(/72 bytes/); // 50 + 24 + 2 = 76 bytes
  });
});
