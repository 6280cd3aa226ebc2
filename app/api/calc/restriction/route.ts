import { z } from "zod";
import { apiRoute } from "@/lib/http/api-route";
import { areaIn2, drillDto, tidy } from "@/lib/format/quantity-pairs";
import { ALL_DRILLS } from "@/lib/engineering/drills";
import { MAX_HOLES_PER_CHANNEL, solveHoleLayout } from "@/lib/engineering/hole-layout";
import { DEFAULT_RESTRICTION_DRILL_LIMITS } from "@/lib/engineering/restriction-limits";
import { toSI } from "@/lib/engineering/units";
import { nonNegativeNumber, positiveNumber } from "@/lib/forms/quantity/figures";
import { drillList } from "@/lib/forms/trade-fields";

const bodySchema = z
  .object({
    targetAreaIn2: positiveNumber("targetAreaIn2").optional(),
    targetAreaMm2: positiveNumber("targetAreaMm2").optional(),
    maxHoles: z
      .number({ error: "maxHoles must be a whole number from 1 to 4" })
      .int({ error: "maxHoles must be a whole number from 1 to 4" })
      .min(1, { error: "maxHoles must be a whole number from 1 to 4" })
      .max(MAX_HOLES_PER_CHANNEL, { error: "maxHoles must be a whole number from 1 to 4" }),
    drills: drillList("drills").optional(),
    valveAreaIn2: positiveNumber("valveAreaIn2").optional(),
    channelLengthIn: positiveNumber("channelLengthIn").optional(),
    minWebIn: nonNegativeNumber("minWebIn").optional(),
    limit: z.number().int().min(1).max(2000).optional(),
  })
  .refine((b) => (b.targetAreaIn2 === undefined) !== (b.targetAreaMm2 === undefined), {
    error: "give exactly one of targetAreaIn2 or targetAreaMm2",
    path: ["targetAreaIn2"],
  });

/** Hole layouts (count x drill) for a channel restriction, best first. */
export const POST = apiRoute({ roles: "public", body: bodySchema }, async ({ body }) => {
  const drills = body.drills ?? ALL_DRILLS;
  const inches = (v: number | undefined) => (v === undefined ? undefined : toSI("length", v, "in"));
  const candidates = solveHoleLayout({
    targetEffectiveAreaM2: body.targetAreaIn2 !== undefined ? toSI("area", body.targetAreaIn2, "in²") : toSI("area", body.targetAreaMm2!, "mm²"),
    drills,
    // Drills named by the caller are used as given, in any system; the default list keeps to the inch series.
    limits: { ...DEFAULT_RESTRICTION_DRILL_LIMITS, system: body.drills ? "mixed" : "inch" },
    maxHoles: body.maxHoles,
    valveWindowAreaM2: body.valveAreaIn2 === undefined ? undefined : toSI("area", body.valveAreaIn2, "in²"),
    channelLengthM: inches(body.channelLengthIn),
    minWebM: inches(body.minWebIn),
    limit: body.limit ?? 50,
  }).candidates;
  return Response.json({
    candidates: candidates.map((c) => ({
      count: c.count,
      drill: drillDto(c.drill),
      holesAreaIn2: areaIn2(c.holesAreaM2),
      effectiveAreaIn2: areaIn2(c.effectiveAreaM2),
      errorPct: tidy(c.errorPct, 3),
      fits: c.fits,
      valveLimited: c.valveLimited,
    })),
  });
});
