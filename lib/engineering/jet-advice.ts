// Cruise under vacuum is metered by the primary main jets alone (no valve open at part throttle), so a cruise
// mixture off its target points at those jets, not at any enrichment stage. The advice: the area must scale by
// lambda_measured / lambda_target (fuel is proportional to area at the same air and signal), the diameter by
// its square root. Taken over the cruise bins with enough readings, by the median of their ratios.

import type { JudgedBin } from "./bin-judgement";
import { requirePositive } from "./checks";
import { median } from "./log-bins";
import { fromSI } from "./units";

export interface JetAdvice {
  side: "primary";
  /** Median of measured / target over the cruise bins used. */
  ratio: number;
  binsUsed: number;
  currentDiameterM: number;
  proposedDiameterM: number;
  message: string;
}

const inches = (m: number) => `${fromSI("length", m, "in").toFixed(4)} in (${fromSI("length", m, "mm").toFixed(2)} mm)`;

/** Advice for the primary main jets when cruise misses its target beyond the band; null otherwise. */
export function cruiseJetAdvice(bins: readonly JudgedBin[], input: { primaryMainJetDiameterM: number; band: number }): JetAdvice | null {
  const d = requirePositive("primaryMainJetDiameterM", input.primaryMainJetDiameterM);
  const cruise = bins.filter((b) => b.use.kind === "cruise" && b.enough);
  if (cruise.length === 0) return null;
  const ratio = median(cruise.map((b) => b.lambda / b.targetLambda));
  if (Math.abs(ratio - 1) <= input.band) return null;
  const proposed = d * Math.sqrt(ratio);
  const lean = ratio > 1;
  return {
    side: "primary",
    ratio,
    binsUsed: cruise.length,
    currentDiameterM: d,
    proposedDiameterM: proposed,
    message:
      `Cruise under vacuum runs ${(Math.abs(ratio - 1) * 100).toFixed(1)} % ${lean ? "lean" : "rich"} of its target: ` +
      `the primary main jets meter it, not the boost stages. ${lean ? "Open" : "Close"} the primary main jets from ` +
      `${inches(d)} to ${inches(proposed)} and read the log again; the stage corrections assume the jets as they are.`,
  };
}
