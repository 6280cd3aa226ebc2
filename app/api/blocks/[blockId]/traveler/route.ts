import { z } from "zod";
import { renderTravelerPdf } from "@/components/traveler/render-traveler";
import { getTravelerData } from "@/db/travelers";
import { invalidInput, refusalResponse } from "@/lib/api";
import { authorize } from "@/lib/auth/api-access";
import { ALL_ROLES } from "@/lib/auth/session";
import { parseIdParam } from "@/lib/route-params";
import { PAPER_SIZES } from "@/lib/traveler/types";

type Params = { params: Promise<{ blockId: string }> };

const querySchema = z.object({
  revision: z.coerce
    .number({ error: "revision must be a revision number" })
    .int({ error: "revision must be a whole number" })
    .positive({ error: "revision must be 1 or more" })
    .optional(),
  paper: z.enum(PAPER_SIZES, { error: `paper must be one of ${PAPER_SIZES.join(", ")}` }).default("letter"),
});

/** The printed traveler of one metering block: a PDF of the job's current revision, or of `?revision=N`. */
export async function GET(request: Request, { params }: Params) {
  const id = parseIdParam((await params).blockId, "blockId");
  if (!id.ok) return invalidInput(id.error);
  const query = querySchema.safeParse(Object.fromEntries(new URL(request.url).searchParams));
  if (!query.success) return invalidInput(query.error);
  const access = await authorize(ALL_ROLES);
  if (!access.ok) return access.response;
  try {
    const data = await getTravelerData(access.user, { blockId: id.id, revision: query.data.revision });
    const pdf = await renderTravelerPdf(data, { paper: query.data.paper });
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
  } catch (error) {
    return refusalResponse(error);
  }
}
