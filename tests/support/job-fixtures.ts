// The demo jobs the test tiers build from, as plain data: no database, no framework, nothing imported at run
// time (only types), so unit tests, the integration helpers (tests/integration/support/jobs.ts) and the
// Playwright helpers (tests/e2e/support/) can all read it. Each tier turns it into what it needs: a request body,
// rows through the data layer, or the planner's SI input. A test that needs other figures overrides fields; the
// figures its expectations are worked from stay named beside those expectations.
import type { BlockInput, EngineInput } from "@/lib/engineering/conversion-plan";

/** Customer and engine of the demo job in the JSON API's terms: every quantity as { value, unit }. */
export const DEMO_JOB = {
  newCustomerName: "Wren Halloway",
  carburetor: "Four-barrel, vacuum secondaries, blow-through hat",
  displacement: { value: 350, unit: "in³" },
  fuelKind: "gasoline",
  peakBoost: { value: 8, unit: "psi" },
  targetLambdaAtmosphere: 0.88,
  targetLambdaPeak: 0.86,
  intercooled: true,
  ambientTemperature: { value: 77, unit: "°F" },
  compressorEfficiencyPct: 70,
  intercoolerEffectivenessPct: 70,
  useAllDrills: true,
};

/** The demo job's body for POST /api/jobs, with any fields replaced (a fresh object every call). */
export function demoJobBody(overrides: Record<string, unknown> = {}) {
  return { ...structuredClone(DEMO_JOB), ...overrides };
}

/**
 * Both metering blocks of the demo job, for PATCH /api/jobs/{id}: the primary with a vacuum valve and a boost
 * valve, the secondary with one boost valve.
 */
const DEMO_BLOCKS = {
  blocks: [
    {
      side: "primary",
      mainJetDiameter: { value: 0.076, unit: "in" },
      mainJetCount: 2,
      channelLength: { value: 0.3, unit: "in" },
      minWeb: { value: 0.03, unit: "in" },
      passageDiameter: { value: 0.085, unit: "in" },
      passageWall: { value: 0.2, unit: "in" },
      passageDepth: { value: 0.4, unit: "in" },
      stages: [
        // A plan that holds together on the whole-engine model: the 3 psi stage is read in full throttle and
        // sized from the mixture the plan itself predicts there; the only lean zone left is the caution
        // below 3 psi, before any boost valve opens (no danger to acknowledge).
        { valveKind: "vacuum", vacuumRating: { value: 6.5, unit: "inHg" }, targetKind: "percentMainJet", targetTo: 12, maxHoles: 4 },
        { valveKind: "boost", setpoint: { value: 3, unit: "psi" }, targetKind: "afr", mode: "full", targetFrom: 14.0, targetTo: 12.2, maxHoles: 4 },
      ],
    },
    {
      side: "secondary",
      mainJetDiameter: { value: 0.086, unit: "in" },
      mainJetCount: 2,
      stages: [{ valveKind: "boost", setpoint: { value: 7, unit: "psi" }, targetKind: "lambda", targetFrom: 0.95, targetTo: 0.82, maxHoles: 4 }],
    },
  ],
};

/** The demo job's blocks body (a fresh object every call, so a test may change it). */
export function demoBlocksBody() {
  return structuredClone(DEMO_BLOCKS);
}

// The planner's reference job in SI, as lib/engineering takes it. Factors: NIST SP 811 (1 in = 0.0254 m exact;
// 1 psi = 6894.757 Pa; 1 inHg, conventional, = 3386.389 Pa).
const IN = 0.0254;
const PSI = 6894.757;
const INHG = 3386.389;

/** The engine of the planner's reference job, without its fuel (the test adds GASOLINE from lib/engineering). */
export const PLANNER_ENGINE: Omit<EngineInput, "fuel"> = {
  peakBoostPa: 10 * PSI,
  ambientPressurePa: 101325, // ISO 2533 sea-level standard atmosphere
  cruiseLambda: 1.0, // common practice, no published source
  targetLambdaAtmosphere: 0.88,
  targetLambdaPeak: 0.78,
  ambientTemperatureK: 298.15,
  compressorEfficiency: 0.7,
  intercoolerEffectiveness: 0.7,
};

/**
 * Its primary block: two 0.080 in main jets, a 0.085 in vacuum passage (0.2 in wall, 0.4 in deep), a grind of
 * 0.040 in protrusion against no gap and a 0.25 in boss wall; a vacuum stage of 31.5 % of the main jets and a
 * boost stage at 3 psi from AFR 12.5 to 11.5.
 */
export const PLANNER_PRIMARY: BlockInput = {
  id: "block-p",
  side: "primary",
  mainJetDiameterM: 0.08 * IN,
  mainJetCount: 2,
  channelLengthM: 0.3 * IN,
  minWebM: 0.03 * IN,
  passage: { diameterM: 0.085 * IN, wallM: 0.2 * IN, depthM: 0.4 * IN },
  grind: { valveProtrusionM: 0.04 * IN, measuredGapM: 0, bossWallM: 0.25 * IN },
  stages: [
    { id: "vac", valve: { kind: "vacuum", ratingPa: 6.5 * INHG }, target: { kind: "percentMainJet", percent: 31.5 }, maxHoles: 4 },
    { id: "b3", valve: { kind: "boost", setpointPa: 3 * PSI }, target: { kind: "afr", from: 12.5, to: 11.5 }, maxHoles: 4 },
  ],
};

/** Its secondary block: two 0.090 in main jets, a pickup tube, one boost stage at 8 psi from lambda 0.85 to 0.78. */
export const PLANNER_SECONDARY: BlockInput = {
  id: "block-s",
  side: "secondary",
  mainJetDiameterM: 0.09 * IN,
  mainJetCount: 2,
  tube: { runsM: [0.25 * IN, 0.5 * IN], bendDeg: 45, bendRadiusM: 0.375 * IN, swageM: 0.2 * IN },
  stages: [{ id: "b8", valve: { kind: "boost", setpointPa: 8 * PSI }, target: { kind: "lambda", from: 0.85, to: 0.78 }, maxHoles: 4 }],
};
