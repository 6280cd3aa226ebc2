// Filled-in calculator forms as a browser posts them (Conform's nested names), one valid set per calculator.
// Figures are ordinary shop inputs; the tests that check results say where their expected values come from.

import type { nestedFormData } from "./form-fields";

export type Fields = Parameters<typeof nestedFormData>[0];

export const TAP_DRILL_FORM: Fields = { thread: "4-40", engagement: "75" };

export const PASSAGE_PLUG_FORM: Fields = {
  threadSystem: "unified",
  passage: { value: "0.087", unit: "in" },
  wall: { value: "0.060", unit: "in" },
  depth: { value: "0.5", unit: "in" },
  engagement: "75",
  minWall: { value: "", unit: "in" },
};

export const RESTRICTION_FORM: Fields = {
  targetKind: "area",
  targetArea: { value: "0.0063338", unit: "in²" },
  maxHoles: "4",
  drillSet: "inch",
  valveWindow: { value: "", unit: "in²" },
  channelLength: { value: "", unit: "in" },
  minWeb: { value: "", unit: "in" },
};

export const GRIND_FORM: Fields = {
  protrusion: { value: "0.060", unit: "in" },
  clearance: { value: "0.020", unit: "in" },
  clayGap: { value: "0.010", unit: "in" },
  wall: { value: "0.250", unit: "in" },
  minWall: { value: "0.120", unit: "in" },
  perPass: { value: "0.015", unit: "in" },
  clayEvery: "2",
};

export const PICKUP_TUBE_FORM: Fields = {
  firstRun: { value: "1.0", unit: "in" },
  bendAngle: "90",
  radius: { value: "0.5", unit: "in" },
  secondRun: { value: "0.75", unit: "in" },
  secondBendAngle: "",
  thirdRun: { value: "", unit: "in" },
  swage: { value: "0.25", unit: "in" },
  outsideDiameter: { value: "0.3125", unit: "in" },
  maxRearward: { value: "", unit: "in" },
  maxDownward: { value: "", unit: "in" },
};

export const STAGING_FORM: Fields = {
  command: "chart",
  primaryJet: { value: "0.076", unit: "in" },
  primaryJets: "2",
  secondaryJet: { value: "0.089", unit: "in" },
  secondaryJets: "2",
  valves: [
    { kind: "vacuum", side: "primary", opening: { value: "6.5", unit: "inHg" }, area: { value: "0.0020", unit: "in²" } },
    { kind: "boost", side: "primary", opening: { value: "3", unit: "psi" }, area: { value: "0.0015", unit: "in²" } },
    { kind: "boost", side: "secondary", opening: { value: "8", unit: "psi" }, area: { value: "0.0030", unit: "in²" } },
  ],
  fuel: "gasoline",
  targetScale: "afr",
  targetAtmosphere: "12.5",
  targetPeak: "11.5",
  targetCruise: "",
  peakBoost: { value: "12", unit: "psi" },
  ambientTemperature: { value: "77", unit: "°F" },
  chargeTemperature: { value: "130", unit: "°F" },
  band: "5",
  proposeValves: "2",
  boostWindow: { value: "", unit: "in²" },
};

/** A copy of a form with some fields replaced (deeply, by dotted path: "valves.0.opening.value"). */
export function withFields(form: Fields, changes: Record<string, string | undefined>): Fields {
  const copy = structuredClone(form);
  for (const [path, value] of Object.entries(changes)) {
    const keys = path.split(".");
    let at = copy as Record<string, unknown>;
    for (const key of keys.slice(0, -1)) at = at[key] as Record<string, unknown>;
    at[keys.at(-1)!] = value;
  }
  return copy;
}
