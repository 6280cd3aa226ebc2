import "server-only";
import type { Job } from "@/db/schema";
import type { DisplayLengthUnit } from "@/lib/format/display";
import { FUEL_KIND_LABELS, fuelProperties } from "@/lib/engineering/fuels";
import { fuelSpecOf } from "@/lib/jobs/plan";
import { fromSI, M_PER_FT, STANDARD_ATMOSPHERE_PA } from "@/lib/engineering/units";
import { Fact, Facts } from "./facts";
import { displacement, percent, power, psi, temperature } from "./format";

export type EngineFacts = Pick<
  Job,
  | "displacementM3"
  | "fuelKind"
  | "fuelEthanolPct"
  | "fuelDensityKgM3"
  | "fuelStoichAfr"
  | "targetPowerW"
  | "peakBoostPa"
  | "targetLambdaAtmosphere"
  | "targetLambdaPeak"
  | "intercooled"
  | "chargeTemperatureK"
  | "ambientTemperatureK"
  | "compressorEfficiency"
  | "intercoolerEffectiveness"
  | "useAllDrills"
  | "notes"
> &
  // Revisions approved before the job kept its site and cruise have none: sea level, cruise 1.0, inch drills.
  Partial<Pick<Job, "ambientPressurePa" | "siteElevationM" | "cruiseLambda" | "drillSystem">>;

const DRILL_SYSTEM_TEXT = { inch: "inch sizes", metric: "metric sizes", mixed: "inch and metric sizes" } as const;

/** Engine, fuel and boost as the tuner entered them, each figure with its unit. */
export function EngineSummary({ job, unit }: { job: EngineFacts; unit: DisplayLengthUnit }) {
  const fuel = fuelProperties(fuelSpecOf(job));
  const fuelName = job.fuelKind === "blend" ? `E${job.fuelEthanolPct ?? 85}` : FUEL_KIND_LABELS[job.fuelKind];
  const afr = (lambda: number) => (lambda * fuel.stoichAfr).toFixed(1);
  return (
    <Facts label="Engine and fuel">
      <Fact label="Displacement">{displacement(job.displacementM3)}</Fact>
      <Fact label="Fuel" plain>
        {fuelName}
      </Fact>
      <Fact label="Stoichiometric AFR">{fuel.stoichAfr.toFixed(2)} : 1</Fact>
      <Fact label="Fuel density">{fuel.densityKgM3.toFixed(0)} kg/m³</Fact>
      {job.targetPowerW !== null ? <Fact label="Target power">{power(job.targetPowerW)}</Fact> : null}
      <Fact label="Peak boost">{psi(job.peakBoostPa)}</Fact>
      <Fact label="Target at 0 psi">
        λ {job.targetLambdaAtmosphere.toFixed(2)} · AFR {afr(job.targetLambdaAtmosphere)}
      </Fact>
      <Fact label="Target at peak boost">
        λ {job.targetLambdaPeak.toFixed(2)} · AFR {afr(job.targetLambdaPeak)}
      </Fact>
      {job.chargeTemperatureK !== null ? (
        <Fact label="Charge temperature">{temperature(job.chargeTemperatureK, unit)} measured</Fact>
      ) : (
        <Fact label="Charge temperature" plain>
          estimated from the compressor
        </Fact>
      )}
      <Fact label="Compressor efficiency">{percent(job.compressorEfficiency, 0)}</Fact>
      <Fact label="Intercooler">{job.intercooled ? `${percent(job.intercoolerEffectiveness, 0)} effective` : "none"}</Fact>
      <Fact label="Ambient">{temperature(job.ambientTemperatureK, unit)}</Fact>
      <Fact label="Ambient pressure">
        {unit === "in" ? `${fromSI("pressure", job.ambientPressurePa ?? STANDARD_ATMOSPHERE_PA, "inHg").toFixed(2)} inHg` : `${fromSI("pressure", job.ambientPressurePa ?? STANDARD_ATMOSPHERE_PA, "kPa").toFixed(1)} kPa`}
        {job.siteElevationM !== null && job.siteElevationM !== undefined
          ? ` · standard atmosphere at ${unit === "in" ? `${(job.siteElevationM / M_PER_FT).toFixed(0)} ft` : `${job.siteElevationM.toFixed(0)} m`}`
          : " absolute"}
      </Fact>
      <Fact label="Cruise target">
        λ {(job.cruiseLambda ?? 1).toFixed(2)} · AFR {afr(job.cruiseLambda ?? 1)}
      </Fact>
      <Fact label="Drills solved from" plain>
        {job.useAllDrills ? "every standard drill" : "the shop's rack"}, {DRILL_SYSTEM_TEXT[job.drillSystem ?? "inch"]}
      </Fact>
      {job.notes ? (
        <Fact label="Notes" plain>
          <span className="whitespace-pre-line">{job.notes}</span>
        </Fact>
      ) : null}
    </Facts>
  );
}
