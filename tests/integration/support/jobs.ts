// Job fixtures for the integration tests, in the API's own terms ({ value, unit } quantities).
import { createJob, saveJobBlocks } from "@/db/jobs";
import type { Viewer } from "@/db/visibility";
import { changeJobState } from "@/db/revisions";
import { approveRevision } from "@/lib/jobs/approve";
import { blockColumns, jobColumns } from "@/lib/jobs/input";
import { createJobSchema, jobBlocksSchema } from "@/lib/jobs/schema";
import type { JobFields } from "@/db/jobs";
import { and, eq } from "drizzle-orm";
import * as schema from "@/db/schema";
import { actAs, testDb, type Actor } from "./database";

export function jobBody(overrides: Record<string, unknown> = {}) {
  return {
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
    ...overrides,
  };
}

export function blocksBody() {
  return {
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
          // below 3 psi, before any boost valve opens.
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
}

async function viewer(actor: Exclude<Actor, "anonymous">): Promise<Viewer> {
  const id = await actAs(actor);
  return { id: id!, role: actor };
}

/** A job with blocks, created by the tuner through the data layer, taken as far as `state`. */
export async function makeJob(state: "draft" | "planned" | "released" = "draft", overrides: Record<string, unknown> = {}) {
  const tuner = await viewer("tuner");
  const { customerId, newCustomerName, tunerId, ...fields } = createJobSchema.parse(jobBody(overrides));
  const job = await createJob(tuner, { fields: jobColumns(fields) as JobFields, customerId, newCustomerName, tunerId });
  await saveJobBlocks(tuner, job.id, blockColumns(jobBlocksSchema.parse(blocksBody())));
  if (state !== "draft") await approveRevision(tuner, job.id);
  if (state === "released") await changeJobState(tuner, job.id, "released");
  return job;
}

/** The id of the job's block on the given side. */
export async function blockIdOf(jobId: string, side: "primary" | "secondary" = "primary"): Promise<string> {
  const [block] = await testDb
    .select({ id: schema.meteringBlocks.id })
    .from(schema.meteringBlocks)
    .where(and(eq(schema.meteringBlocks.jobId, jobId), eq(schema.meteringBlocks.side, side)));
  if (!block) throw new Error(`job ${jobId} has no ${side} block`);
  return block.id;
}
