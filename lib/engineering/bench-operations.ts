// The operations at the bench for one metering block, numbered in tens in the order the work is done:
// grind, plug, pickup tube, restrictions, valve settings, finish. Each carries what the bench must measure,
// with the planned value and the band it is accepted in.

import type { BlockInput, BlockPlan, PlannedOperation } from "./conversion-plan";
import { holeAcceptBand } from "./hole-accept-band";
import { M2_PER_IN2, M_PER_IN, PA_PER_INHG, PA_PER_PSI } from "./unit-factors";

// Bench tolerances (common practice, no published source): a drilled hole is accepted in a band narrower than
// half the gap to the neighbouring drill sizes (hole-accept-band.ts), so the bench never passes the wrong
// drill; a boost valve is set within half a psi; a grind may stop a few thousandths short of plan when the
// clay shows clearance.
export const OPENING_PRESSURE_TOLERANCE_PA = 0.5 * PA_PER_PSI;
export const GRIND_DEPTH_SHORTFALL_M = 0.005 * M_PER_IN;
/** Default least wall left behind the ground boss (common practice, no published source). */
export const DEFAULT_MIN_BOSS_WALL_M = 0.06 * M_PER_IN;

const inches = (m: number, digits = 4) => `${(m / M_PER_IN).toFixed(digits)} in`;
const psi = (pa: number) => `${(pa / PA_PER_PSI).toFixed(1)} psi`;
const inHg = (pa: number) => `${(pa / PA_PER_INHG).toFixed(1)} inHg`;

function reachMeasured(block: BlockInput): boolean {
  const reach = block.tube?.maxReach;
  return reach?.rearwardM !== undefined || reach?.downwardM !== undefined;
}

export function blockOperations(block: BlockInput, plan: Omit<BlockPlan, "operations">): PlannedOperation[] {
  const ops: Omit<PlannedOperation, "number">[] = [];
  const hasBoostValve = block.stages.some((s) => s.valve.kind === "boost");

  if (plan.grind && plan.grind.grindNeeded) {
    const g = plan.grind;
    ops.push({
      kind: "grind",
      title: "Clearance grind of the boss",
      instructions: g.ok
        ? `Press clay between block and main body to confirm the gap. Grind the boss ${inches(g.depthM)} deep in ${g.passes.length} light passes, checking with clay after passes ${g.passes.filter((p) => p.clayCheck).map((p) => p.pass).join(", ")}. Stop if the wall left drops below plan. Deburr, wash and blow out every passage.`
        : `Do not grind: ${g.reason?.message ?? "the wall cannot spare the depth"}. Refer back to the tuner.`,
      parameters: { depth: inches(g.depthM), passes: g.passes.length, wallLeft: inches(g.remainingWallM) },
      measurements: g.ok
        ? [{ key: "grind-depth", label: "Grind depth", quantity: "length", plannedSi: g.depthM, minSi: g.depthM - GRIND_DEPTH_SHORTFALL_M, maxSi: g.depthM + Math.max(0, g.remainingWallM - DEFAULT_MIN_BOSS_WALL_M) }]
        : [],
      caution: "grinding",
    });
  }

  if (hasBoostValve && plan.plug) {
    const p = plan.plug;
    ops.push({
      kind: "plug",
      title: "Plug the vacuum passage",
      instructions: `Drill the passage with ${p.drill.label} (${inches(p.drill.diameterM)}) to ${inches(p.drillDepthM, 3)} deep, tap ${p.tapLabel} to ${inches(p.tapDepthM, 3)}, and seal it with a ${p.setScrew?.label ?? "set screw"} set screw in fuel-resistant thread sealant. Blow out the chips.`,
      parameters: {
        drill: p.drill.label,
        drillSize: inches(p.drill.diameterM),
        thread: p.thread.label,
        tap: p.tapLabel,
        drillDepth: inches(p.drillDepthM, 3),
        tapDepth: inches(p.tapDepthM, 3),
        setScrew: p.setScrew?.label ?? "none fits",
        engagement: `${p.engagementPct.toFixed(0)} %`,
      },
      measurements: [],
      caution: "drilling",
    });
  }

  if (block.side === "secondary" && hasBoostValve && plan.tube) {
    const t = plan.tube;
    ops.push({
      kind: "pickupTube",
      title: "Pickup extension on the secondary power valve",
      instructions: `Cut ${inches(t.cutLengthM, 3)} of 5/16 in soft copper tube. Swage ${inches(t.swageM, 3)} onto the valve inlet, crimping in small steps until tight. Bend ${block.tube?.bendDeg ?? 0}° rearward and down to about jet-extension level; check the bowl still comes off.`,
      parameters: { cutLength: inches(t.cutLengthM, 3), swage: inches(t.swageM, 3), bend: `${block.tube?.bendDeg ?? 0}°`, fitsBowl: !t.fitsBowl ? "no" : reachMeasured(block) ? "yes" : "not measured" },
      measurements: [],
      caution: "drilling",
    });
  }

  for (const stage of plan.stages) {
    const input = block.stages.find((s) => s.id === stage.stageId)!;
    const c = stage.chosen;
    const band = holeAcceptBand(c.drill);
    const valve = input.valve.kind === "vacuum" ? `vacuum valve (${inHg(input.valve.ratingPa)})` : `boost valve (${psi(input.valve.setpointPa)})`;
    ops.push({
      kind: "restriction",
      title: `Channel restriction for the ${valve}`,
      instructions: `Drill ${c.count} hole${c.count > 1 ? "s" : ""} with ${c.drill.label} (${inches(c.drill.diameterM)}) through the power-valve channel. Check every hole with pin gauges and record the size.`,
      parameters: { count: c.count, drill: c.drill.label, drillSize: inches(c.drill.diameterM), area: `${(c.holesAreaM2 / M2_PER_IN2).toFixed(5)} in²` },
      measurements: Array.from({ length: c.count }, (_, i) => ({
        key: `hole-${i + 1}`,
        label: `Hole ${i + 1} by pin gauge`,
        quantity: "length" as const,
        plannedSi: c.drill.diameterM,
        minSi: band.minM,
        maxSi: band.maxM,
      })),
      caution: "drilling",
      stageId: stage.stageId,
    });
  }

  for (const input of block.stages) {
    if (input.valve.kind !== "boost") continue;
    const setpoint = input.valve.setpointPa;
    ops.push({
      kind: "valveSetting",
      title: `Set the boost valve to open at ${psi(setpoint)}`,
      instructions: `Turn the adjuster, then verify the opening on the bench with regulated air, rising slowly. Record the pressure at which it opens.`,
      parameters: { setpoint: psi(setpoint), tolerance: `± ${psi(OPENING_PRESSURE_TOLERANCE_PA)}` },
      measurements: [
        {
          key: "opening-pressure",
          label: "Opening pressure",
          quantity: "pressure",
          plannedSi: setpoint,
          minSi: setpoint - OPENING_PRESSURE_TOLERANCE_PA,
          maxSi: setpoint + OPENING_PRESSURE_TOLERANCE_PA,
        },
      ],
      caution: "pressurizedBowls",
      stageId: input.id,
    });
  }

  ops.push({
    kind: "finish",
    title: "Wash, blow out and assemble",
    instructions: "Wash the block, blow out every passage, install the valves with new gaskets and check that the block seats flat.",
    parameters: {},
    measurements: [],
    caution: "fuel",
  });
  return ops.map((op, i) => ({ ...op, number: (i + 1) * 10 }));
}

