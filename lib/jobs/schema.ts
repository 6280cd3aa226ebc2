import { z } from "zod";
import { optionalQuantity } from "@/lib/forms/quantity/quantity";
import { optionalQuantityInSI, quantityInSI } from "@/lib/forms/quantity/si";
import { JOB_STATES } from "@/db/job-states";
import { formText } from "@/lib/forms/text-field";
import { SITE_ELEVATION_RANGE_M } from "@/lib/engineering/atmosphere";
import { M_PER_FT, M_PER_IN as IN, PA_PER_INHG, PA_PER_PSI as PSI } from "@/lib/engineering/unit-factors";

// Schemas of the job forms, shared by the Conform forms, the server actions and the JSON API. Quantities come
// as { value, unit } and leave as SI.

const lambda = (label: string) =>
  z.coerce
    .number({ error: `Enter ${label}.` })
    .min(0.5, { error: `${label} must be between 0.5 and 1.2.` })
    .max(1.2, { error: `${label} must be between 0.5 and 1.2.` });

const percent = (label: string, min = 1, max = 100) =>
  z.coerce.number({ error: `Enter ${label}.` }).min(min, { error: `${label} must be ${min}-${max} %.` }).max(max, { error: `${label} must be ${min}-${max} %.` });


/** A site elevation in m or ft, parsed to metres within the range a shop plans for (below sea level too). */
function siteElevationInMetres(q: { value: number; unit: "m" | "ft" }, ctx: z.RefinementCtx) {
  const m = q.unit === "ft" ? q.value * M_PER_FT : q.value;
  if (m < SITE_ELEVATION_RANGE_M.min || m > SITE_ELEVATION_RANGE_M.max) {
    ctx.addIssue({ code: "custom", path: ["value"], message: `The site elevation must be between ${SITE_ELEVATION_RANGE_M.min} and ${SITE_ELEVATION_RANGE_M.max} m.` });
    return z.NEVER;
  }
  return m;
}

const optionalSiteElevation = optionalQuantity("site elevation", ["m", "ft"], {}).transform((q, ctx) =>
  q === undefined ? undefined : siteElevationInMetres(q, ctx),
);

const checkbox = z.preprocess((v) => v === true || v === "on" || v === "true", z.boolean());

export const jobFieldsSchema = z.object({
  carburetor: z.string({ error: "Describe the carburetor." }).trim().min(3, { error: "Describe the carburetor." }).max(200),
  displacement: quantityInSI("displacement", "displacement", ["L", "in³", "cc"], { min: 0, si: { max: 0.02 } }),
  fuelKind: z.enum(["gasoline", "ethanol", "methanol", "blend", "custom"], { error: "Choose the fuel." }),
  ethanolPct: percent("ethanol content", 0, 100).optional(),
  fuelDensityKgM3: z.coerce.number().min(500, { error: "Fuel density must be 500-1500 kg/m³." }).max(1500, { error: "Fuel density must be 500-1500 kg/m³." }).optional(),
  fuelStoichAfr: z.coerce.number().min(1, { error: "Stoichiometric AFR must be 1-20." }).max(20, { error: "Stoichiometric AFR must be 1-20." }).optional(),
  targetPower: optionalQuantityInSI("power", "target power", ["hp", "kW"], { min: 0, si: { max: 5e6 } }),
  peakBoost: quantityInSI("pressure", "peak boost", ["psi", "kPa", "bar"], { min: 0, si: { max: 60 * PSI } }),
  targetLambdaAtmosphere: lambda("target lambda at atmospheric pressure"),
  targetLambdaPeak: lambda("target lambda at peak boost"),
  intercooled: checkbox,
  chargeTemperature: optionalQuantityInSI("temperature", "charge temperature", ["°F", "°C", "K"], {}),
  ambientTemperature: quantityInSI("temperature", "ambient temperature", ["°F", "°C", "K"], {}),
  // Absolute (a barometer's station reading): 50-110 kPa spans every inhabited site and weather.
  ambientPressure: optionalQuantityInSI("pressure", "ambient pressure", ["kPa", "inHg", "psi"], { min: 0, si: { min: 50_000, max: 110_000 } }),
  siteElevation: optionalSiteElevation,
  cruiseLambda: lambda("cruise lambda").optional(),
  drillSystem: z.enum(["inch", "metric", "mixed"], { error: "drillSystem must be inch, metric or mixed." }).optional(),
  compressorEfficiencyPct: percent("compressor efficiency", 30, 95),
  intercoolerEffectivenessPct: percent("intercooler effectiveness", 0, 100),
  useAllDrills: checkbox,
  notes: z.string().trim().max(4000).default(""),
});

/** The ambient comes from a barometer or from the site's elevation: one of them at most. */
export function requireOneAmbient(job: { ambientPressure?: number | undefined; siteElevation?: number | undefined }, ctx: z.RefinementCtx) {
  if (job.ambientPressure !== undefined && job.siteElevation !== undefined) {
    ctx.addIssue({ code: "custom", path: ["siteElevation"], message: "Give either the ambient pressure or the site elevation, not both." });
  }
}

function requireFuelDetails(
  job: { fuelKind?: string; ethanolPct?: number; fuelDensityKgM3?: number; fuelStoichAfr?: number; ambientPressure?: number; siteElevation?: number },
  ctx: z.RefinementCtx,
) {
  requireOneAmbient(job, ctx);
  if (job.fuelKind === "blend" && job.ethanolPct === undefined) {
    ctx.addIssue({ code: "custom", path: ["ethanolPct"], message: "Enter the ethanol content of the blend (85 for E85)." });
  }
  if (job.fuelKind === "custom") {
    if (job.fuelDensityKgM3 === undefined) ctx.addIssue({ code: "custom", path: ["fuelDensityKgM3"], message: "Enter the fuel's density." });
    if (job.fuelStoichAfr === undefined) ctx.addIssue({ code: "custom", path: ["fuelStoichAfr"], message: "Enter the fuel's stoichiometric AFR." });
  }
}

export const createJobSchema = jobFieldsSchema
  .extend({
    customerId: z.uuid({ error: "Choose a customer or enter a new one." }).optional(),
    newCustomerName: z.string().trim().max(120).optional(),
    tunerId: z.uuid({ error: "Choose a tuner." }).optional(),
  })
  .superRefine((job, ctx) => {
    requireFuelDetails(job, ctx);
    if (!job.customerId && !job.newCustomerName) {
      ctx.addIssue({ code: "custom", path: ["customerId"], message: "Choose a customer or enter a new one." });
    }
  });
export type CreateJobInput = z.output<typeof createJobSchema>;

/** The editor's confirmation that a job in machining goes on hold (a checkbox "on", or true from the API). */
export const confirmHoldField = z.preprocess((v) => v === "on" || v === "true" || v === true, z.boolean()).optional();

export const updateJobSchema = jobFieldsSchema
  .extend({
    tunerId: z.uuid({ error: "Choose a tuner." }).optional(),
    customerId: z.uuid({ error: "Choose a customer." }).optional(),
    confirmHold: confirmHoldField,
  })
  .superRefine(requireFuelDetails);
export type UpdateJobInput = z.output<typeof updateJobSchema>;

const stageSchema = z
  .object({
    valveKind: z.enum(["vacuum", "boost"], { error: "Choose the valve: vacuum or boost-referenced." }),
    vacuumRating: optionalQuantityInSI("pressure", "vacuum rating", ["inHg", "kPa"], { min: 0, si: { max: 30 * PA_PER_INHG } }),
    setpoint: optionalQuantityInSI("pressure", "opening pressure", ["psi", "kPa", "bar"], { min: 0, si: { max: 60 * PSI } }),
    targetKind: z.enum(["afr", "lambda", "percentMainJet", "area"], { error: "Choose how the enrichment is given." }),
    mode: z.enum(["part", "full"], { error: "mode must be part (primary side alone) or full (both sides)." }).optional(),
    targetFrom: z.coerce.number().positive({ error: "Enter the mixture before the stage opens." }).optional(),
    targetTo: z.coerce.number({ error: "Enter the enrichment target." }).positive({ error: "The enrichment target must be greater than 0." }).optional(),
    targetArea: optionalQuantityInSI("area", "target area", ["in²", "mm²"], { min: 0, si: { max: 1 * IN * IN } }),
    valveWindowArea: optionalQuantityInSI("area", "valve window area", ["in²", "mm²"], { min: 0, si: { max: 1 * IN * IN } }),
    maxHoles: z.coerce.number({ error: "Holes must be 1 to 4." }).int({ error: "Holes must be 1 to 4." }).min(1, { error: "Holes must be 1 to 4." }).max(4, { error: "Holes must be 1 to 4." }),
  })
  .superRefine((stage, ctx) => {
    if (stage.valveKind === "vacuum" && stage.vacuumRating === undefined) {
      ctx.addIssue({ code: "custom", path: ["vacuumRating", "value"], message: "Enter the vacuum valve's rating." });
    }
    if (stage.valveKind === "boost" && stage.setpoint === undefined) {
      ctx.addIssue({ code: "custom", path: ["setpoint", "value"], message: "Enter the boost valve's opening pressure." });
    }
    if ((stage.targetKind === "afr" || stage.targetKind === "lambda") && stage.targetFrom === undefined) {
      ctx.addIssue({ code: "custom", path: ["targetFrom"], message: "Enter the mixture before the stage opens." });
    }
    if (stage.targetKind === "area" && stage.targetArea === undefined) {
      ctx.addIssue({ code: "custom", path: ["targetArea", "value"], message: "Enter the restriction area the stage must add." });
    }
    if (stage.targetKind !== "area" && stage.targetTo === undefined) {
      ctx.addIssue({ code: "custom", path: ["targetTo"], message: "Enter the enrichment target." });
    }
    if ((stage.targetKind === "afr" || stage.targetKind === "lambda") && stage.targetFrom !== undefined && stage.targetTo !== undefined && stage.targetTo >= stage.targetFrom) {
      ctx.addIssue({ code: "custom", path: ["targetTo"], message: "An enrichment stage must make the mixture richer (a lower number)." });
    }
  });

const length = (label: string) => optionalQuantityInSI("length", label, ["in", "mm"], { min: 0, si: { max: 0.1 } });

export const blockSchema = z.object({
  side: z.enum(["primary", "secondary"], { error: "Choose the side: primary or secondary." }),
  mainJetDiameter: quantityInSI("length", "main-jet diameter", ["in", "mm"], { min: 0, si: { max: 0.25 * IN } }),
  mainJetCount: z.coerce.number({ error: "Main jets must be 1 to 4." }).int().min(1, { error: "Main jets must be 1 to 4." }).max(4, { error: "Main jets must be 1 to 4." }),
  channelLength: length("channel length"),
  minWeb: optionalQuantityInSI("length", "minimum web", ["in", "mm"], { min: 0, minInclusive: true, si: { max: 0.1 } }),
  passageDiameter: length("vacuum passage diameter"),
  passageWall: length("wall around the passage"),
  passageDepth: length("depth available at the passage"),
  valveProtrusion: length("valve protrusion"),
  runningClearance: length("running clearance"),
  measuredGap: optionalQuantityInSI("length", "measured clay gap", ["in", "mm"], { min: 0, minInclusive: true, si: { max: 0.1 } }),
  bossWall: length("boss wall"),
  tubeRun1: length("first straight run"),
  tubeRun2: length("second straight run"),
  tubeBendDeg: z.coerce.number().min(0, { error: "Bend angle must be 0-180°." }).max(180, { error: "Bend angle must be 0-180°." }).optional(),
  tubeBendRadius: length("bend radius"),
  tubeSwage: length("swage engagement"),
  tubeMaxRearward: length("room rearward for the tube"),
  tubeMaxDownward: length("room downward for the tube"),
  stages: z.array(stageSchema, { error: "Add at least one enrichment stage." }).min(1, { error: "Add at least one enrichment stage." }).max(6),
});

export const jobBlocksSchema = z
  .object({
    confirmHold: confirmHoldField,
    blocks: z.array(blockSchema, { error: "Add a metering block." }).min(1, { error: "Add a metering block." }).max(2, { error: "A carburetor has at most a primary and a secondary block." }),
  })
  .superRefine((value, ctx) => {
    const sides = value.blocks.map((b) => b.side);
    if (new Set(sides).size !== sides.length) ctx.addIssue({ code: "custom", path: ["blocks"], message: "Each side may have only one metering block." });
    value.blocks.forEach((block, b) =>
      block.stages.forEach((stage, s) => {
        if (block.side === "secondary" && stage.mode === "part") {
          ctx.addIssue({ code: "custom", path: ["blocks", b, "stages", s, "mode"], message: "A secondary stage is read in full throttle: the secondaries are shut at part throttle." });
        }
      }),
    );
  });
export type JobBlocksInput = z.output<typeof jobBlocksSchema>;

export const jobStateChangeSchema = z.object({
  to: z.enum(JOB_STATES, { error: `to must be one of ${JOB_STATES.join(", ")}` }),
  /** Approving a plan with danger warnings needs this, and it is recorded with the revision. */
  acknowledgeWarnings: z
    .preprocess((v) => (v === "on" || v === "true" ? true : v === "false" ? false : v), z.boolean({ error: "acknowledgeWarnings must be true or false." }))
    .optional(),
  /** Delivering: the person who took the blocks, by name (kept with the delivery and printed on the record). */
  handedTo: formText("name of who took the blocks", { max: 200 }).optional(),
}).superRefine((value, ctx) => {
  if (value.to === "delivered" && !value.handedTo) {
    ctx.addIssue({ code: "custom", path: ["handedTo"], message: "Say who the blocks were handed to." });
  }
});

export const stageChoiceSchema = z.object({
  stageId: z.uuid({ error: "stageId must be a stage's id." }),
  count: z.coerce.number().int().min(1).max(4),
  drillLabel: z.string().trim().min(1, { error: "Choose a drill." }),
});

export const jobListQuerySchema = z.object({
  state: z.enum(JOB_STATES, { error: `state must be one of ${JOB_STATES.join(", ")}` }).optional(),
  customer: z.uuid({ error: "customer must be a customer's id" }).optional(),
  tuner: z.uuid({ error: "tuner must be a user's id" }).optional(),
  q: z.string().trim().max(100).optional(),
  page: z.coerce.number({ error: "page must be a whole number from 1" }).int().min(1, { error: "page must be a whole number from 1" }).default(1),
  pageSize: z.coerce.number({ error: "pageSize must be 1-100" }).int().min(1, { error: "pageSize must be 1-100" }).max(100, { error: "pageSize must be 1-100" }).default(20),
  sort: z.enum(["number", "state", "customer", "tuner", "updatedAt"], { error: "sort must be number, state, customer, tuner or updatedAt" }).default("updatedAt"),
  dir: z.enum(["asc", "desc"], { error: "dir must be asc or desc" }).default("desc"),
});
export type JobListQuery = z.output<typeof jobListQuerySchema>;
