import { z } from "zod";
import { invalidInput } from "@/lib/api";
import { drillDto } from "@/lib/calc-dto";
import { ALL_DRILLS, DRILL_SYSTEMS } from "@/lib/engineering/drills";

const querySchema = z.object({
  system: z.enum(DRILL_SYSTEMS as [string, ...string[]], { error: "system must be number, letter, fraction or metric" }).optional(),
});

/** The standard drill series, smallest first. Public: it holds no shop data. */
export async function GET(request: Request) {
  const query = querySchema.safeParse(Object.fromEntries(new URL(request.url).searchParams));
  if (!query.success) return invalidInput(query.error);
  const drills = query.data.system ? ALL_DRILLS.filter((d) => d.system === query.data.system) : ALL_DRILLS;
  return Response.json({ drills: drills.map(drillDto) });
}
