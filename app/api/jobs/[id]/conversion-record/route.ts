import { apiRoute } from "@/lib/http/api-route";
import { OFFICE_ROLES } from "@/lib/auth/session";
import { idParams } from "@/lib/http/route-params";
import { conversionRecordPdf } from "@/lib/delivery/record-pdf";

/** The customer's conversion record of a delivered job, as a PDF (the one mailed at delivery, printed again). */
export const GET = apiRoute({ roles: OFFICE_ROLES, params: idParams("id") }, async ({ user, params }) => {
  const { pdf, filename } = await conversionRecordPdf(user, params.id);
  return new Response(new Uint8Array(pdf), {
    headers: {
      "content-type": "application/pdf",
      "content-disposition": `attachment; filename="${filename}"`,
      "cache-control": "private, no-store",
    },
  });
});
