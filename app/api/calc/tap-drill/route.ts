import { z } from "zod";
import { apiRoute, invalidInput } from "@/lib/http/api-route";
import { drillDto, tidy } from "@/lib/format/quantity-pairs";
import { parseThread, tapDrill } from "@/lib/engineering/threads";
import { engagementSchema } from "@/app/(office)/reference/calculators/tap-drill/schema";
import { fromSI } from "@/lib/engineering/units";

const querySchema = z.object({
  thread: z
    .string({ error: 'thread is required, e.g. "4-40" or "M3x0.5"' })
    .trim()
    .min(1, { error: 'thread is required, e.g. "4-40" or "M3x0.5"' })
    .max(40),
  engagement: z.coerce.number({ error: "engagement must be a percentage" }).pipe(engagementSchema).optional(),
  allowOtherSystem: z.enum(["true", "false"], { error: "allowOtherSystem must be true or false" }).optional(),
});

/** Tap drill for a thread at a target engagement: the ideal diameter and the nearest standard drill. */
export const GET = apiRoute({ roles: "public", query: querySchema }, async ({ query }) => {
  const thread = parseThread(query.thread);
  if (!thread) {
    return invalidInput(
      new z.ZodError([{ code: "custom", path: ["thread"], message: `"${query.thread}" is not a Unified #0-1/2 in or ISO M1.6-M12 thread`, input: query.thread }]),
    );
  }
  const result = tapDrill(thread, { engagementPct: query.engagement ?? 75, allowOtherSystem: query.allowOtherSystem === "true" });
  return Response.json({
    thread: {
      label: thread.label,
      system: thread.system,
      series: thread.series,
      majorIn: tidy(fromSI("length", thread.majorM, "in")),
      pitchIn: tidy(fromSI("length", thread.pitchM, "in"), 7),
      majorMm: tidy(fromSI("length", thread.majorM, "mm"), 4),
      pitchMm: tidy(fromSI("length", thread.pitchM, "mm"), 4),
    },
    idealIn: tidy(fromSI("length", result.idealM, "in")),
    idealMm: tidy(fromSI("length", result.idealM, "mm"), 4),
    drill: drillDto(result.drill),
    engagementPct: tidy(result.engagementPct, 2),
  });
});
