import "server-only";
import { getBenchView, type SignOffOutcome } from "@/db/bench";
import { getJobTuner, listJobBlockIds } from "@/db/jobs";
import { sendMailSafely } from "@/lib/server/mail";
import { formatMeasurement, formatRange } from "@/lib/format/measurement";
import { formatDateTime } from "@/lib/format/dates";
import { getEnv, shopTimeZone } from "@/lib/server/env";

// Messages that keep the tuner in step with the bench: a measurement outside plan, and the job done.

/** The measured-vs-planned record of every block of the job's current revision, as plain text. */
export async function benchSummary(jobId: string): Promise<string> {
  const lines: string[] = [];
  const timeZone = shopTimeZone();
  for (const blockId of await listJobBlockIds(jobId)) {
    const view = await getBenchView({ id: "", role: "admin" }, blockId);
    if (!view) continue;
    lines.push(`${view.block.side.toUpperCase()} BLOCK (revision ${view.revision.number})`);
    for (const op of view.operations) {
      lines.push(`  ${op.number}  ${op.title}: ${op.signOff ? `signed by ${op.signOff.by} at ${formatDateTime(op.signOff.at, timeZone)}` : "NOT SIGNED"}`);
      for (const planned of op.planned) {
        const measured = op.recorded.find((r) => r.key === planned.key);
        lines.push(
          `      ${planned.label}: planned ${formatMeasurement(planned.quantity, planned.plannedSi)}, measured ${
            measured ? formatMeasurement(planned.quantity, measured.valueSi) : "-"
          } ${measured ? (measured.passed ? "OK" : "OUTSIDE " + formatRange(planned)) : ""}`.trimEnd(),
        );
      }
      if (op.signOff?.note) lines.push(`      note: ${op.signOff.note}`);
    }
    lines.push("");
  }
  return lines.join("\n");
}

export async function sendSignOffNotices(outcome: SignOffOutcome): Promise<void> {
  // Most sign-offs call for no message: nothing to look up then.
  if (!outcome.recorded || (outcome.failed.length === 0 && !outcome.allSigned)) return;
  const tuner = await getJobTuner(outcome.jobId);
  if (!tuner) return;
  const link = `${getEnv().APP_BASE_URL}/jobs/${outcome.jobId}`;
  // The record is read once even when both messages carry it (the last sign-off, outside plan).
  let record: Promise<string> | undefined;
  const summaryOnce = () => (record ??= benchSummary(outcome.jobId));
  if (outcome.failed.length) {
    await sendMailSafely({
      to: [tuner.email],
      subject: `${tuner.number}: measurement outside plan at "${outcome.operationTitle}"`,
      text: `${outcome.failed.map((f) => f.label).join(", ")} fell outside plan. The job stays in machining until it is resolved.\n\n${link}\n\n${await summaryOnce()}`,
    });
  }
  if (!outcome.allSigned) return;
  const summary = await summaryOnce();
  await sendMailSafely({
    to: [tuner.email],
    subject: outcome.verified
      ? `${tuner.number} is done: every operation signed and verified`
      : `${tuner.number}: every operation signed, some measurements outside plan`,
    text: `${
      outcome.verified
        ? `Every operation of ${tuner.number} is signed and every measurement is within plan.`
        : `Every operation of ${tuner.number} is signed, but some measurements are outside plan: review the bench record.`
    }\n\n${link}\n\nMeasured against plan:\n\n${summary}\nBlockwright's figures are planning aids checked by a qualified person; follow the manufacturer's instructions, local codes and licensed practice.`,
  });
}
