import "server-only";
import { fuelProperties } from "@/lib/engineering/fuels";
import type { Job } from "@/db/schema";
import { listChangesInto } from "@/db/tuning-logs";
import { getTravelerRecord } from "@/db/travelers";
import type { Viewer } from "@/db/visibility";
import { benchUrl } from "@/lib/bench/url";
import { fuelSpecOf, snapshotJob } from "@/lib/jobs/plan";
import { travelerOperations } from "./operations";
import { travelerPlanNotes } from "./plan-notes";
import type { TravelerData } from "./types";

function fuelName(job: Job): string {
  try {
    return fuelProperties(fuelSpecOf(job)).name;
  } catch {
    return job.fuelKind;
  }
}

/**
 * Everything the printed traveler of one block shows, for one revision (the job's current one by default), from
 * the revision's snapshot: what was approved, not the job's working inputs. Hidden or missing records are 404.
 */
export async function getTravelerData(viewer: Viewer, input: { blockId: string; revision?: number | undefined }): Promise<TravelerData> {
  const record = await getTravelerRecord(viewer, input);
  const { job, block, revision, snapshot } = record;
  // The engine and fuel printed are the job as approved only: nothing falls through to the working row.
  const approved = snapshotJob(snapshot.job);
  const accepted = (await listChangesInto(job.id, revision.number)).flatMap((log) => log.changes.map((c) => ({ ...c, fromRevision: log.fromRevision })));
  const ordered = [...accepted.filter((c) => c.side === record.side), ...accepted.filter((c) => c.side !== record.side)];
  return {
    job: {
      number: job.number,
      customer: record.customer,
      carburetor: approved.carburetor,
      displacementM3: approved.displacementM3,
      fuel: fuelName(approved),
      peakBoostPa: approved.peakBoostPa,
    },
    block: { id: record.blockId, side: record.side, mainJetDiameterM: block.mainJetDiameterM, mainJetCount: block.mainJetCount },
    revision: {
      number: revision.number,
      status: revision.status,
      approvedAt: revision.approvedAt.toISOString(),
      approvedBy: revision.approvedBy,
      releasedAt: revision.releasedAt?.toISOString() ?? null,
      releasedBy: revision.releasedBy,
      tuner: record.tuner,
    },
    operations: travelerOperations(
      record.operations,
      snapshot.plan.blocks.find((b) => b.blockId === record.blockId),
    ),
    planNotes: travelerPlanNotes(snapshot.plan.warnings, record.blockId),
    changes: ordered.length ? { fromRevision: Math.min(...ordered.map((c) => c.fromRevision)), lines: ordered.map((c) => c.change) } : null,
    acknowledgedDangers: Array.isArray(revision.acknowledgedWarnings) ? revision.acknowledgedWarnings.length : 0,
    benchUrl: benchUrl(record.blockId, revision.number),
  };
}
