import { z } from "zod";
import { apiRoute } from "@/lib/http/api-route";
import { OFFICE_ROLES } from "@/lib/auth/session";
import { idParams } from "@/lib/http/route-params";
import { conversionRecordPdf } from "@/lib/delivery/record-pdf";

const querySchema = z.object({
  revision: z.coerce
    .number({ error: "revision must be a revision number" })
    .int({ error: "revision must be a whole number" })
    .positive({ error: "revision must be 1 or more" })
    .optional(),
});

/** The customer's conversion record of a delivered revision (the current one, or `?revision=N`), as a PDF. */
export const GET = apiRoute({ roles: OFFICE_ROLES, params: idParams("id"), query: querySchema }, async ({ user, params, query }) => {
  const { pdf, filename } = await conversionRecordPdf(user, params.id, query.revision);
  return new Response(new Uint8Array(pdf), {
    headers: {
      "content-type": "application/pdf",
      "content-disposition": `attachment; filename="${filename}"`,
      "cache-control": "private, no-store",
    },
  });
});
