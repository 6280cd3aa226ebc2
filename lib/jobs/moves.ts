import "server-only";
import { RequestRefusal } from "@/db/refusal";
import { renderTravelerPdf } from "@/lib/traveler/pdf/render-traveler";
import { getJob } from "@/db/jobs";
import type { Viewer } from "@/db/visibility";
import { changeJobState } from "@/db/revisions";
import { approveRevision } from "./approve";
import { revisionOffRackDrills, type MoveWarning } from "./drill-rack-check";
import { sendConversionRecord } from "@/lib/delivery/send-record";
import { getTravelerData } from "@/lib/traveler/data";
import { listActiveUsersByRole } from "@/db/users";
import { benchUrl } from "@/lib/bench/url";
import { getEnv } from "@/lib/server/env";
import type { JobState } from "@/db/job-states";
import { sendMailSafely } from "@/lib/server/mail";
import { ALL_CAUTIONS } from "@/lib/safety/cautions";
import { log } from "@/lib/server/log";

/**
 * Moves a job to another state (the one way pages and the API do it) and sends what the move calls for:
 * a release sends every active machinist the block travelers of the released revision. A release goes ahead
 * when a drill the revision uses has left the rack since approval, and answers with a warning for each.
 */
export async function moveJob(
  actor: Viewer,
  jobId: string,
  to: JobState,
  options: { acknowledgeWarnings?: boolean | undefined; handedTo?: string | undefined } = {},
): Promise<{ state: JobState; revision: number; warnings: MoveWarning[]; recordMailedTo?: string | null }> {
  // Reopening a verified job lets signed readings be corrected again: an admin's call, not the tuner's.
  if (to === "machining" && actor.role !== "admin") throw new RequestRefusal(403, "Only an admin reopens a verified job for corrections.", "to");
  const moved =
    to === "planned" ? { state: to, ...(await approveRevision(actor, jobId, options)) } : await changeJobState(actor, jobId, to, { handedTo: options.handedTo });
  if (moved.state === "delivered") return { ...moved, warnings: [], recordMailedTo: await sendConversionRecord(actor, jobId) };
  if (moved.state !== "released") return { ...moved, warnings: [] };
  const warnings = await revisionOffRackDrills(jobId, moved.revision);
  await sendReleaseNotice(actor, jobId, moved.revision);
  return { ...moved, warnings };
}

export async function sendReleaseNotice(actor: Viewer, jobId: string, revision: number): Promise<boolean> {
  const machinists = await listActiveUsersByRole("machinist");
  if (machinists.length === 0) return false;
  const record = await getJob(actor, jobId);
  if (!record) return false;
  const { job, blocks } = record;
  const attachments = [];
  const lines = [];
  for (const block of [...blocks].sort((a, b) => a.side.localeCompare(b.side))) {
    try {
      const data = await getTravelerData(actor, { blockId: block.id, revision });
      attachments.push({
        filename: `${job.number}-${block.side}-rev${revision}.pdf`,
        content: await renderTravelerPdf(data, { paper: "letter", timeZone: getEnv().SHOP_TIME_ZONE }),
        contentType: "application/pdf",
      });
      lines.push(`  ${block.side} block: ${benchUrl(block.id, revision)}`);
    } catch (error) {
      log.error({ err: error, side: block.side }, "release: traveler not attached");
    }
  }
  return sendMailSafely({
    to: machinists.map((m) => m.email),
    subject: `${job.number} released: revision ${revision} travelers`,
    text: [
      `${job.number} (${job.carburetor}) is released to the bench, revision ${revision}.`,
      "",
      "The travelers are attached, one per metering block. Scan a traveler's QR code or open:",
      ...lines,
      "",
      `Job page: ${getEnv().APP_BASE_URL}/jobs/${jobId}`,
      "",
      ...ALL_CAUTIONS.map((c) => `${c.signal} (${c.title}): ${c.text}`),
    ].join("\n"),
    attachments,
  });
}
