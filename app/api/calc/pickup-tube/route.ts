import { calculatorRoute } from "@/lib/http/api-route";
import { computePickupTube } from "@/app/(office)/reference/calculators/pickup-tube/compute";
import { pickupTubeSchema } from "@/app/(office)/reference/calculators/pickup-tube/schema";

/** Pickup tube cut length and reach, and whether it fits the room the bowl leaves. Public, like the form. */
export const POST = calculatorRoute(pickupTubeSchema, computePickupTube);
