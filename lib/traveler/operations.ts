// The operations of one block as the traveler prints them: each step's figures (callouts) taken from the
// solved plan, where they are numbers in SI, rather than re-read from the operation's display text.

import type { BlockPlan, CautionTopic, PlannedMeasurement } from "@/lib/engineering/conversion-plan";
import { inches, kilopascals, lengthBoth, millimetres, psi, squareInches, squareMillimetres } from "./format";
import type { TravelerCallout, TravelerGrindPass, TravelerOperation } from "./types";

/** An operation as it is stored (db operations row) or planned (PlannedOperation): the fields the traveler needs. */
export interface OperationSource {
  number: number;
  kind: string;
  title: string;
  instructions: string;
  parameters: unknown;
  measurements: unknown;
  caution: string | null;
  /** The stage it serves: on a planned operation; a stored one keeps it in its parameters. */
  stageId?: string | undefined;
}

const CAUTION_TOPICS: readonly CautionTopic[] = ["grinding", "drilling", "fuel", "pressurizedBowls"];

function cautionOf(value: string | null): CautionTopic | null {
  return CAUTION_TOPICS.find((topic) => topic === value) ?? null;
}

function record(value: unknown): Record<string, unknown> {
  return value !== null && typeof value === "object" && !Array.isArray(value) ? (value as Record<string, unknown>) : {};
}

function measurementsOf(value: unknown): PlannedMeasurement[] {
  if (!Array.isArray(value)) return [];
  return value.filter(
    (m): m is PlannedMeasurement =>
      m !== null &&
      typeof m === "object" &&
      typeof m.key === "string" &&
      typeof m.label === "string" &&
      (m.quantity === "length" || m.quantity === "pressure") &&
      typeof m.plannedSi === "number" &&
      typeof m.minSi === "number" &&
      typeof m.maxSi === "number",
  );
}

const text = (value: unknown): string | undefined => (typeof value === "string" || typeof value === "number" ? String(value) : undefined);

function passList(passes: readonly number[]): string {
  if (passes.length === 0) return "none";
  const every = passes.every((p, i) => p === i + 1);
  if (every && passes.length > 1) return "every pass";
  return `after ${passes.join(", ")}`;
}

function calloutsFor(op: OperationSource, plan: BlockPlan | undefined): { callouts: TravelerCallout[]; grindPasses: TravelerGrindPass[] } {
  const params = record(op.parameters);
  const callouts: TravelerCallout[] = [];
  let grindPasses: TravelerGrindPass[] = [];
  switch (op.kind) {
    case "grind": {
      const g = plan?.grind;
      if (g && g.ok) {
        grindPasses = g.passes.map((p) => ({ pass: p.pass, cumulativeDepthM: p.cumulativeDepthM, clayCheck: p.clayCheck }));
        callouts.push(
          { label: "Grind depth", value: inches(g.depthM), detail: millimetres(g.depthM) },
          { label: "Passes", value: `${g.passes.length} light`, detail: `about ${inches(g.passes[0]?.depthM ?? 0)} each` },
          { label: "Clay check", value: passList(g.passes.filter((p) => p.clayCheck).map((p) => p.pass)) },
          { label: "Wall left", value: inches(g.remainingWallM), detail: millimetres(g.remainingWallM) },
        );
      } else if (g) {
        callouts.push({ label: "Grind", value: "DO NOT GRIND", detail: g.reason?.message });
      } else {
        for (const [label, key] of [["Grind depth", "depth"], ["Passes", "passes"], ["Wall left", "wallLeft"]] as const) {
          const v = text(params[key]);
          if (v) callouts.push({ label, value: v });
        }
      }
      break;
    }
    case "plug": {
      const p = plan?.plug;
      if (p) {
        callouts.push(
          { label: "Drill", value: p.drill.label, detail: lengthBoth(p.drill.diameterM) },
          { label: "Drill depth", value: inches(p.drillDepthM, 3), detail: millimetres(p.drillDepthM) },
          { label: "Thread", value: p.thread.label, detail: `${p.engagementPct.toFixed(0)} % engagement` },
          { label: "Tap", value: p.tapLabel, detail: `to ${inches(p.tapDepthM, 3)} full thread` },
          { label: "Set screw", value: p.setScrew?.label ?? "none fits: ask the tuner", detail: "in fuel-resistant thread sealant" },
        );
      } else {
        for (const [label, key] of [["Drill", "drill"], ["Drill size", "drillSize"], ["Drill depth", "drillDepth"], ["Thread", "thread"], ["Tap", "tap"], ["Tap depth", "tapDepth"], ["Set screw", "setScrew"]] as const) {
          const v = text(params[key]);
          if (v) callouts.push({ label, value: v, detail: key === "setScrew" ? "in fuel-resistant thread sealant" : undefined });
        }
      }
      break;
    }
    case "pickupTube": {
      const t = plan?.tube;
      if (t) {
        callouts.push(
          { label: "Tube", value: "5/16 in soft copper" },
          { label: "Cut length", value: inches(t.cutLengthM, 3), detail: millimetres(t.cutLengthM) },
          { label: "Swage onto inlet", value: inches(t.swageM, 3), detail: millimetres(t.swageM) },
        );
      } else {
        for (const [label, key] of [["Cut length", "cutLength"], ["Swage onto inlet", "swage"]] as const) {
          const v = text(params[key]);
          if (v) callouts.push({ label, value: v });
        }
      }
      const bend = text(params.bend);
      if (bend) callouts.push({ label: "Bend", value: bend, detail: "rearward and down" });
      if (params.fitsBowl === "no") callouts.push({ label: "Bowl", value: "TUBE TOO LONG", detail: "check before fitting" });
      break;
    }
    case "restriction": {
      const stageId = op.stageId ?? params.stageId;
      const stage = plan?.stages.find((s) => s.stageId === stageId);
      if (stage) {
        const c = stage.chosen;
        callouts.push(
          { label: "Holes", value: `${c.count} x ${c.drill.label}` },
          { label: "Drill", value: c.drill.label, detail: lengthBoth(c.drill.diameterM) },
          { label: "Total hole area", value: squareInches(c.holesAreaM2), detail: squareMillimetres(c.holesAreaM2) },
        );
      } else {
        const count = text(params.count);
        const drill = text(params.drill);
        if (count && drill) callouts.push({ label: "Holes", value: `${count} x ${drill}` });
        if (drill) callouts.push({ label: "Drill", value: drill, detail: text(params.drillSize) });
      }
      break;
    }
    case "valveSetting": {
      const opening = measurementsOf(op.measurements).find((m) => m.quantity === "pressure");
      if (opening) {
        callouts.push(
          { label: "Opening pressure", value: psi(opening.plannedSi), detail: kilopascals(opening.plannedSi) },
          { label: "Tolerance", value: `± ${psi((opening.maxSi - opening.minSi) / 2)}`, detail: `${psi(opening.minSi)} – ${psi(opening.maxSi)}` },
        );
      } else {
        const setpoint = text(params.setpoint);
        if (setpoint) callouts.push({ label: "Opening pressure", value: setpoint, detail: text(params.tolerance) });
      }
      break;
    }
    default:
      break;
  }
  return { callouts, grindPasses };
}

/** The block's operations in order, with the figures each one works to. `plan` is the block's solved plan. */
export function travelerOperations(operations: readonly OperationSource[], plan: BlockPlan | undefined): TravelerOperation[] {
  return [...operations]
    .sort((a, b) => a.number - b.number)
    .map((op) => ({
      number: op.number,
      kind: op.kind,
      title: op.title,
      instructions: op.instructions,
      ...calloutsFor(op, plan),
      measurements: measurementsOf(op.measurements),
      caution: cautionOf(op.caution),
    }));
}
