import { renderToBuffer } from "@react-pdf/renderer";
import { registerTravelerFonts } from "@/lib/traveler/pdf/fonts";
import type { ConversionRecordData } from "../types";
import { ConversionRecordDocument } from "./record-document";

/** The customer's conversion record as PDF bytes, from plain data; dates print in the shop's zone. */
export async function renderConversionRecordPdf(data: ConversionRecordData, options: { timeZone: string; printedAt?: Date }): Promise<Buffer> {
  registerTravelerFonts();
  return renderToBuffer(
    <ConversionRecordDocument data={data} timeZone={options.timeZone} printedAt={(options.printedAt ?? new Date()).toISOString()} />,
  );
}
