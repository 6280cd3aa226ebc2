import { z } from "zod";
import { apiError, apiRoute } from "@/lib/http/api-route";
import { areaIn2, areaMm2, tidy } from "@/lib/format/quantity-pairs";
import { fuelProperties } from "@/lib/engineering/fuels";
import { areaFromMassFlow, diameterForArea } from "@/lib/engineering/orifice";
import { fromSI, MASS_FLOW_UNITS, PRESSURE_UNITS, toSI, VOLUME_FLOW_UNITS, type MassFlowUnit } from "@/lib/engineering/units";
import { fuelDensity, positiveNumber } from "@/lib/forms/quantity/figures";
import { quantity } from "@/lib/forms/quantity/quantity";
import { fuelSchema } from "@/lib/forms/trade-fields";

const FLOW_UNITS = [...MASS_FLOW_UNITS, ...VOLUME_FLOW_UNITS] as const;

function isMassFlowUnit(unit: (typeof FLOW_UNITS)[number]): unit is MassFlowUnit {
  return (MASS_FLOW_UNITS as readonly string[]).includes(unit);
}

const bodySchema = z
  .object({
    flow: quantity("fuel flow", FLOW_UNITS),
    dP: quantity("pressure difference (dP)", PRESSURE_UNITS),
    cd: positiveNumber("cd").refine((v) => v <= 1, { error: "cd must not exceed 1" }),
    fuel: fuelSchema.optional(),
    densityKgM3: fuelDensity("densityKgM3").optional(),
  })
  .refine((b) => b.fuel !== undefined || b.densityKgM3 !== undefined, { error: "give fuel or densityKgM3", path: ["fuel"] });

/** Orifice area that passes a fuel flow at a pressure difference: A = m / (Cd sqrt(2 rho dP)). */
export const POST = apiRoute({ roles: "public", body: bodySchema }, async ({ body }) => {
  const { flow, dP, cd } = body;
  let densityKgM3: number;
  try {
    densityKgM3 = body.densityKgM3 ?? fuelProperties(body.fuel!).densityKgM3;
  } catch (error) {
    return apiError(400, "invalid_input", `fuel: ${(error as Error).message}`, { field: "fuel" });
  }
  const massFlowKgS = isMassFlowUnit(flow.unit)
    ? toSI("massFlow", flow.value, flow.unit)
    : toSI("volumeFlow", flow.value, flow.unit) * densityKgM3;
  const areaM2 = areaFromMassFlow({ massFlowKgS, cd, densityKgM3, deltaPPa: toSI("pressure", dP.value, dP.unit) });
  return Response.json({
    areaIn2: areaIn2(areaM2),
    areaMm2: areaMm2(areaM2),
    singleHoleDiameterIn: tidy(fromSI("length", diameterForArea(areaM2), "in")),
    singleHoleDiameterMm: tidy(fromSI("length", diameterForArea(areaM2), "mm"), 4),
    massFlowKgS,
    densityKgM3,
  });
});
