import type { FormAreaUnit, FormLengthUnit } from "@/lib/forms/quantity/units";

// The blocks form as the browser holds it (Conform's view of jobBlocksSchema): up to two blocks, each with
// its list of enrichment stages. Types and option lists only, safe in the client bundle.

type Quantity<U extends string> = { value?: number; unit?: U };

export const VACUUM_UNITS = ["inHg", "kPa"] as const;
export const SETPOINT_UNITS = ["psi", "kPa", "bar"] as const;

export const VALVE_OPTIONS = [
  { value: "vacuum", label: "Vacuum valve" },
  { value: "boost", label: "Boost-referenced valve" },
] as const;

export const TARGET_OPTIONS = [
  { value: "afr", label: "AFR before → after" },
  { value: "lambda", label: "Lambda before → after" },
  { value: "percentMainJet", label: "Percent of main-jet area" },
  { value: "area", label: "Restriction area" },
] as const;

/** The throttle mode a mixture target is read in (the secondary side only meters at full throttle). */
export const MODE_OPTIONS = [
  { value: "part", label: "Part throttle (primary side alone)" },
  { value: "full", label: "Full throttle (both sides)" },
] as const;

export const SIDE_OPTIONS = [
  { value: "primary", label: "Primary" },
  { value: "secondary", label: "Secondary" },
] as const;

export type StageForm = {
  valveKind?: (typeof VALVE_OPTIONS)[number]["value"];
  vacuumRating?: Quantity<(typeof VACUUM_UNITS)[number]>;
  setpoint?: Quantity<(typeof SETPOINT_UNITS)[number]>;
  targetKind?: (typeof TARGET_OPTIONS)[number]["value"];
  mode?: (typeof MODE_OPTIONS)[number]["value"];
  targetFrom?: number;
  targetTo?: number;
  targetArea?: Quantity<FormAreaUnit>;
  valveWindowArea?: Quantity<FormAreaUnit>;
  maxHoles?: number;
};

export type BlockForm = {
  side?: (typeof SIDE_OPTIONS)[number]["value"];
  mainJetDiameter?: Quantity<FormLengthUnit>;
  mainJetCount?: number;
  channelLength?: Quantity<FormLengthUnit>;
  minWeb?: Quantity<FormLengthUnit>;
  passageDiameter?: Quantity<FormLengthUnit>;
  passageWall?: Quantity<FormLengthUnit>;
  passageDepth?: Quantity<FormLengthUnit>;
  valveProtrusion?: Quantity<FormLengthUnit>;
  runningClearance?: Quantity<FormLengthUnit>;
  measuredGap?: Quantity<FormLengthUnit>;
  bossWall?: Quantity<FormLengthUnit>;
  tubeRun1?: Quantity<FormLengthUnit>;
  tubeRun2?: Quantity<FormLengthUnit>;
  tubeBendDeg?: number;
  tubeBendRadius?: Quantity<FormLengthUnit>;
  tubeSwage?: Quantity<FormLengthUnit>;
  tubeMaxRearward?: Quantity<FormLengthUnit>;
  tubeMaxDownward?: Quantity<FormLengthUnit>;
  stages?: StageForm[];
};

export type BlocksForm = { blocks?: BlockForm[] };

/** A new stage as the "add a stage" button inserts it. */
export function newStage(length: FormLengthUnit, valveKind: "vacuum" | "boost" = "boost", mode: "part" | "full" = "full"): StageForm {
  const area: FormAreaUnit = length === "in" ? "in²" : "mm²";
  return {
    valveKind,
    vacuumRating: { unit: "inHg" },
    setpoint: { unit: "psi" },
    targetKind: "afr",
    mode,
    targetArea: { unit: area },
    valveWindowArea: { unit: area },
    maxHoles: 4,
  };
}

/** A new block with one stage: a vacuum valve on the primary, a boost valve on the secondary. */
export function newBlock(side: "primary" | "secondary", length: FormLengthUnit): BlockForm {
  const q = { unit: length };
  return {
    side,
    mainJetDiameter: q,
    mainJetCount: 2,
    channelLength: q,
    minWeb: q,
    passageDiameter: q,
    passageWall: q,
    passageDepth: q,
    valveProtrusion: q,
    runningClearance: q,
    measuredGap: q,
    bossWall: q,
    tubeRun1: q,
    tubeRun2: q,
    tubeBendRadius: q,
    tubeSwage: q,
    tubeMaxRearward: q,
    tubeMaxDownward: q,
    stages: [newStage(length, side === "primary" ? "vacuum" : "boost", side === "primary" ? "part" : "full")],
  };
}
