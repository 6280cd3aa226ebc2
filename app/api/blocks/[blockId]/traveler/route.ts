import { z } from "zod";
import { renderTravelerPdf } from "@/lib/traveler/pdf/render-traveler";
import { getTravelerData } from "@/lib/traveler/data";
import { apiRoute } from "@/lib/http/api-route";
import { ALL_ROLES } from "@/lib/auth/session";
import { idParams } from "@/lib/http/route-params";
import { shopTimeZone } from "@/lib/server/env";
import { PAPER_SIZES } from "@/lib/traveler/types";

const querySchema = z.object({
  revision: z.coerce
    .number({ error: "revision must be a revision number" })
    .int({ error: "revision must be a whole number" })
    .positive({ error: "revision must be 1 or more" })
    .optional(),
  paper: z.enum(PAPER_SIZES, { error: `paper must be one of ${PAPER_SIZES.join(", ")}` }).default("letter"),
});

/** The printed traveler of one metering block: a PDF of the job's current revision, or of `?revision=N`. */
export const GET = apiRoute({ roles: ALL_ROLES, params: idParams("blockId"), query: querySchema }, async ({ user, params, query }) => {
  const data = await getTravelerData(user, { blockId: params.blockId, revision: query.revision });
  const pdf = await renderTravelerPdf(data, { paper: query.paper, timeZone: shopTimeZone() });
  const filename = `${data.job.number}-${data.block.side}-rev${data.revision.number}.pdf`;
  return new Response(new Uint8Array(pdf), {
    headers: {
      "content-type": "application/pdf",
      "content-length": String(pdf.byteLength),
      // Next drops Content-Length from a route handler's response (it sends it chunked); the download
      // control reads its progress against this instead.
      "x-traveler-bytes": String(pdf.byteLength),
      "content-disposition": `attachment; filename="${filename}"`,
      "cache-control": "private, no-store",
    },
  });
});
