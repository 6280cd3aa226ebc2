import { z } from "zod";
import { storedTravelerPdf, travelerKey } from "@/lib/traveler/stored-traveler";
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

// The browser may keep the file but asks again each time (the caller's access is checked on every request);
// an unchanged traveler then answers 304 without a byte of PDF.
const CACHING = "private, no-cache";

/** RFC 9110 13.1.2: If-None-Match compares weakly, and `*` matches any current file. */
function matches(ifNoneMatch: string | null, etag: string): boolean {
  if (!ifNoneMatch) return false;
  return ifNoneMatch.split(",").some((tag) => {
    const trimmed = tag.trim();
    return trimmed === "*" || trimmed.replace(/^W\//, "") === etag;
  });
}

/** The printed traveler of one metering block: a PDF of the job's current revision, or of `?revision=N`. */
export const GET = apiRoute({ roles: ALL_ROLES, params: idParams("blockId"), query: querySchema }, async ({ request, user, params, query }) => {
  // Who may see the block is decided here, before anything stored is looked at.
  const data = await getTravelerData(user, { blockId: params.blockId, revision: query.revision });
  const options = { paper: query.paper, timeZone: shopTimeZone() };
  const { etag } = travelerKey(data, options);
  if (matches(request.headers.get("if-none-match"), etag)) {
    return new Response(null, { status: 304, headers: { etag, "cache-control": CACHING } });
  }
  const { pdf } = await storedTravelerPdf(data, options);
  const filename = `${data.job.number}-${data.block.side}-rev${data.revision.number}.pdf`;
  return new Response(new Uint8Array(pdf), {
    headers: {
      "content-type": "application/pdf",
      "content-length": String(pdf.byteLength),
      // Next drops Content-Length from a route handler's response (it sends it chunked); the download
      // control reads its progress against this instead.
      "x-traveler-bytes": String(pdf.byteLength),
      "content-disposition": `attachment; filename="${filename}"`,
      etag,
      "cache-control": CACHING,
    },
  });
});
