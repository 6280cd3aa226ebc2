import "server-only";
import { recordSignInAttempt, tallyFailedSignIns, type FailureTally } from "@/db/sign-in-attempts";
import { UNKNOWN_ADDRESS } from "./client-address";

// Guessing is slowed, never stopped for good: after a few failures each further try must wait, twice as long
// each time up to a cap. The account from one address is slowed hardest (that is the guesser); the account
// from everywhere only a little, so a stranger's failures keep the rightful owner waiting seconds, not
// locked out; an address guessing across accounts is slowed when the address can be trusted. Figures are
// common practice for small internal apps, no published source (OWASP's authentication guidance describes
// the approach without numbers).
export const SIGN_IN_WINDOW_MINUTES = 15;

export interface DelayRule {
  /** Failures allowed before any wait. */
  free: number;
  /** The longest wait, in seconds. */
  capSeconds: number;
}

export const PAIR_RULE: DelayRule = { free: 3, capSeconds: 300 };
export const ACCOUNT_RULE: DelayRule = { free: 10, capSeconds: 30 };
export const ADDRESS_RULE: DelayRule = { free: 20, capSeconds: 300 };

/** Seconds to wait after the last of `failures`: 0 while free, then 1, 2, 4 ... up to the cap. */
export function delayAfter(failures: number, rule: DelayRule): number {
  if (failures < rule.free) return 0;
  return Math.min(2 ** (failures - rule.free), rule.capSeconds);
}

function remaining(tally: FailureTally, rule: DelayRule, now: Date): number {
  if (!tally.last) return 0;
  const until = tally.last.getTime() + delayAfter(tally.failures, rule) * 1000;
  return Math.max(0, Math.ceil((until - now.getTime()) / 1000));
}

/** Whole seconds before this account may be tried again from this address; 0 when it may be tried now. */
export async function signInWaitSeconds(email: string, address: string, now = new Date()): Promise<number> {
  const since = new Date(now.getTime() - SIGN_IN_WINDOW_MINUTES * 60_000);
  const tally = await tallyFailedSignIns({ email, address, since });
  const known = address !== UNKNOWN_ADDRESS;
  return Math.max(
    remaining(tally.account, ACCOUNT_RULE, now),
    known ? remaining(tally.pair, PAIR_RULE, now) : 0,
    known ? remaining(tally.address, ADDRESS_RULE, now) : 0,
  );
}

export { recordSignInAttempt };
