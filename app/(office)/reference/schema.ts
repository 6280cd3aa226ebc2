import { z } from "zod";
import { FORM_LENGTH_UNITS } from "@/lib/forms/quantity/units";

/** The inch/mm switch: which unit lengths and areas are shown in, remembered per user. */
export const lengthUnitSchema = z.object({
  lengthUnit: z.enum(FORM_LENGTH_UNITS, { error: "Choose inch (in) or millimetre (mm)." }),
});
