import { z } from "zod";
import { calculatorRoute } from "@/lib/http/api-route";
import { ALL_THREADS } from "@/lib/engineering/threads";
import { toSI } from "@/lib/engineering/units";
import { quantity } from "@/lib/forms/quantity/quantity";
import { FORM_LENGTH_UNITS } from "@/lib/forms/quantity/units";
import { drillList, threadList } from "@/lib/forms/trade-fields";
import { planPassagePlug } from "@/app/(office)/reference/calculators/tap-drill/compute";
import { engagementSchema } from "@/app/(office)/reference/calculators/tap-drill/schema";

const zeroOrMore = { min: 0, minInclusive: true } as const;

const bodySchema = z.object({
  passageDiameter: quantity("passage diameter", FORM_LENGTH_UNITS),
  wall: quantity("wall thickness", FORM_LENGTH_UNITS, zeroOrMore),
  depth: quantity("depth available", FORM_LENGTH_UNITS),
  engagement: engagementSchema.optional(),
  minWall: quantity("least wall to keep", FORM_LENGTH_UNITS, zeroOrMore).optional(),
  threads: threadList("threads").optional(),
  drills: drillList("drills").optional(),
});

const length = (q: { value: number; unit: (typeof FORM_LENGTH_UNITS)[number] }) => toSI("length", q.value, q.unit);
const inches = (pair: { in: number }) => pair.in;

/** The set-screw plug for a vacuum passage, or 422 no_plug naming the drill or thread the shop lacks. Public. */
export const POST = calculatorRoute(bodySchema, (body) => {
  const plug = planPassagePlug({
    passageDiameterM: length(body.passageDiameter),
    wallThicknessM: length(body.wall),
    depthAvailableM: length(body.depth),
    engagementPct: body.engagement,
    minWallM: body.minWall === undefined ? undefined : length(body.minWall),
    threads: body.threads ?? ALL_THREADS,
    drills: body.drills,
  });
  return {
    plug: {
      thread: { label: plug.thread.label },
      drill: { label: plug.drill.label, inch: plug.drill.inch, mm: plug.drill.mm },
      engagementPct: plug.engagementPct,
      tapDepthIn: inches(plug.tapDepth),
      drillDepthIn: inches(plug.drillDepth),
      setScrew: plug.setScrew === null ? null : { label: plug.setScrew.label },
      wallLeftIn: inches(plug.remainingWall),
      warnings: plug.warnings,
    },
  };
});
