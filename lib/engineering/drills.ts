// Standard twist-drill series: number (#1-#80), letter (A-Z), fractional inch (1/64-1/2 in by 64ths) and
// metric (0.30-13.00 mm). Diameters are held in metres.

import type { Drill, DrillSystem } from "./types";
import { M_PER_IN, M_PER_MM } from "./unit-factors";

export const DRILL_SYSTEMS: readonly DrillSystem[] = ["number", "letter", "fraction", "metric"];

// Order among drills of exactly the same diameter (letter E and 1/4 in): the fraction is what most shops write.
const SYSTEM_ORDER: Readonly<Record<DrillSystem, number>> = { fraction: 0, number: 1, letter: 2, metric: 3 };

// Number drills #1..#80, decimal inches, per ASME B94.11M (the same table is reprinted in Machinery's Handbook,
// "Twist drill sizes"). Written from memory and cross-checked against the tests' handbook values.
// Index 0 is #1.
const NUMBER_DRILL_IN: readonly number[] = [
  0.228, 0.221, 0.213, 0.209, 0.2055, 0.204, 0.201, 0.199, 0.196, 0.1935, // #1-#10
  0.191, 0.189, 0.185, 0.182, 0.18, 0.177, 0.173, 0.1695, 0.166, 0.161, // #11-#20
  0.159, 0.157, 0.154, 0.152, 0.1495, 0.147, 0.144, 0.1405, 0.136, 0.1285, // #21-#30
  0.12, 0.116, 0.113, 0.111, 0.11, 0.1065, 0.104, 0.1015, 0.0995, 0.098, // #31-#40
  0.096, 0.0935, 0.089, 0.086, 0.082, 0.081, 0.0785, 0.076, 0.073, 0.07, // #41-#50
  0.067, 0.0635, 0.0595, 0.055, 0.052, 0.0465, 0.043, 0.042, 0.041, 0.04, // #51-#60
  0.039, 0.038, 0.037, 0.036, 0.035, 0.033, 0.032, 0.031, 0.0292, 0.028, // #61-#70
  0.026, 0.025, 0.024, 0.0225, 0.021, 0.02, 0.018, 0.016, 0.0145, 0.0135, // #71-#80
];

// Letter drills A..Z, decimal inches, per ASME B94.11M (Machinery's Handbook table). Written from memory.
const LETTER_DRILL_IN: readonly number[] = [
  0.234, 0.238, 0.242, 0.246, 0.25, 0.257, 0.261, 0.266, 0.272, 0.277, 0.281, 0.29, 0.295, // A-M
  0.302, 0.316, 0.323, 0.332, 0.339, 0.348, 0.358, 0.368, 0.377, 0.386, 0.397, 0.404, 0.413, // N-Z
];

function gcd(a: number, b: number): number {
  return b === 0 ? a : gcd(b, a % b);
}

/** A fractional-inch drill of numerator/denominator inches, label reduced ("8/64" -> "1/8"). */
export function fractionDrill(numerator: number, denominator: number): Drill {
  if (!Number.isInteger(numerator) || !Number.isInteger(denominator) || numerator <= 0 || denominator <= 0) {
    throw new RangeError(`fraction: expected positive whole numbers, got ${numerator}/${denominator}`);
  }
  const g = gcd(numerator, denominator);
  const n = numerator / g;
  const d = denominator / g;
  return { label: d === 1 ? `${n}` : `${n}/${d}`, system: "fraction", diameterM: (numerator / denominator) * M_PER_IN };
}

/** A metric drill of the given diameter in millimetres, labelled with two decimals ("2.50 mm"). */
export function metricDrill(mm: number): Drill {
  if (!Number.isFinite(mm) || mm <= 0) throw new RangeError(`mm: expected a positive diameter, got ${mm}`);
  const hundredths = Math.round(mm * 100);
  return { label: `${(hundredths / 100).toFixed(2)} mm`, system: "metric", diameterM: hundredths / 100_000 };
}

export const NUMBER_DRILLS: readonly Drill[] = NUMBER_DRILL_IN.map((inches, i) => ({
  label: `#${i + 1}`,
  system: "number",
  diameterM: inches * M_PER_IN,
}));

export const LETTER_DRILLS: readonly Drill[] = LETTER_DRILL_IN.map((inches, i) => ({
  label: String.fromCharCode(65 + i),
  system: "letter",
  diameterM: inches * M_PER_IN,
}));

export const FRACTION_DRILLS: readonly Drill[] = Array.from({ length: 32 }, (_, i) => fractionDrill(i + 1, 64));

// Metric series: a subset of BS 328 (0.2-25 mm). BS 328 steps are 0.05 mm from 1.0 to 2.95 mm (with 0.02/0.08
// sizes added below 1 mm) and 0.1 mm from 3.0 to 13.9 mm. We keep 0.05 mm steps from 0.30 to 2.95 mm and 0.1 mm
// steps from 3.0 to 13.0 mm: the sizes jobber sets are actually stocked in, and every ISO metric tap drill of
// M1.6-M12 falls on them. The 0.02/0.08 sub-millimetre sizes are left out as specialist stock.
export const METRIC_DRILLS: readonly Drill[] = [
  ...Array.from({ length: (295 - 30) / 5 + 1 }, (_, i) => metricDrill((30 + 5 * i) / 100)),
  ...Array.from({ length: (130 - 30) + 1 }, (_, i) => metricDrill((30 + i) / 10)),
];

function byDiameter(a: Drill, b: Drill): number {
  return a.diameterM - b.diameterM || SYSTEM_ORDER[a.system] - SYSTEM_ORDER[b.system];
}

/** Every drill of the four series, smallest first. */
export const ALL_DRILLS: readonly Drill[] = [...NUMBER_DRILLS, ...LETTER_DRILLS, ...FRACTION_DRILLS, ...METRIC_DRILLS]
  .sort(byDiameter);

/** The inch series (number, letter, fraction), smallest first. */
export const INCH_DRILLS: readonly Drill[] = ALL_DRILLS.filter((d) => d.system !== "metric");

const BY_LABEL: ReadonlyMap<string, Drill> = new Map(ALL_DRILLS.map((d) => [d.label, d]));

/**
 * Finds a standard drill by the way a shop writes it. Accepts, case and spacing aside:
 * number "#43", "no. 43", "No43"; letter "q"; fraction "1/8", "8/64", '1/8"', "1/8 in";
 * metric "2.5mm", "2.50 mm"; decimal inch only with its unit, "0.089 in" or '0.089"' (matched to 0.0001 in).
 * A bare number such as "2" or "2.5" is refused: it could be the number drill, millimetres or inches.
 */
export function findDrill(label: string): Drill | undefined {
  const s = label.trim().toLowerCase().replace(/\s+/g, " ");

  const num = /^(?:#|no\.?|nr\.?|number) ?(\d{1,2})$/.exec(s);
  if (num?.[1] !== undefined) return BY_LABEL.get(`#${Number(num[1])}`);

  if (/^[a-z]$/.test(s)) return BY_LABEL.get(s.toUpperCase());

  const frac = /^(\d+) ?\/ ?(\d+) ?(?:in|inch|")?$/.exec(s);
  if (frac?.[1] !== undefined && frac[2] !== undefined) {
    const n = Number(frac[1]);
    const d = Number(frac[2]);
    if (n <= 0 || d <= 0) return undefined;
    const drill = fractionDrill(n, d);
    const found = BY_LABEL.get(drill.label);
    return found?.system === "fraction" ? found : undefined;
  }

  const mm = /^(\d+(?:\.\d+)?|\.\d+) ?mm$/.exec(s);
  if (mm?.[1] !== undefined) {
    const value = Number(mm[1]);
    if (value <= 0) return undefined;
    const found = BY_LABEL.get(metricDrill(value).label);
    // "2.503 mm" is not a stocked size even though it rounds to one.
    return found !== undefined && Math.abs(found.diameterM / M_PER_MM - value) < 1e-9 ? found : undefined;
  }

  const inch = /^(\d*\.\d+|\d+) ?(?:in|inch|")$/.exec(s);
  if (inch?.[1] !== undefined) {
    const m = Number(inch[1]) * M_PER_IN;
    return ALL_DRILLS.find((d) => d.system !== "metric" && Math.abs(d.diameterM - m) <= 0.00005 * M_PER_IN);
  }

  return undefined;
}

/** How a drill must be written, for messages that refuse one. */
export const DRILL_LABEL_FORMS = '"#43" (number drill), "A" (letter), "1/16" (fraction), "2.5 mm" (metric) or "0.089 in" (decimal inch)';

/** Why a label names no standard drill, or undefined when it does. */
export function drillLabelProblem(label: string): string | undefined {
  if (findDrill(label) !== undefined) return undefined;
  if (/^\s*(\d+(\.\d*)?|\.\d+)\s*$/.test(label)) {
    return `"${label.trim()}" does not say which drill series it is: write ${DRILL_LABEL_FORMS}`;
  }
  return `"${label.trim()}" is not a standard drill size: write ${DRILL_LABEL_FORMS}`;
}

export type DrillDirection = "nearest" | "atLeast" | "atMost";

export interface NearestDrillOptions {
  /** Choose only from these (a shop's stock); default every standard drill. */
  drills?: readonly Drill[];
  /** Choose only from these series; default all. */
  systems?: readonly DrillSystem[];
  /** "atLeast": the smallest drill not under the diameter; "atMost": the largest not over it. */
  direction?: DrillDirection;
}

// A drill within a nanometre of the target counts as equal to it (floating-point noise of unit conversion).
const SAME_DIAMETER_M = 1e-9;

/**
 * The drill closest to a diameter, or undefined when none qualifies. Among equally close drills the one listed
 * first in diameter order wins (the smaller; for identical diameters the fraction over the number, the letter
 * and the metric size).
 */
export function nearestDrill(diameterM: number, options: NearestDrillOptions = {}): Drill | undefined {
  if (!Number.isFinite(diameterM) || diameterM <= 0) {
    throw new RangeError(`diameterM: expected a positive diameter, got ${diameterM}`);
  }
  const { drills = ALL_DRILLS, systems, direction = "nearest" } = options;
  const pool = [...drills]
    .filter((d) => systems === undefined || systems.includes(d.system))
    .filter((d) => direction !== "atLeast" || d.diameterM >= diameterM - SAME_DIAMETER_M)
    .filter((d) => direction !== "atMost" || d.diameterM <= diameterM + SAME_DIAMETER_M)
    .sort(byDiameter);
  let best: Drill | undefined;
  for (const d of pool) {
    if (best === undefined || Math.abs(d.diameterM - diameterM) < Math.abs(best.diameterM - diameterM) - 1e-15) {
      best = d;
    }
  }
  return best;
}
