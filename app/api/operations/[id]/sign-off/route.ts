import { invalidInput, readJson, refusalResponse } from "@/lib/api";
import { authorize } from "@/lib/auth/api-access";
import { ALL_ROLES } from "@/lib/auth/session";
import { signOffFromBench } from "@/lib/bench-sign-off";
import { parseIdParam } from "@/lib/route-params";
import { signOffSchema } from "@/app/bench/[blockId]/schema";

/**
 * Signs an operation off with its readings: { readings: [{ key, value, unit }], note }. Answers 201 when
 * recorded, 200 when it was already signed (nothing recorded twice), 409 for a superseded revision.
 */
export async function POST(request: Request, { params }: { params: Promise<{ id: string }> }) {
  const id = parseIdParam((await params).id);
  if (!id.ok) return invalidInput(id.error);
  const body = await readJson(request);
  if (!body.ok) return body.response;
  const parsed = signOffSchema.safeParse({ ...(body.value as object), operationId: id.id });
  if (!parsed.success) return invalidInput(parsed.error);
  const access = await authorize(ALL_ROLES);
  if (!access.ok) return access.response;
  try {
    const outcome = await signOffFromBench(access.user, parsed.data);
    return Response.json(
      { recorded: outcome.recorded, jobState: outcome.jobState, failed: outcome.failed, allSigned: outcome.allSigned },
      { status: outcome.recorded ? 201 : 200 },
    );
  } catch (error) {
    return refusalResponse(error);
  }
}
