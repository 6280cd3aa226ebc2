import "server-only";
import type { ConversionRecordRows, RecordOperation } from "@/db/deliveries";
import type { StageRow } from "@/db/jobs";
import { fuelProperties } from "@/lib/engineering/fuels";
import { fromSI } from "@/lib/engineering/units";
import { formatMeasurement } from "@/lib/format/measurement";
import { fuelSpecOf } from "@/lib/jobs/plan";
import { getEnv } from "@/lib/server/env";
import type { ConversionRecordData, RecordRestriction, RecordValve } from "./types";

const psi = (pa: number) => `${fromSI("pressure", pa, "psi").toFixed(1)} psi`;
const inHg = (pa: number) => `${fromSI("pressure", pa, "inHg").toFixed(1)} inHg`;
const lambda = (value: number) => value.toFixed(2);

function fuelName(rows: ConversionRecordRows): string {
  try {
    return fuelProperties(fuelSpecOf(rows.job)).name;
  } catch {
    return rows.job.fuelKind;
  }
}

/** The stage's enrichment in the terms the tuner set it in. */
function stageTarget(stage: StageRow): string {
  const mode = stage.mode === "part" ? "part throttle" : "full throttle";
  switch (stage.targetKind) {
    case "afr":
      return `AFR ${stage.targetFrom?.toFixed(1) ?? "?"} to ${stage.targetTo.toFixed(1)}, ${mode}`;
    case "lambda":
      return `lambda ${stage.targetFrom?.toFixed(2) ?? "?"} to ${stage.targetTo.toFixed(2)}, ${mode}`;
    case "percentMainJet":
      return `${stage.targetTo} % of the main-jet area, ${mode}`;
    case "area":
      return `${fromSI("area", stage.targetTo, "in²").toFixed(5)} in² of restriction, ${mode}`;
  }
}

function valveOf(stage: StageRow, ops: RecordOperation[]): RecordValve {
  if (stage.valveKind === "vacuum") {
    return { valve: "Vacuum power valve", opens: `below ${inHg(stage.vacuumRatingPa ?? 0)} vacuum`, target: stageTarget(stage), measured: null };
  }
  const setpoint = stage.setpointPa ?? 0;
  // The bench's setting operation for this valve is the one planned at its opening pressure.
  const setting = ops.find((op) => op.kind === "valveSetting" && op.planned.some((m) => m.key === "opening-pressure" && Math.abs(m.plannedSi - setpoint) < 1));
  const reading = setting?.measured.find((m) => m.key === "opening-pressure");
  return {
    valve: "Boost-referenced power valve",
    opens: `at ${psi(setpoint)} boost`,
    target: stageTarget(stage),
    measured: reading ? formatMeasurement("pressure", reading.valueSi) : setting ? "not recorded" : null,
  };
}

function restrictionOf(op: RecordOperation): RecordRestriction {
  const { count, drill, drillSize } = op.parameters;
  return {
    title: op.title,
    drilled: `${count ?? "?"} × ${drill ?? "?"}${drillSize ? ` (${drillSize})` : ""}`,
    holes: op.planned.map((m) => {
      const reading = op.measured.find((r) => r.key === m.key);
      return {
        label: m.label,
        value: reading ? formatMeasurement(m.quantity, reading.valueSi) : "not recorded",
        withinPlan: reading ? reading.passed : null,
      };
    }),
  };
}

/** The customer's record of a job from its stored rows: what was fitted, drilled and measured, and the plan. */
export function conversionRecordData(rows: ConversionRecordRows): ConversionRecordData {
  const env = getEnv();
  const { job } = rows;
  return {
    shop: { name: env.SHOP_NAME, contact: env.SHOP_CONTACT || `${rows.tuner.name}, ${rows.tuner.email}` },
    job: {
      number: job.number,
      customer: rows.customer.name,
      carburetor: job.carburetor,
      fuel: fuelName(rows),
      displacement: `${fromSI("displacement", job.displacementM3, "in³").toFixed(0)} in³ (${fromSI("displacement", job.displacementM3, "L").toFixed(2)} L)`,
      peakBoost: psi(job.peakBoostPa),
      revision: rows.revision,
    },
    mixture: [
      { label: "Target lambda at atmospheric pressure", value: lambda(job.targetLambdaAtmosphere) },
      { label: `Target lambda at peak boost (${psi(job.peakBoostPa)})`, value: lambda(job.targetLambdaPeak) },
      { label: "Cruise lambda under vacuum", value: lambda(job.cruiseLambda) },
    ],
    delivery: rows.delivery
      ? { handedTo: rows.delivery.handedTo, handedOverBy: rows.delivery.handedOverBy, deliveredAt: rows.delivery.deliveredAt.toISOString() }
      : null,
    blocks: [...rows.blocks]
      .sort((a, b) => a.side.localeCompare(b.side))
      .map((block) => {
        const ops = rows.operations.filter((op) => op.blockId === block.id);
        return {
          side: block.side,
          valves: [...block.stages].sort((a, b) => a.position - b.position).map((stage) => valveOf(stage, ops)),
          restrictions: ops.filter((op) => op.kind === "restriction").map(restrictionOf),
        };
      }),
  };
}
