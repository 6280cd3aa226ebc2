import { z } from "zod";
import { apiRoute } from "@/lib/http/api-route";
import { drillDto } from "@/lib/format/quantity-pairs";
import { ALL_DRILLS, DRILL_SYSTEMS } from "@/lib/engineering/drills";

const querySchema = z.object({
  system: z.enum(DRILL_SYSTEMS as [string, ...string[]], { error: "system must be number, letter, fraction or metric" }).optional(),
});

/** The standard drill series, smallest first. Public: it holds no shop data. */
export const GET = apiRoute({ roles: "public", query: querySchema }, async ({ query }) => {
  const drills = query.system ? ALL_DRILLS.filter((d) => d.system === query.system) : ALL_DRILLS;
  return Response.json({ drills: drills.map(drillDto) });
});
