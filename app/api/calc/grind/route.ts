import { calculatorRoute } from "@/lib/http/api-route";
import { computeGrind } from "@/app/(office)/reference/calculators/grind/compute";
import { grindSchema } from "@/app/(office)/reference/calculators/grind/schema";

/** Clearance grind of the boss: depth, passes and clay checks, or why not to grind. Public, like the form. */
export const POST = calculatorRoute(grindSchema, computeGrind);
