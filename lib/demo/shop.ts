import "server-only";
// The invented demo shop: its drill rack, customers and three jobs in different states (draft, released,
// verified). Uses the real data layer so the demo follows the same rules as the app.
import { eq } from "drizzle-orm";
import { FRACTION_DRILLS, LETTER_DRILLS, NUMBER_DRILLS } from "@/lib/engineering/drills";
import { M3_PER_L as L, M_PER_IN as IN, PA_PER_INHG as INHG, PA_PER_PSI as PSI, W_PER_HP } from "@/lib/engineering/unit-factors";
import { getDb } from "@/db/client";
import { insertCustomer } from "@/db/customers";
import { createJob, saveJobBlocks, type BlockFields, type JobFields, type StageFields } from "@/db/jobs";
import type { Viewer } from "@/db/visibility";
import { changeJobState } from "@/db/revisions";
import { approveRevision } from "@/lib/jobs/approve";
import { customers, measurements, operations, planRevisions, signOffs, stockedDrills, users } from "@/db/schema";

const DEMO_CUSTOMERS = [
  { name: "Castor Vell", email: "castor.vell@example.test", phone: "555-0141", notes: "Street car, pump gas, weekend drag strip." },
  { name: "Juniper Ashdown", email: "juniper@example.test", phone: "555-0188", notes: "Runs E85 from the track's own pump." },
  { name: "Odile Marchetti", email: null, phone: "555-0123", notes: "Methanol bracket car." },
] as const;

type DemoBlock = BlockFields & { stages: StageFields[] };

function stage(fields: Partial<StageFields> & Pick<StageFields, "valveKind" | "targetKind" | "targetTo">): StageFields {
  return { vacuumRatingPa: null, setpointPa: null, targetFrom: null, valveWindowAreaM2: null, maxHoles: 4, ...fields };
}

const baseBlock = {
  mainJetCount: 2,
  channelLengthM: 0.3 * IN,
  minWebM: 0.03 * IN,
  passageDiameterM: 0.085 * IN,
  passageWallM: 0.2 * IN,
  passageDepthM: 0.4 * IN,
  valveProtrusionM: 0.04 * IN,
  runningClearanceM: 0.03 * IN,
  measuredGapM: 0.005 * IN,
  bossWallM: 0.25 * IN,
  tubeRunsM: null,
  tubeBendDeg: null,
  tubeBendRadiusM: null,
  tubeSwageM: null,
};

const secondaryTube = { tubeRunsM: [0.25 * IN, 0.5 * IN], tubeBendDeg: 45, tubeBendRadiusM: 0.375 * IN, tubeSwageM: 0.2 * IN };

function jobFields(fields: Partial<JobFields> & Pick<JobFields, "carburetor" | "displacementM3" | "fuelKind" | "peakBoostPa">): JobFields {
  return {
    fuelEthanolPct: null,
    fuelDensityKgM3: null,
    fuelStoichAfr: null,
    targetPowerW: null,
    targetLambdaAtmosphere: 0.88,
    targetLambdaPeak: 0.78,
    intercooled: true,
    chargeTemperatureK: null,
    ambientTemperatureK: 298.15,
    compressorEfficiency: 0.7,
    intercoolerEffectiveness: 0.7,
    useAllDrills: false,
    notes: "",
    ...fields,
  };
}

export const DEMO_JOBS: { customer: number; fields: JobFields; blocks: DemoBlock[]; finalState: "draft" | "released" | "verified" }[] = [
  {
    customer: 0,
    finalState: "verified",
    fields: jobFields({
      carburetor: "Four-barrel, vacuum secondaries, 750 cfm class, blow-through hat",
      displacementM3: 5.7 * L,
      fuelKind: "gasoline",
      targetPowerW: 450 * W_PER_HP,
      peakBoostPa: 8 * PSI,
      notes: "Single turbo, air-to-air intercooler.",
    }),
    blocks: [
      {
        ...baseBlock,
        side: "primary",
        mainJetDiameterM: 0.076 * IN,
        stages: [
          stage({ valveKind: "vacuum", vacuumRatingPa: 6.5 * INHG, targetKind: "percentMainJet", targetTo: 13, mode: "part" }),
          stage({ valveKind: "boost", setpointPa: 2 * PSI, targetKind: "lambda", targetFrom: 0.93, targetTo: 0.83, mode: "full" }),
        ],
      },
      {
        ...baseBlock,
        ...secondaryTube,
        side: "secondary",
        mainJetDiameterM: 0.086 * IN,
        stages: [stage({ valveKind: "boost", setpointPa: 5 * PSI, targetKind: "lambda", targetFrom: 0.87, targetTo: 0.78, mode: "full" })],
      },
    ],
  },
  {
    customer: 1,
    finalState: "released",
    fields: jobFields({
      carburetor: "Four-barrel, mechanical secondaries, 850 cfm class, sealed throttle shafts",
      displacementM3: 6.2 * L,
      fuelKind: "blend",
      fuelEthanolPct: 85,
      peakBoostPa: 12 * PSI,
      targetLambdaPeak: 0.8,
      notes: "Twin turbos; charge temperature logged at 120 °F under boost.",
      chargeTemperatureK: 322.04,
    }),
    blocks: [
      {
        ...baseBlock,
        side: "primary",
        mainJetDiameterM: 0.098 * IN,
        stages: [
          stage({ valveKind: "vacuum", vacuumRatingPa: 5.5 * INHG, targetKind: "percentMainJet", targetTo: 13, mode: "part" }),
          stage({ valveKind: "boost", setpointPa: 2 * PSI, targetKind: "lambda", targetFrom: 0.93, targetTo: 0.84, mode: "full" }),
          // Part throttle under boost (a cruise up a grade) has only the primary side: its own stage.
          stage({ valveKind: "boost", setpointPa: 8 * PSI, targetKind: "lambda", targetFrom: 0.89, targetTo: 0.8, mode: "part" }),
        ],
      },
      {
        ...baseBlock,
        ...secondaryTube,
        side: "secondary",
        mainJetDiameterM: 0.104 * IN,
        stages: [
          stage({ valveKind: "boost", setpointPa: 5.5 * PSI, targetKind: "lambda", targetFrom: 0.91, targetTo: 0.81, mode: "full" }),
          stage({ valveKind: "boost", setpointPa: 9 * PSI, targetKind: "lambda", targetFrom: 0.87, targetTo: 0.8, mode: "full" }),
        ],
      },
    ],
  },
  {
    customer: 2,
    finalState: "draft",
    fields: jobFields({
      carburetor: "Four-barrel, mechanical secondaries, 1050 cfm class, alcohol metering",
      displacementM3: 8.2 * L,
      fuelKind: "methanol",
      peakBoostPa: 15 * PSI,
      intercooled: false,
      notes: "Roots-type blower in a sealed box; plan four-hole channels.",
    }),
    blocks: [
      {
        ...baseBlock,
        side: "primary",
        channelLengthM: 0.6 * IN,
        mainJetDiameterM: 0.13 * IN,
        stages: [
          stage({ valveKind: "vacuum", vacuumRatingPa: 4.5 * INHG, targetKind: "percentMainJet", targetTo: 13, mode: "part" }),
          stage({ valveKind: "boost", setpointPa: 2 * PSI, targetKind: "percentMainJet", targetTo: 12, mode: "full" }),
          stage({ valveKind: "boost", setpointPa: 6 * PSI, targetKind: "percentMainJet", targetTo: 11, mode: "full" }),
          stage({ valveKind: "boost", setpointPa: 10 * PSI, targetKind: "percentMainJet", targetTo: 9, mode: "full" }),
        ],
      },
    ],
  },
];

export async function seedDemoShop(): Promise<void> {
  const db = getDb();
  const [existing] = await db.select({ id: customers.id }).from(customers).where(eq(customers.name, DEMO_CUSTOMERS[0].name));
  if (existing) return;

  // The rack: every number, letter and fractional drill. Metric drills are not on this shop's rack.
  await db
    .insert(stockedDrills)
    .values([...NUMBER_DRILLS, ...LETTER_DRILLS, ...FRACTION_DRILLS].map((d) => ({ label: d.label })))
    .onConflictDoNothing();

  const byEmail = async (email: string): Promise<Viewer> => {
    const [user] = await db.select({ id: users.id, role: users.role }).from(users).where(eq(users.email, email));
    if (!user) throw new Error(`seed: ${email} is missing`);
    return user;
  };
  const admin = await byEmail("admin@blockwright.test");
  const tuner = await byEmail("tuner@blockwright.test");
  const machinist = await byEmail("machinist@blockwright.test");

  const customerIds: string[] = [];
  for (const customer of DEMO_CUSTOMERS) customerIds.push((await insertCustomer(db, admin.id, customer)).id);

  for (const demo of DEMO_JOBS) {
    const job = await createJob(tuner, { fields: demo.fields, customerId: customerIds[demo.customer] });
    await saveJobBlocks(tuner, job.id, demo.blocks);
    if (demo.finalState === "draft") continue;
    await approveRevision(tuner, job.id);
    await changeJobState(tuner, job.id, "released");
    if (demo.finalState !== "verified") continue;
    await signEverything(job.id, machinist.id);
    await changeJobState(machinist, job.id, "machining");
    await changeJobState(tuner, job.id, "verified");
  }
}

/** The bench record of a finished job: every operation signed, every measurement on plan. */
async function signEverything(jobId: string, machinistId: string): Promise<void> {
  const db = getDb();
  const ops = await db
    .select({ id: operations.id, measurements: operations.measurements })
    .from(operations)
    .innerJoin(planRevisions, eq(planRevisions.id, operations.revisionId))
    .where(eq(planRevisions.jobId, jobId));
  for (const op of ops) {
    const planned = op.measurements as { key: string; plannedSi: number }[];
    for (const m of planned) {
      await db.insert(measurements).values({ operationId: op.id, key: m.key, valueSi: m.plannedSi, passed: true, recordedById: machinistId });
    }
    await db.insert(signOffs).values({ operationId: op.id, userId: machinistId, note: "" });
  }
}
