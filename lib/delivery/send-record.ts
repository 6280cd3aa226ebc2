import "server-only";
import { getConversionRecordRows, markRecordMailed } from "@/db/deliveries";
import type { Viewer } from "@/db/visibility";
import { ALL_CAUTIONS } from "@/lib/safety/cautions";
import { getEnv, shopTimeZone } from "@/lib/server/env";
import { log } from "@/lib/server/log";
import { sendMailSafely } from "@/lib/server/mail";
import { renderConversionRecordPdf } from "./pdf/render-record";
import { conversionRecordData } from "./record-data";

/** The record's file name, the same in the mail and in the office's download. */
export function conversionRecordFileName(jobNumber: string, revision: number): string {
  return `${jobNumber}-conversion-record-rev${revision}.pdf`;
}

/**
 * Mails the customer the conversion record of a delivered job, when the customer has an e-mail address on file.
 * The delivery is already saved: a record that cannot be rendered or queued is logged, never undoes it.
 * Answers where it was sent, or null.
 */
export async function sendConversionRecord(actor: Viewer, jobId: string): Promise<string | null> {
  const rows = await getConversionRecordRows(actor, jobId);
  const email = rows?.customer.email;
  if (!rows || !email) return null;
  const data = conversionRecordData(rows);
  let pdf: Buffer;
  try {
    pdf = await renderConversionRecordPdf(data, { timeZone: shopTimeZone() });
  } catch (error) {
    log.error({ err: error, job: rows.job.number }, "conversion record not rendered");
    return null;
  }
  const queued = await sendMailSafely({
    to: [email],
    subject: `${rows.job.number}: your metering blocks and their conversion record`,
    text: [
      `Hello ${rows.customer.name},`,
      "",
      `The metering blocks of ${rows.job.number} (${rows.job.carburetor}) were handed over${data.delivery ? ` to ${data.delivery.handedTo}` : ""}.`,
      "The attached record lists, block by block, the power valves and where they open, the restriction holes as drilled and measured, and the mixture plan. Keep it with the carburetor.",
      "",
      ...ALL_CAUTIONS.map((c) => `${c.signal} (${c.title}): ${c.text}`),
      "",
      `${data.shop.name}: ${data.shop.contact}`,
      getEnv().APP_BASE_URL,
    ].join("\n"),
    attachments: [{ filename: conversionRecordFileName(rows.job.number, rows.revision), content: pdf, contentType: "application/pdf" }],
  });
  if (!queued) return null;
  await markRecordMailed(jobId, rows.revision, email);
  return email;
}
