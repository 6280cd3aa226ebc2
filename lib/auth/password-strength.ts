import "server-only";
import { ZxcvbnFactory } from "@zxcvbn-ts/core";
import * as common from "@zxcvbn-ts/language-common";
import * as english from "@zxcvbn-ts/language-en";

// How guessable a new password is, by a well-known estimator (zxcvbn: common and breached-style passwords,
// names, words, keyboard walks, dates, l33t). Server-side only: its dictionaries are too heavy for a form's
// script. A score below 3 ("safely unguessable: moderate protection from offline attacks" in the estimator's
// own terms) is refused, after OWASP ASVS 4.0.3, 2.1.7 (check against breached and common passwords).

export const MIN_PASSWORD_SCORE = 3;

let estimator: ZxcvbnFactory | undefined;

function zxcvbn(): ZxcvbnFactory {
  estimator ??= new ZxcvbnFactory({
    translations: english.translations,
    graphs: common.adjacencyGraphs,
    dictionary: { ...common.dictionary, ...english.dictionary },
  });
  return estimator;
}

/** Why `password` is too easy to guess (with the person's own words counted as known), or undefined. */
export function guessablePasswordProblem(password: string, personal: readonly string[] = []): string | undefined {
  // The estimator matches whole entries: the e-mail and the name count word by word.
  const words = personal.flatMap((entry) => entry.toLowerCase().split(/[^\p{L}\p{N}]+/u)).filter((word) => word.length >= 3);
  const result = zxcvbn().check(password, words);
  if (result.score >= MIN_PASSWORD_SCORE) return undefined;
  const hint = result.feedback.warning ? ` ${result.feedback.warning}` : "";
  return `This password is too easy to guess.${hint} A few unrelated words make a strong one.`;
}
