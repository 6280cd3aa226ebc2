import "server-only";
import type { Job } from "@/db/schema";
import type { DisplayLengthUnit } from "@/lib/format/display";
import { fromSI, M_PER_FT } from "@/lib/engineering/units";
import type { JobFieldsForm } from "../../job-fields-shape";

/** A stored figure as a person would type it: six significant digits, no float noise. */
export const typed = (v: number) => Number(v.toPrecision(6));

/** The stored job (SI) as the form's starting values, in the units the user works in. */
export function jobFormValues(job: Job, unit: DisplayLengthUnit): JobFieldsForm {
  const inch = unit === "in";
  const temperatureUnit = inch ? "°F" : "°C";
  const displacementUnit = inch ? "in³" : "L";
  const powerUnit = inch ? "hp" : "kW";
  const boostUnit = inch ? "psi" : "kPa";
  return {
    carburetor: job.carburetor,
    displacement: { value: typed(fromSI("displacement", job.displacementM3, displacementUnit)), unit: displacementUnit },
    fuelKind: job.fuelKind,
    ethanolPct: job.fuelEthanolPct ?? undefined,
    fuelDensityKgM3: job.fuelDensityKgM3 ?? undefined,
    fuelStoichAfr: job.fuelStoichAfr ?? undefined,
    targetPower: { value: job.targetPowerW === null ? undefined : typed(fromSI("power", job.targetPowerW, powerUnit)), unit: powerUnit },
    peakBoost: { value: typed(fromSI("pressure", job.peakBoostPa, boostUnit)), unit: boostUnit },
    targetLambdaAtmosphere: job.targetLambdaAtmosphere,
    targetLambdaPeak: job.targetLambdaPeak,
    intercooled: job.intercooled,
    chargeTemperature: {
      value: job.chargeTemperatureK === null ? undefined : typed(fromSI("temperature", job.chargeTemperatureK, temperatureUnit)),
      unit: temperatureUnit,
    },
    ambientTemperature: { value: typed(fromSI("temperature", job.ambientTemperatureK, temperatureUnit)), unit: temperatureUnit },
    compressorEfficiencyPct: typed(job.compressorEfficiency * 100),
    intercoolerEffectivenessPct: typed(job.intercoolerEffectiveness * 100),
    useAllDrills: job.useAllDrills,
    ...(job.siteElevationM !== null
      ? { siteElevation: inch ? { value: typed(job.siteElevationM / M_PER_FT), unit: "ft" as const } : { value: typed(job.siteElevationM), unit: "m" as const } }
      : { ambientPressure: inch ? { value: typed(fromSI("pressure", job.ambientPressurePa, "inHg")), unit: "inHg" as const } : { value: typed(fromSI("pressure", job.ambientPressurePa, "kPa")), unit: "kPa" as const } }),
    cruiseLambda: job.cruiseLambda,
    drillSystem: job.drillSystem,
    notes: job.notes,
  };
}
