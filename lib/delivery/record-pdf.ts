import "server-only";
import { getConversionRecordRows } from "@/db/deliveries";
import { RequestRefusal } from "@/db/refusal";
import type { Viewer } from "@/db/visibility";
import { shopTimeZone } from "@/lib/server/env";
import { renderConversionRecordPdf } from "./pdf/render-record";
import { conversionRecordData } from "./record-data";
import { conversionRecordFileName } from "./send-record";

/**
 * The conversion record of a delivered revision (the job's current one by default), as the office prints it
 * again. 404 when the job or revision is hidden or missing, 409 when that revision was not delivered.
 */
export async function conversionRecordPdf(viewer: Viewer, jobId: string, revision?: number): Promise<{ pdf: Buffer; filename: string }> {
  const rows = await getConversionRecordRows(viewer, jobId, revision);
  if (!rows) throw new RequestRefusal(404, revision === undefined ? "No such job." : `No revision ${revision} of this job.`, revision === undefined ? "id" : "revision");
  if (!rows.delivery) {
    throw new RequestRefusal(409, `Revision ${rows.revision} of ${rows.job.number} was not delivered: its conversion record is made at delivery.`, revision === undefined ? "id" : "revision");
  }
  const pdf = await renderConversionRecordPdf(conversionRecordData(rows), { timeZone: shopTimeZone() });
  return { pdf, filename: conversionRecordFileName(rows.job.number, rows.revision) };
}
