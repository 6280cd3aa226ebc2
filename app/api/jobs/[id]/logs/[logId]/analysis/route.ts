import { OFFICE_ROLES } from "@/lib/auth/session";
import { apiRoute } from "@/lib/http/api-route";
import { idParams } from "@/lib/http/route-params";
import { areaIn2, tidy } from "@/lib/format/quantity-pairs";
import { fromSI } from "@/lib/engineering/units";
import { getLogAnalysis } from "@/lib/tuning/logs";

/** A log's analysis as kept: the bins against the target, each stage's correction, and the main-jet advice. */
export const GET = apiRoute({ roles: OFFICE_ROLES, params: idParams("id", "logId") }, async ({ user, params }) => {
  const { analysis } = await getLogAnalysis(user, params.id, params.logId);
  return Response.json({
    bins: analysis.bins.map((b) => ({
      mode: b.mode,
      gaugePsi: tidy(fromSI("pressure", b.gaugePa, "psi"), 4),
      count: b.count,
      lambda: tidy(b.lambda, 4),
      targetLambda: tidy(b.targetLambda, 4),
    })),
    corrections: analysis.corrections.map((c) => ({
      stageId: c.stageId,
      side: c.side,
      mode: c.mode,
      currentAreaIn2: areaIn2(c.currentAreaM2),
      proposedAreaIn2: areaIn2(c.proposedAreaM2),
      changePct: c.changePct === null ? null : tidy(c.changePct, 4),
      layout: c.layout,
      limitedBy: c.limitedBy,
      // The change as the machinist will read it on the traveler.
      change: c.change,
    })),
    jetAdvice: analysis.jetAdvice ? { side: analysis.jetAdvice.side, message: analysis.jetAdvice.message } : null,
  });
});
