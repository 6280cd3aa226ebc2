// Who may do what: every route handler and server action that touches shop data, called as each actor.
// Expected statuses: 401 anonymous, 403 wrong role, 2xx for the roles that may. Grows with every route.
import { beforeEach, describe, expect, it } from "vitest";
import { GET as listUsersRoute, POST as createUserRoute } from "@/app/api/users/route";
import { PATCH as patchUserRoute } from "@/app/api/users/[id]/route";
import { createUserAction, sendResetLinkAction, updateUserAction } from "@/app/(office)/shop/users/actions";
import { changePasswordAction, signOutEverywhereAction } from "@/app/(office)/account/actions";
import { POST as changePasswordRoute } from "@/app/api/account/password/route";
import { DELETE as endSessionsRoute } from "@/app/api/account/sessions/route";
import { POST as sendResetRoute } from "@/app/api/users/[id]/password-reset/route";
import { createJobAction } from "@/app/(office)/jobs/new/actions";
import { createCustomerAction, updateCustomerAction } from "@/app/(office)/shop/customers/actions";
import { saveShopLimitsAction, setDrillStockedAction, setDrillSystemStockedAction } from "@/app/(office)/shop/drills/actions";
import { createCustomer } from "@/db/customers";
import { settle } from "./support/redirect";
import { GET as listJobsRoute, POST as createJobRoute } from "@/app/api/jobs/route";
import { GET as readJobRoute, PATCH as patchJobRoute } from "@/app/api/jobs/[id]/route";
import { POST as jobStateRoute } from "@/app/api/jobs/[id]/state/route";
import { GET as jobPlanRoute } from "@/app/api/jobs/[id]/plan/route";
import { GET as workQueueRoute } from "@/app/api/work-queue/route";
import { GET as conversionRecordRoute } from "@/app/api/jobs/[id]/conversion-record/route";
import { GET as travelerRoute } from "@/app/api/blocks/[blockId]/traveler/route";
import { blockIdOf } from "./support/jobs";
import { POST as signOffRoute } from "@/app/api/operations/[id]/sign-off/route";
import { POST as uploadPhotoRoute } from "@/app/api/blocks/[blockId]/photos/route";
import { GET as photoRoute } from "@/app/api/photos/[id]/route";
import { signOffAction } from "@/app/bench/[blockId]/actions";
import { GET as outboxAttachmentRoute } from "@/app/api/outbox/[name]/attachments/[index]/route";
import { outboxDir } from "@/lib/server/outbox";
import { writeEml } from "./support/outbox";
import { jobBody, makeJob } from "./support/jobs";
import { ACTORS, actAs, formData, jsonRequest, resetDatabase, testDb, type Actor } from "./support/database";
import * as schema from "@/db/schema";
import { eq, sql } from "drizzle-orm";
import { changeStateAction, chooseLayoutAction } from "@/app/(office)/jobs/[id]/actions";
import { updateJobAction } from "@/app/(office)/jobs/[id]/edit/actions";
import { saveBlocksAction } from "@/app/(office)/jobs/[id]/blocks/actions";
import { solveJob } from "@/lib/jobs/approve";
import { nestedFormData } from "./support/form-fields";
import { setLengthUnitAction } from "@/app/(office)/reference/actions";
import { restrictionAction } from "@/app/(office)/reference/calculators/restriction/actions";
import { passagePlugAction, tapDrillAction } from "@/app/(office)/reference/calculators/tap-drill/actions";
import { grindPlanAction } from "@/app/(office)/reference/calculators/grind/actions";
import { pickupTubeAction } from "@/app/(office)/reference/calculators/pickup-tube/actions";
import { stagingAction } from "@/app/(office)/reference/calculators/staging/actions";
import * as referenceForms from "./support/reference-forms";
import { POST as passagePlugRoute } from "@/app/api/calc/passage-plug/route";
import { POST as grindRoute } from "@/app/api/calc/grind/route";
import { POST as pickupTubeRoute } from "@/app/api/calc/pickup-tube/route";
import { POST as stagingRoute } from "@/app/api/calc/staging/route";
import { blocksBody } from "./support/jobs";
import { GET as healthRoute } from "@/app/api/health/route";
import { GET as listLogsRoute, POST as uploadLogRoute } from "@/app/api/jobs/[id]/logs/route";
import { POST as previewLogRoute } from "@/app/api/jobs/[id]/logs/preview/route";
import { GET as logAnalysisRoute } from "@/app/api/jobs/[id]/logs/[logId]/analysis/route";
import { POST as acceptLogRoute } from "@/app/api/jobs/[id]/logs/[logId]/accept/route";
import { PATCH as amendRoute } from "@/app/api/operations/[id]/sign-off/route";
import { amendAction } from "@/app/bench/[blockId]/actions";
import { saveLogSettingsAction } from "@/app/(office)/shop/drills/actions";

async function machinistId(): Promise<string> {
  const [row] = await testDb.select({ id: schema.users.id }).from(schema.users).where(eq(schema.users.email, "machinist@blockwright.test"));
  return row!.id;
}

/** The finish operation (no readings) of a freshly released job. */
async function finishOperationOfReleasedJob(): Promise<string> {
  const job = await makeJob("released");
  const [op] = await testDb
    .select({ id: schema.operations.id })
    .from(schema.operations)
    .where(sql`${schema.operations.blockId} in (select id from metering_blocks where job_id = ${job.id}) and ${schema.operations.kind} = 'finish'`);
  return op!.id;
}

interface AccessCase {
  name: string;
  expected: Record<Actor, number>;
  /** Builds what the call needs (as whoever it likes) before the actor signs in; its result goes to call. */
  setup?: () => Promise<string>;
  call: (fixture: string) => Promise<number>;
}

const OFFICE_ONLY = (ok: number): Record<Actor, number> => ({ anonymous: 401, machinist: 403, tuner: ok, admin: ok });
const EVERYONE = (ok: number): Record<Actor, number> => ({ anonymous: 401, machinist: ok, tuner: ok, admin: ok });
const jobParams = (id: string) => ({ params: Promise.resolve({ id }) });

/** The calculator API holds no shop data: anyone may call it, signed in or not. */
const PUBLIC = (ok: number): Record<Actor, number> => ({ anonymous: ok, machinist: ok, tuner: ok, admin: ok });
const inch = (value: number) => ({ value, unit: "in" });

const ADMIN_ONLY = (ok: number): Record<Actor, number> => ({ anonymous: 401, machinist: 403, tuner: 403, admin: ok });

const CASES: AccessCase[] = [
  {
    // For monitors and load balancers: it tells whether the database answers, nothing about the shop.
    name: "GET /api/health",
    expected: PUBLIC(200),
    call: async () => (await healthRoute()).status,
  },
  {
    name: "POST /api/account/password",
    expected: EVERYONE(204),
    call: async () =>
      (await changePasswordRoute(jsonRequest("/api/account/password", "POST", { currentPassword: "blockwright-demo", newPassword: "copper lathe quiet harbor" }))).status,
  },
  {
    name: "DELETE /api/account/sessions",
    expected: EVERYONE(204),
    call: async () => (await endSessionsRoute(new Request("http://127.0.0.1/api/account/sessions", { method: "DELETE" }))).status,
  },
  {
    name: "POST /api/users/{id}/password-reset (unknown user)",
    expected: ADMIN_ONLY(404),
    call: async () => {
      const id = "00000000-0000-4000-8000-000000000000";
      return (await sendResetRoute(new Request(`http://127.0.0.1/api/users/${id}/password-reset`, { method: "POST" }), jobParams(id))).status;
    },
  },
  {
    name: "action sendResetLinkAction (unknown user)",
    expected: ADMIN_ONLY(404),
    call: async () => (await sendResetLinkAction(undefined, formData({ userId: "00000000-0000-4000-8000-000000000000" }))).httpStatus,
  },
  {
    name: "action changePasswordAction (wrong current password)",
    expected: EVERYONE(400),
    call: async () =>
      (await changePasswordAction(undefined, formData({ currentPassword: "not-the-password", newPassword: "copper lathe quiet harbor", confirmPassword: "copper lathe quiet harbor" })))
        .httpStatus,
  },
  {
    name: "action signOutEverywhereAction",
    expected: { anonymous: 401, machinist: 303, tuner: 303, admin: 303 },
    call: async () => {
      const outcome = await settle(signOutEverywhereAction(undefined, formData({})));
      return outcome.redirectTo ? 303 : outcome.result!.httpStatus;
    },
  },
  {
    name: "POST /api/operations/{id}/sign-off (released job)",
    expected: EVERYONE(201),
    setup: finishOperationOfReleasedJob,
    call: async (id) => (await signOffRoute(jsonRequest(`/api/operations/${id}/sign-off`, "POST", { readings: [] }), jobParams(id))).status,
  },
  {
    name: "POST /api/blocks/{blockId}/photos (not an image)",
    expected: EVERYONE(400),
    setup: async () => {
      const job = await makeJob("released");
      const [block] = await testDb.select({ id: schema.meteringBlocks.id }).from(schema.meteringBlocks).where(eq(schema.meteringBlocks.jobId, job.id));
      return block!.id;
    },
    call: async (blockId) => {
      const form = new FormData();
      form.set("photo", new Blob(["not a photo"], { type: "image/png" }), "x.png");
      const request = new Request(`http://127.0.0.1/api/blocks/${blockId}/photos`, { method: "POST", body: form });
      return (await uploadPhotoRoute(request, { params: Promise.resolve({ blockId }) })).status;
    },
  },
  {
    name: "action signOffAction (released job)",
    expected: EVERYONE(200),
    setup: finishOperationOfReleasedJob,
    call: async (id) => (await signOffAction(undefined, formData({ operationId: id, note: "" }))).httpStatus,
  },
  {
    name: "GET /api/outbox/{name}/attachments/{index}",
    expected: ADMIN_ONLY(200),
    setup: async () => {
      const name = `access-${Date.now()}.eml`;
      writeEml(outboxDir(), {
        name,
        date: "Tue, 02 Jun 2026 16:40:00 +0000",
        to: "tuner@blockwright.test",
        subject: "with an attachment",
        text: "see attached",
        attachment: { filename: "record.txt", contentType: "text/plain", content: Buffer.from("record") },
      });
      return name;
    },
    call: async (name) =>
      (
        await outboxAttachmentRoute(new Request(`http://127.0.0.1/api/outbox/${name}/attachments/0`), {
          params: Promise.resolve({ name, index: "0" }),
        })
      ).status,
  },
  {
    name: "GET /api/photos/{id} (unknown photo)",
    expected: EVERYONE(404),
    call: async () => {
      const id = "00000000-0000-4000-8000-000000000000";
      return (await photoRoute(new Request(`http://127.0.0.1/api/photos/${id}`), jobParams(id))).status;
    },
  },
  {
    name: "GET /api/jobs",
    expected: EVERYONE(200),
    call: async () => (await listJobsRoute(new Request("http://127.0.0.1/api/jobs"))).status,
  },
  {
    name: "POST /api/jobs",
    expected: OFFICE_ONLY(201),
    call: async () => (await createJobRoute(jsonRequest("/api/jobs", "POST", jobBody()))).status,
  },
  {
    name: "GET /api/jobs/{id} (released)",
    expected: EVERYONE(200),
    setup: async () => (await makeJob("released")).id,
    call: async (id) => (await readJobRoute(new Request(`http://127.0.0.1/api/jobs/${id}`), jobParams(id))).status,
  },
  {
    name: "GET /api/jobs/{id} (draft: not on the shop floor)",
    expected: { anonymous: 401, machinist: 404, tuner: 200, admin: 200 },
    setup: async () => (await makeJob("draft")).id,
    call: async (id) => (await readJobRoute(new Request(`http://127.0.0.1/api/jobs/${id}`), jobParams(id))).status,
  },
  {
    name: "GET /api/jobs/{id}/plan (released)",
    expected: EVERYONE(200),
    setup: async () => (await makeJob("released")).id,
    call: async (id) => (await jobPlanRoute(new Request(`http://127.0.0.1/api/jobs/${id}/plan`), jobParams(id))).status,
  },
  {
    name: "GET /api/jobs/{id}/plan (draft: not on the shop floor)",
    expected: { anonymous: 401, machinist: 404, tuner: 200, admin: 200 },
    setup: async () => (await makeJob("draft")).id,
    call: async (id) => (await jobPlanRoute(new Request(`http://127.0.0.1/api/jobs/${id}/plan`), jobParams(id))).status,
  },
  {
    name: "PATCH /api/jobs/{id}",
    expected: OFFICE_ONLY(200),
    setup: async () => (await makeJob("released")).id,
    call: async (id) => (await patchJobRoute(jsonRequest(`/api/jobs/${id}`, "PATCH", { notes: "checked" }), jobParams(id))).status,
  },
  {
    name: "POST /api/jobs/{id}/state",
    expected: OFFICE_ONLY(200),
    setup: async () => (await makeJob("planned")).id,
    call: async (id) => (await jobStateRoute(jsonRequest(`/api/jobs/${id}/state`, "POST", { to: "released" }), jobParams(id))).status,
  },
  {
    name: "GET /api/work-queue",
    expected: EVERYONE(200),
    call: async () => (await workQueueRoute(new Request("http://127.0.0.1/api/work-queue"), { params: Promise.resolve({}) })).status,
  },
  {
    name: "GET /api/jobs/{id}/conversion-record (released: not yet delivered)",
    expected: OFFICE_ONLY(409),
    setup: async () => (await makeJob("released")).id,
    call: async (id) => (await conversionRecordRoute(new Request(`http://127.0.0.1/api/jobs/${id}/conversion-record`), jobParams(id))).status,
  },
  {
    name: "GET /api/blocks/{id}/traveler (released)",
    expected: EVERYONE(200),
    setup: async () => blockIdOf((await makeJob("released")).id),
    call: async (blockId) => (await travelerRoute(new Request(`http://127.0.0.1/api/blocks/${blockId}/traveler`), { params: Promise.resolve({ blockId }) })).status,
  },
  {
    name: "GET /api/blocks/{id}/traveler (planned: not yet on the shop floor)",
    expected: { anonymous: 401, machinist: 404, tuner: 200, admin: 200 },
    setup: async () => blockIdOf((await makeJob("planned")).id),
    call: async (blockId) => (await travelerRoute(new Request(`http://127.0.0.1/api/blocks/${blockId}/traveler`), { params: Promise.resolve({ blockId }) })).status,
  },
  {
    name: "GET /api/users",
    expected: ADMIN_ONLY(200),
    call: async () => (await listUsersRoute(new Request("http://127.0.0.1/api/users"))).status,
  },
  {
    name: "POST /api/users",
    expected: ADMIN_ONLY(201),
    call: async () =>
      (
        await createUserRoute(
          jsonRequest("/api/users", "POST", { name: "Sol Brandt", email: "sol@blockwright.test", role: "tuner", password: "quiet-lathe-harbor-91" }),
        )
      ).status,
  },
  {
    name: "PATCH /api/users/{id}",
    expected: ADMIN_ONLY(200),
    call: async () => {
      const id = await machinistId();
      return (await patchUserRoute(jsonRequest(`/api/users/${id}`, "PATCH", { role: "tuner" }), { params: Promise.resolve({ id }) })).status;
    },
  },
  {
    name: "action createUserAction",
    expected: ADMIN_ONLY(200),
    call: async () =>
      (await createUserAction(undefined, formData({ name: "Sol Brandt", email: "sol@blockwright.test", role: "tuner", password: "quiet-lathe-harbor-91" })))
        .httpStatus,
  },
  {
    name: "action updateUserAction",
    expected: ADMIN_ONLY(200),
    call: async () => (await updateUserAction(undefined, formData({ userId: await machinistId(), active: "false" }))).httpStatus,
  },
  {
    // Success ends in a redirect to the new job's page, counted here as 303.
    name: "action createJobAction",
    expected: OFFICE_ONLY(303),
    call: async () => {
      const outcome = await settle(
        createJobAction(
          undefined,
          formData({
            newCustomerName: "Wren Halloway",
            carburetor: "Four-barrel, vacuum secondaries",
            "displacement.value": "5.7",
            "displacement.unit": "L",
            fuelKind: "gasoline",
            "peakBoost.value": "8",
            "peakBoost.unit": "psi",
            targetLambdaAtmosphere: "0.88",
            targetLambdaPeak: "0.78",
            "ambientTemperature.value": "25",
            "ambientTemperature.unit": "°C",
            compressorEfficiencyPct: "70",
            intercoolerEffectivenessPct: "70",
          }),
        ),
      );
      return outcome.redirectTo?.startsWith("/jobs/") ? 303 : outcome.result!.httpStatus;
    },
  },
  {
    name: "action createCustomerAction",
    expected: OFFICE_ONLY(200),
    call: async () => (await createCustomerAction(undefined, formData({ name: "Wren Halloway" }))).httpStatus,
  },
  {
    name: "action updateCustomerAction",
    expected: OFFICE_ONLY(200),
    setup: async () => (await createCustomer(await machinistId(), { name: "Wren Halloway" })).id,
    call: async (id) => (await updateCustomerAction(undefined, formData({ customerId: id, name: "Wren Halloway-Pike" }))).httpStatus,
  },
  {
    name: "action setDrillStockedAction",
    expected: ADMIN_ONLY(200),
    call: async () => (await setDrillStockedAction(undefined, formData({ label: "#43", stocked: "true" }))).httpStatus,
  },
  {
    name: "action setDrillSystemStockedAction",
    expected: ADMIN_ONLY(200),
    call: async () => (await setDrillSystemStockedAction(undefined, formData({ system: "number", stocked: "true" }))).httpStatus,
  },
  {
    name: "action saveShopLimitsAction",
    expected: ADMIN_ONLY(200),
    call: async () =>
      (
        await saveShopLimitsAction(
          undefined,
          formData({ smallestRestrictionDrill: "#60", largestRestrictionDrill: "3/32", "minWeb.value": "0.025", "minWeb.unit": "in" }),
        )
      ).httpStatus,
  },
  {
    name: "GET /api/jobs/{id}/logs",
    expected: OFFICE_ONLY(200),
    setup: async () => (await makeJob("released")).id,
    call: async (id) => (await listLogsRoute(new Request(`http://127.0.0.1/api/jobs/${id}/logs`), jobParams(id))).status,
  },
  {
    name: "POST /api/jobs/{id}/logs/preview",
    expected: OFFICE_ONLY(200),
    setup: async () => (await makeJob("released")).id,
    call: async (id) => {
      const form = new FormData();
      form.set("file", new Blob(["MAP,Lambda\n101,0.9\n"], { type: "text/csv" }), "log.csv");
      return (await previewLogRoute(new Request(`http://127.0.0.1/api/jobs/${id}/logs/preview`, { method: "POST", body: form }), jobParams(id))).status;
    },
  },
  {
    // The role is checked before the mapping is read: a caller who may not upload learns nothing about it.
    name: "POST /api/jobs/{id}/logs (no mapping)",
    expected: OFFICE_ONLY(400),
    setup: async () => (await makeJob("released")).id,
    call: async (id) => {
      const form = new FormData();
      form.set("file", new Blob(["MAP,Lambda\n101,0.9\n"], { type: "text/csv" }), "log.csv");
      return (await uploadLogRoute(new Request(`http://127.0.0.1/api/jobs/${id}/logs`, { method: "POST", body: form }), jobParams(id))).status;
    },
  },
  {
    name: "GET /api/jobs/{id}/logs/{logId}/analysis (unknown log)",
    expected: OFFICE_ONLY(404),
    setup: async () => (await makeJob("released")).id,
    call: async (id) => {
      const logId = "00000000-0000-4000-8000-000000000000";
      return (await logAnalysisRoute(new Request(`http://127.0.0.1/x`), { params: Promise.resolve({ id, logId }) })).status;
    },
  },
  {
    name: "POST /api/jobs/{id}/logs/{logId}/accept (unknown log)",
    expected: OFFICE_ONLY(404),
    setup: async () => (await makeJob("released")).id,
    call: async (id) => {
      const logId = "00000000-0000-4000-8000-000000000000";
      const body = { stageIds: ["00000000-0000-4000-8000-000000000001"] };
      return (await acceptLogRoute(jsonRequest(`/api/jobs/${id}/logs/${logId}/accept`, "POST", body), { params: Promise.resolve({ id, logId }) })).status;
    },
  },
  {
    name: "PATCH /api/operations/{id}/sign-off (not signed yet)",
    expected: EVERYONE(409),
    setup: finishOperationOfReleasedJob,
    call: async (id) =>
      (await amendRoute(jsonRequest(`/api/operations/${id}/sign-off`, "PATCH", { readings: [{ key: "x", value: 1, unit: "in" }], reason: "A slip" }), jobParams(id))).status,
  },
  {
    name: "action amendAction (not signed yet)",
    expected: EVERYONE(409),
    setup: finishOperationOfReleasedJob,
    call: async (id) =>
      (await amendAction(undefined, nestedFormData({ operationId: id, reason: "A slip", readings: [{ key: "x", value: "1", unit: "in" }] }))).httpStatus,
  },
  {
    name: "action saveLogSettingsAction",
    expected: ADMIN_ONLY(200),
    call: async () => (await saveLogSettingsAction(undefined, formData({ fullThrottleAbovePct: "75", "binWidth.value": "0.5", "binWidth.unit": "psi" }))).httpStatus,
  },
  {
    name: "action chooseLayoutAction",
    expected: OFFICE_ONLY(200),
    setup: async () => {
      const job = await makeJob("draft");
      return `${job.id} ${(await solveJob(job.id)).blocks[0]!.stages[0]!.stageId}`;
    },
    call: async (fixture) => {
      const [jobId, stageId] = fixture.split(" ") as [string, string];
      return (await chooseLayoutAction(jobId, undefined, formData({ stageId, count: "1", drillLabel: "#56" }))).httpStatus;
    },
  },
  {
    name: "action changeStateAction",
    expected: OFFICE_ONLY(200),
    setup: async () => (await makeJob("planned")).id,
    call: async (id) => (await changeStateAction(id, undefined, formData({ to: "released" }))).httpStatus,
  },
  {
    // Success ends in a redirect to the job's page, counted here as 303.
    name: "action updateJobAction",
    expected: OFFICE_ONLY(303),
    setup: async () => (await makeJob("released")).id,
    call: async (id) => {
      const fields = nestedFormData({ ...jobBody(), newCustomerName: undefined, useAllDrills: true, intercooled: true });
      const outcome = await settle(updateJobAction(id, undefined, fields));
      return outcome.redirectTo === `/jobs/${id}` ? 303 : outcome.result!.httpStatus;
    },
  },
  {
    name: "action saveBlocksAction",
    expected: OFFICE_ONLY(303),
    setup: async () => (await makeJob("released")).id,
    call: async (id) => {
      const outcome = await settle(saveBlocksAction(id, undefined, nestedFormData(blocksBody())));
      return outcome.redirectTo === `/jobs/${id}` ? 303 : outcome.result!.httpStatus;
    },
  },
  {
    name: "POST /api/calc/passage-plug",
    expected: PUBLIC(200),
    call: async () =>
      (await passagePlugRoute(jsonRequest("/api/calc/passage-plug", "POST", { passageDiameter: inch(0.085), wall: inch(0.25), depth: inch(0.5) })))
        .status,
  },
  {
    name: "POST /api/calc/grind",
    expected: PUBLIC(200),
    call: async () =>
      (
        await grindRoute(
          jsonRequest("/api/calc/grind", "POST", {
            protrusion: inch(0.06),
            clearance: inch(0.02),
            clayGap: inch(0.01),
            wall: inch(0.25),
            minWall: inch(0.12),
            perPass: inch(0.015),
            clayEvery: 2,
          }),
        )
      ).status,
  },
  {
    name: "POST /api/calc/pickup-tube",
    expected: PUBLIC(200),
    call: async () =>
      (
        await pickupTubeRoute(
          jsonRequest("/api/calc/pickup-tube", "POST", {
            firstRun: inch(1),
            bendAngle: 90,
            radius: inch(0.5),
            secondRun: inch(0.75),
            swage: inch(0.25),
            outsideDiameter: inch(0.3125),
          }),
        )
      ).status,
  },
  {
    name: "POST /api/calc/staging",
    expected: PUBLIC(200),
    call: async () =>
      (
        await stagingRoute(
          jsonRequest("/api/calc/staging", "POST", {
            primaryJet: inch(0.076),
            primaryJets: 2,
            secondaryJet: inch(0.089),
            secondaryJets: 2,
            valves: [{ kind: "vacuum", side: "primary", opening: { value: 6.5, unit: "inHg" }, area: { value: 0.002, unit: "in²" } }],
            fuel: "gasoline",
            targetScale: "afr",
            targetAtmosphere: 12.5,
            targetPeak: 11.5,
            peakBoost: { value: 12, unit: "psi" },
            ambientTemperature: { value: 77, unit: "°F" },
            chargeTemperature: { value: 130, unit: "°F" },
            band: 5,
            proposeValves: 2,
          }),
        )
      ).status,
  },
  // Reference calculators: every role may use them; they read and write nothing but the user's unit choice.
  {
    name: "action setLengthUnitAction",
    expected: EVERYONE(200),
    call: async () => (await setLengthUnitAction(undefined, formData({ lengthUnit: "mm" }))).httpStatus,
  },
  ...(
    [
      ["tapDrillAction", tapDrillAction, referenceForms.TAP_DRILL_FORM],
      ["passagePlugAction", passagePlugAction, referenceForms.PASSAGE_PLUG_FORM],
      ["restrictionAction", restrictionAction, referenceForms.RESTRICTION_FORM],
      ["grindPlanAction", grindPlanAction, referenceForms.GRIND_FORM],
      ["pickupTubeAction", pickupTubeAction, referenceForms.PICKUP_TUBE_FORM],
      ["stagingAction (chart)", stagingAction, referenceForms.STAGING_FORM],
      ["stagingAction (propose)", stagingAction, { ...referenceForms.STAGING_FORM, command: "propose" }],
    ] as const
  ).map(([name, action, form]) => ({
    name: `action ${name}`,
    expected: EVERYONE(200),
    call: async () => (await action(undefined, nestedFormData(form))).httpStatus,
  })),
];

describe("access table: route or action x actor -> status", () => {
  beforeEach(resetDatabase);
  for (const testCase of CASES) {
    for (const actor of ACTORS) {
      it(`${testCase.name} as ${actor} -> ${testCase.expected[actor]}`, async () => {
        const fixture = testCase.setup ? await testCase.setup() : "";
        await actAs(actor);
        expect(await testCase.call(fixture)).toBe(testCase.expected[actor]);
      });
    }
  }
});
