import { renderToBuffer } from "@react-pdf/renderer";
import type { PaperSize, TravelerData } from "@/lib/traveler/types";
import { registerTravelerFonts } from "./fonts";
import { qrDrawing } from "./qr";
import { TravelerDocument } from "./traveler-document";

/**
 * The traveler as PDF bytes. Needs no database: pass it the data (db/travelers.ts reads it for a block and a
 * revision; the bench builds it in memory). `timeZone` is the shop's (SHOP_TIME_ZONE), which its dates print in.
 */
export async function renderTravelerPdf(
  data: TravelerData,
  options: { timeZone: string; paper?: PaperSize; printedAt?: Date },
): Promise<Buffer> {
  registerTravelerFonts();
  return renderToBuffer(
    <TravelerDocument
      data={data}
      qr={qrDrawing(data.benchUrl)}
      paper={options.paper ?? "letter"}
      printedAt={(options.printedAt ?? new Date()).toISOString()}
      timeZone={options.timeZone}
    />,
  );
}
