import { calculatorRoute } from "@/lib/http/api-route";
import { computeStaging } from "@/app/(office)/reference/calculators/staging/compute";
import { stagingSchema } from "@/app/(office)/reference/calculators/staging/schema";

/** A carburetor's staging chart as entered, or (command "propose") proposed boost-valve setpoints. Public. */
export const POST = calculatorRoute(stagingSchema, computeStaging);
