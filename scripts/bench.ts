// Performance budget of the computations the planner runs while the user types, then the app under load.
//
//   npm run bench          (scripts/bench.sh: seeds a bench database and builds the app first)
//
// Each case is warmed up, then timed call by call with process.hrtime.bigint(); the median must stay within
// its budget. Prints median and p95 per call and PASS/FAIL. The load section (scripts/bench-load.ts) prints
// its figures and targets after them. The run exits 0 either way: it reports figures, it is not a test
// (on a shared machine the same code passes and fails with the load beside it); read the FAIL lines.
// To add a case, append to CASES: a name, a budget in milliseconds and a function doing one call (it may
// return a promise, which is awaited).
// `npm run bench` sets NODE_ENV=production, as `next start` does: React's development build (extra checks in
// every render) would otherwise be measured in the traveler's PDF render.

import { ALL_DRILLS } from "../lib/engineering/drills";
import { solveHoleLayout } from "../lib/engineering/hole-layout";
import { DEFAULT_RESTRICTION_DRILL_LIMITS, type RestrictionDrillLimits } from "../lib/engineering/restriction-limits";
import { proposeStaging, type StagingModel } from "../lib/engineering/staging";
import { planConversion } from "../lib/engineering/conversion-plan";
import { GASOLINE } from "../lib/engineering/fuels";
import { M_PER_IN, PA_PER_INHG, PA_PER_PSI, STANDARD_ATMOSPHERE_PA } from "../lib/engineering/unit-factors";
import { travelerOperations } from "../lib/traveler/operations";
import type { TravelerData } from "../lib/traveler/types";
import { renderTravelerPdf } from "../lib/traveler/pdf/render-traveler";
import { runLoadSection } from "./bench-load";
import { runLogSection } from "./bench-log";

interface BenchCase {
  name: string;
  budgetMs: number;
  run: () => unknown;
  /** Calls to make before measuring even when the warm-up time is over (slow cases get few calls in it). */
  warmupCalls?: number;
}

// Inputs in shop units, converted with NIST SP 811 factors.
const jetArea = (inches: number) => (Math.PI / 4) * (inches * M_PER_IN) ** 2;

// Demo calibration: a boosted four-barrel with a vacuum valve on the primary.
const STAGING_MODEL: StagingModel = {
  mainJets: { primary: { count: 2, areaM2: jetArea(0.076) }, secondary: { count: 2, areaM2: jetArea(0.086) } },
  valves: [{ id: "vacuum", side: "primary", kind: "vacuum", ratingPa: 6.5 * PA_PER_INHG, restrictionAreaM2: 2 * jetArea(0.04) }],
  ambient: { pressurePa: STANDARD_ATMOSPHERE_PA, temperatureK: 298.15 },
  target: { atmosphereAfr: 12.8, peakBoostAfr: 11.5, peakBoostGaugePa: 12 * PA_PER_PSI },
  charge: { kind: "compressor", efficiency: 0.7, intercoolerEffectiveness: 0.7 },
};

// Demo traveler, built in memory from the planner (no database): the primary block of a boosted four-barrel
// with a clearance grind, a plugged vacuum passage, two restriction stages and a boost valve to set.
const TRAVELER_PLAN = planConversion({
  engine: {
    fuel: GASOLINE,
    peakBoostPa: 10 * PA_PER_PSI,
    ambientPressurePa: STANDARD_ATMOSPHERE_PA,
    cruiseLambda: 1.0, // common practice, no published source
    targetLambdaAtmosphere: 0.88,
    targetLambdaPeak: 0.78,
    ambientTemperatureK: 298.15,
    compressorEfficiency: 0.7,
    intercoolerEffectiveness: 0.7,
  },
  blocks: [
    {
      id: "5f0e7c1a-2b3d-4e5f-8a9b-0c1d2e3f4a5b",
      side: "primary",
      mainJetDiameterM: 0.08 * M_PER_IN,
      mainJetCount: 2,
      channelLengthM: 0.3 * M_PER_IN,
      minWebM: 0.03 * M_PER_IN,
      passage: { diameterM: 0.085 * M_PER_IN, wallM: 0.2 * M_PER_IN, depthM: 0.4 * M_PER_IN },
      grind: { valveProtrusionM: 0.04 * M_PER_IN, measuredGapM: 0, bossWallM: 0.25 * M_PER_IN },
      stages: [
        { id: "vacuum", valve: { kind: "vacuum", ratingPa: 6.5 * PA_PER_INHG }, target: { kind: "percentMainJet", percent: 31.5 }, maxHoles: 4 },
        { id: "boost-3", valve: { kind: "boost", setpointPa: 3 * PA_PER_PSI }, target: { kind: "afr", from: 12.5, to: 11.5 }, maxHoles: 4 },
      ],
    },
  ],
  drills: ALL_DRILLS,
});
const TRAVELER_BLOCK = TRAVELER_PLAN.blocks[0]!;
const TRAVELER: TravelerData = {
  job: { number: "BW-0042", customer: "Wren Halloway", carburetor: "Four-barrel, vacuum secondaries, blow-through hat", displacementM3: 0.0057, fuel: "Gasoline", peakBoostPa: 10 * PA_PER_PSI },
  block: { id: TRAVELER_BLOCK.blockId, side: "primary", mainJetDiameterM: 0.08 * M_PER_IN, mainJetCount: 2 },
  revision: {
    number: 1,
    status: "current",
    approvedAt: "2025-06-01T10:00:00.000Z",
    approvedBy: "Mara Quillon",
    releasedAt: "2025-06-02T08:00:00.000Z",
    releasedBy: "Avery Lindqvist",
    tuner: "Mara Quillon",
  },
  operations: travelerOperations(TRAVELER_BLOCK.operations, TRAVELER_BLOCK),
  planNotes: [],
  acknowledgedDangers: 0,
  changes: null,
  benchUrl: `http://127.0.0.1:3000/bench/${TRAVELER_BLOCK.blockId}?revision=1`,
};

let holeTargetStep = 0;

function holeLayout(limits: RestrictionDrillLimits) {
  // Vary the target so no call can reuse the previous one's work.
  holeTargetStep = (holeTargetStep + 1) % 97;
  return solveHoleLayout({
    targetEffectiveAreaM2: (1 + holeTargetStep / 40) * 1e-6,
    drills: ALL_DRILLS,
    limits,
    maxHoles: 4,
    valveWindowAreaM2: jetArea(0.2),
    channelLengthM: 0.5 * M_PER_IN,
    minWebM: 0.03 * M_PER_IN,
  });
}

const CASES: BenchCase[] = [
  {
    // The worst case: every drill of every series allowed.
    name: `hole layout: all ${ALL_DRILLS.length} drills allowed x 1-4 holes, full ranking`,
    budgetMs: 0.2,
    run: () => holeLayout({ system: "mixed", smallestDrillM: 1e-5, largestDrillM: 0.1 }),
  },
  {
    // What a plan does with the shop's defaults: the whole series is read, the inch drills #70 to 1/8 ranked.
    name: `hole layout: ${ALL_DRILLS.length} drills, inch #70 to 1/8 allowed x 1-4 holes, full ranking`,
    budgetMs: 0.1,
    run: () => holeLayout(DEFAULT_RESTRICTION_DRILL_LIMITS),
  },
  {
    name: "staging proposal: 3 boost valves, part + full throttle, drilled",
    budgetMs: 20,
    run: () =>
      proposeStaging({
        model: STAGING_MODEL,
        boostValves: 3,
        peakBoostGaugePa: 12 * PA_PER_PSI,
        band: 0.05,
        valveWindowAreaM2: jetArea(0.2),
        layout: { drills: ALL_DRILLS, maxHoles: 4, channelLengthM: 0.5 * M_PER_IN, minWebM: 0.03 * M_PER_IN },
      }),
  },
  {
    // Fonts are registered and loaded by the warm-up; each call lays out and writes the whole PDF anew.
    name: "traveler PDF render (one block)",
    budgetMs: 300,
    warmupCalls: 10,
    // The zone changes only the printed dates, not the work of a render.
    run: () => renderTravelerPdf(TRAVELER, { timeZone: "UTC" }),
  },
];

const WARMUP_MS = 500;
const MEASURE_MS = 2000;
const MIN_SAMPLES = 30;
const MAX_SAMPLES = 5000;

async function callOnce(run: () => unknown): Promise<void> {
  const result = run();
  if (result instanceof Promise) await result;
}

function quantile(sorted: readonly number[], q: number): number {
  const index = Math.min(sorted.length - 1, Math.max(0, Math.ceil(q * sorted.length) - 1));
  return sorted[index] ?? Number.NaN;
}

async function measure(c: BenchCase): Promise<{ median: number; p95: number; samples: number }> {
  const warmupEnd = performance.now() + WARMUP_MS;
  for (let calls = 0; performance.now() < warmupEnd || calls < (c.warmupCalls ?? 0); calls++) await callOnce(c.run);
  const times: number[] = [];
  const end = performance.now() + MEASURE_MS;
  while ((times.length < MIN_SAMPLES || performance.now() < end) && times.length < MAX_SAMPLES) {
    const start = process.hrtime.bigint();
    await callOnce(c.run);
    times.push(Number(process.hrtime.bigint() - start) / 1e6);
  }
  times.sort((a, b) => a - b);
  return { median: quantile(times, 0.5), p95: quantile(times, 0.95), samples: times.length };
}

const format = (ms: number) => (ms < 1 ? `${(ms * 1000).toFixed(1)} µs` : `${ms.toFixed(2)} ms`);

async function main(): Promise<void> {
  if (process.env.NODE_ENV !== "production") {
    console.warn("NODE_ENV is not production: React runs its development build here (use npm run bench).");
  }
  let failed = false;
  for (const c of CASES) {
    const { median, p95, samples } = await measure(c);
    const pass = median <= c.budgetMs;
    if (!pass) failed = true;
    console.log(
      `${pass ? "PASS" : "FAIL"}  ${c.name}\n      median ${format(median)}  p95 ${format(p95)}  ` +
        `budget ${format(c.budgetMs)} (median)  ${samples} calls`,
    );
  }
  if (failed) console.log("Some computations are over budget (FAIL above).");
  await runLogSection();
  try {
    await runLoadSection();
  } catch (error) {
    console.log(`  the load section stopped: ${error instanceof Error ? error.message : String(error)}`);
  }
}

await main();
