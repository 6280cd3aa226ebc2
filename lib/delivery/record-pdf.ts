import "server-only";
import { getConversionRecordRows } from "@/db/deliveries";
import { RequestRefusal } from "@/db/refusal";
import type { Viewer } from "@/db/visibility";
import { shopTimeZone } from "@/lib/server/env";
import { renderConversionRecordPdf } from "./pdf/render-record";
import { conversionRecordData } from "./record-data";
import { conversionRecordFileName } from "./send-record";

/** The conversion record of a delivered job, as the office prints or re-sends it. 404 hidden or missing, 409 not yet delivered. */
export async function conversionRecordPdf(viewer: Viewer, jobId: string): Promise<{ pdf: Buffer; filename: string }> {
  const rows = await getConversionRecordRows(viewer, jobId);
  if (!rows) throw new RequestRefusal(404, "No such job.", "id");
  if (!rows.delivery) throw new RequestRefusal(409, `${rows.job.number} is ${rows.job.state}: its conversion record is made when it is delivered.`, "id");
  const pdf = await renderConversionRecordPdf(conversionRecordData(rows), { timeZone: shopTimeZone() });
  return { pdf, filename: conversionRecordFileName(rows.job.number, rows.revision) };
}
