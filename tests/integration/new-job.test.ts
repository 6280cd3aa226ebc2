// The new-job form's action: what it saves (in SI), where it goes, and what it refuses.
import { beforeEach, describe, expect, it } from "vitest";
import { eq } from "drizzle-orm";
import { createJobAction } from "@/app/(office)/jobs/new/actions";
import { createCustomer } from "@/db/customers";
import * as schema from "@/db/schema";
import { actAs, formData, resetDatabase, testDb } from "./support/database";
import { settle } from "./support/redirect";

beforeEach(resetDatabase);

/** The form as a tuner fills it in, field names as the browser sends them. */
function newJobForm(overrides: Record<string, string | undefined> = {}): FormData {
  const fields: Record<string, string | undefined> = {
    customerId: "",
    newCustomerName: "Juniper Oakridge",
    carburetor: "Four-barrel, mechanical secondaries, blow-through hat",
    "displacement.value": "350",
    "displacement.unit": "in³",
    fuelKind: "gasoline",
    "targetPower.value": "",
    "targetPower.unit": "hp",
    "peakBoost.value": "10",
    "peakBoost.unit": "psi",
    targetLambdaAtmosphere: "0.88",
    targetLambdaPeak: "0.78",
    intercooled: "on",
    "chargeTemperature.value": "",
    "chargeTemperature.unit": "°F",
    "ambientTemperature.value": "77",
    "ambientTemperature.unit": "°F",
    compressorEfficiencyPct: "70",
    intercoolerEffectivenessPct: "65",
    notes: "Street car, pump fuel.",
    ...overrides,
  };
  return formData(Object.fromEntries(Object.entries(fields).filter((entry): entry is [string, string] => entry[1] !== undefined)));
}

async function jobsAndCustomers() {
  return { jobs: await testDb.select().from(schema.jobs), customers: await testDb.select().from(schema.customers) };
}

describe("createJobAction", () => {
  it("opens a job for a new customer, in SI, held by the tuner, and goes to its page", async () => {
    const tunerId = await actAs("tuner");
    const outcome = await settle(createJobAction(undefined, newJobForm()));
    const { jobs, customers } = await jobsAndCustomers();
    expect(jobs).toHaveLength(1);
    const job = jobs[0]!;
    expect(outcome.redirectTo).toBe(`/jobs/${job.id}`);
    expect(job.number).toBe("BW-0001");
    expect(job.state).toBe("draft");
    expect(job.tunerId).toBe(tunerId);
    expect(customers.map((c) => c.name)).toEqual(["Juniper Oakridge"]);
    expect(job.customerId).toBe(customers[0]!.id);
    // 350 in³ x 1.6387064e-5 m³/in³ (NIST SP 811, exact) = 5.7354724e-3 m³
    expect(job.displacementM3).toBeCloseTo(5.7354724e-3, 9);
    // 10 psi x 6894.757 Pa/psi (NIST SP 811) = 68947.57 Pa
    expect(job.peakBoostPa).toBeCloseTo(68947.57, 1);
    // 77 °F = (77 - 32) / 1.8 + 273.15 = 298.15 K
    expect(job.ambientTemperatureK).toBeCloseTo(298.15, 6);
    expect(job.chargeTemperatureK).toBeNull();
    expect(job.targetPowerW).toBeNull();
    expect(job.intercooled).toBe(true);
    expect(job.intercoolerEffectiveness).toBeCloseTo(0.65, 9);
    expect(job.compressorEfficiency).toBeCloseTo(0.7, 9);
    expect(job.useAllDrills).toBe(false);
    expect(job.notes).toBe("Street car, pump fuel.");
  });

  it("uses an existing customer when one is chosen, and keeps the blend's ethanol content", async () => {
    const tunerId = await actAs("tuner");
    const existing = await createCustomer(tunerId!, { name: "Solveig Marchetti" });
    const outcome = await settle(
      createJobAction(
        undefined,
        newJobForm({
          customerId: existing.id,
          newCustomerName: "",
          fuelKind: "blend",
          ethanolPct: "85",
          "targetPower.value": "450",
          "chargeTemperature.value": "40",
          "chargeTemperature.unit": "°C",
          useAllDrills: "on",
        }),
      ),
    );
    expect(outcome.redirectTo).toMatch(/^\/jobs\/[0-9a-f-]{36}$/);
    const { jobs, customers } = await jobsAndCustomers();
    expect(customers).toHaveLength(1);
    expect(jobs[0]!.customerId).toBe(existing.id);
    expect(jobs[0]!.fuelKind).toBe("blend");
    expect(jobs[0]!.fuelEthanolPct).toBe(85);
    // 450 hp (mechanical) x 745.69987 W/hp (NIST SP 811) = 335564.9 W
    expect(jobs[0]!.targetPowerW).toBeCloseTo(335564.9, 0);
    // 40 °C + 273.15 = 313.15 K
    expect(jobs[0]!.chargeTemperatureK).toBeCloseTo(313.15, 6);
    expect(jobs[0]!.useAllDrills).toBe(true);
  });

  it("lets an admin hand the job to a tuner", async () => {
    const tunerId = await actAs("tuner");
    await actAs("admin");
    const outcome = await settle(createJobAction(undefined, newJobForm({ tunerId: tunerId! })));
    expect(outcome.redirectTo).toBeDefined();
    const { jobs } = await jobsAndCustomers();
    expect(jobs[0]!.tunerId).toBe(tunerId);
  });

  it("refuses a tuner who names another tuner (403 on tunerId), saving nothing", async () => {
    const adminId = await actAs("admin");
    await actAs("tuner");
    const { result } = await settle(createJobAction(undefined, newJobForm({ tunerId: adminId! })));
    expect(result?.httpStatus).toBe(403);
    expect(result?.error?.tunerId).toBeDefined();
    expect(await jobsAndCustomers()).toEqual({ jobs: [], customers: [] });
  });

  it("answers 400 naming each bad field, keeps what was typed, and saves nothing", async () => {
    await actAs("tuner");
    const { result } = await settle(
      createJobAction(undefined, newJobForm({ carburetor: "", "displacement.value": "lots" })),
    );
    expect(result?.httpStatus).toBe(400);
    expect(Object.keys(result?.error ?? {}).sort()).toEqual(["carburetor", "displacement.value"]);
    expect(result?.error?.carburetor).toEqual(["Describe the carburetor."]);
    // The reply carries the typed values back so the form can show them again.
    const typed = result?.initialValue as Record<string, unknown>;
    expect(typed.newCustomerName).toBe("Juniper Oakridge");
    expect(typed.peakBoost).toEqual({ value: "10", unit: "psi" });
    expect(await jobsAndCustomers()).toEqual({ jobs: [], customers: [] });
  });

  it("asks for what the chosen fuel needs: a custom fuel's stoichiometric AFR", async () => {
    await actAs("tuner");
    const { result } = await settle(createJobAction(undefined, newJobForm({ fuelKind: "custom", fuelDensityKgM3: "790" })));
    expect(result?.httpStatus).toBe(400);
    expect(Object.keys(result?.error ?? {})).toEqual(["fuelStoichAfr"]);
    expect(await jobsAndCustomers()).toEqual({ jobs: [], customers: [] });
  });

  it("asks for a customer when none is chosen and no name is typed", async () => {
    await actAs("tuner");
    const { result } = await settle(createJobAction(undefined, newJobForm({ newCustomerName: "" })));
    expect(result?.httpStatus).toBe(400);
    expect(result?.error?.customerId).toEqual(["Choose a customer or enter a new one."]);
  });

  it("refuses anonymous visitors (401) and machinists (403) without saving", async () => {
    for (const [actor, status] of [
      ["anonymous", 401],
      ["machinist", 403],
    ] as const) {
      await actAs(actor);
      const { result } = await settle(createJobAction(undefined, newJobForm()));
      expect(result?.httpStatus, actor).toBe(status);
    }
    expect(await jobsAndCustomers()).toEqual({ jobs: [], customers: [] });
  });

  it("refuses a customer id that does not exist (400 on customerId)", async () => {
    await actAs("tuner");
    const { result } = await settle(createJobAction(undefined, newJobForm({ customerId: "00000000-0000-4000-8000-000000000000" })));
    expect(result?.httpStatus).toBe(400);
    expect(result?.error?.customerId).toEqual(["No such customer."]);
    const [job] = await testDb.select().from(schema.jobs).where(eq(schema.jobs.carburetor, "Four-barrel, mechanical secondaries, blow-through hat"));
    expect(job).toBeUndefined();
  });
});
