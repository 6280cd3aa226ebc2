import { describe, expect, it } from "vitest";
import { guessablePasswordProblem } from "@/lib/auth/password-strength";

// Scores from the zxcvbn estimator itself (the npm reference library this check is built on): common
// passwords and keyboard walks score 0-1, a few unrelated words score 4.
describe("how guessable a new password is", () => {
  it("refuses common and keyboard-walk passwords that pass the length rule", () => {
    for (const password of ["password1234", "qwertyuiop12", "iloveyou2026", "123456789abc"]) {
      expect(guessablePasswordProblem(password), password).toMatch(/too easy to guess/);
    }
  });

  it("counts the person's own words as known", () => {
    expect(guessablePasswordProblem("wrenhalloway", ["wren@blockwright.test", "Wren Halloway"])).toMatch(/too easy to guess/);
  });

  it("accepts a few unrelated words", () => {
    expect(guessablePasswordProblem("copper-kettle-rivet-53")).toBeUndefined();
    expect(guessablePasswordProblem("correct horse battery staple")).toBeUndefined();
  });
});
