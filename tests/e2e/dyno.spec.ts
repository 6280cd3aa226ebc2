import { execFileSync } from "node:child_process";
import { mkdtempSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import path from "node:path";
import { fileURLToPath } from "node:url";
import { expect, test } from "@playwright/test";
import { screenshotPath } from "./support/accounts";
import { openSignedIn } from "./support/sessions";
import { demoBlocksBody, demoJobBody } from "../support/job-fixtures";
import { JobPage } from "./support/planner";

// Back from the dyno: a released job's log is read, mapped and judged against the plan; the tuner carries
// the correction into revision 2, whose traveler lists it, while revision 1 reads as superseded at the bench.

const FIXTURE = fileURLToPath(new URL("./fixtures/dyno-pull.csv", import.meta.url));

test("a tuner reads a dyno log, accepts its correction, and releases revision 2 with the change on its traveler", async ({ page }) => {
  test.setTimeout(240_000);
  await openSignedIn(page, "tuner");
  const customer = `Tamsin Okonkwo ${Date.now().toString(36).slice(-4).toUpperCase()}`;
  const created = await page.request.post("/api/jobs", { data: demoJobBody({ newCustomerName: customer }) });
  expect(created.status()).toBe(201);
  const jobId = ((await created.json()) as { job: { id: string } }).job.id;
  expect((await page.request.patch(`/api/jobs/${jobId}`, { data: demoBlocksBody() })).status()).toBe(200);
  expect((await page.request.post(`/api/jobs/${jobId}/state`, { data: { to: "planned", acknowledgeWarnings: true } })).status()).toBe(200);
  expect((await page.request.post(`/api/jobs/${jobId}/state`, { data: { to: "released" } })).status()).toBe(200);
  const blocks = ((await (await page.request.get(`/api/jobs/${jobId}`)).json()) as { job: { blocks: { id: string; side: string }[] } }).job.blocks;
  const secondaryId = blocks.find((b) => b.side === "secondary")!.id;

  // The mapping step: the columns come back with a first guess the tuner checks.
  const job = new JobPage(page);
  await job.open(jobId);
  await page.getByRole("link", { name: "Read an air-fuel log" }).click();
  await page.getByLabel(/Log file/).setInputFiles(FIXTURE);
  await expect(page.getByRole("table", { name: "First rows of the file" })).toBeVisible();
  const pressure = page.getByRole("group", { name: "Manifold pressure" });
  await expect(pressure.getByLabel("Column")).toHaveValue("Boost (psi)");
  await expect(pressure.getByLabel("Unit")).toHaveValue("psi");
  await pressure.getByLabel("Reads").selectOption("gauge");
  const mixture = page.getByRole("group", { name: "Mixture" });
  await expect(mixture.getByLabel("Column")).toHaveValue("AFR (gas)");
  await mixture.getByLabel("AFR scale").selectOption("gasoline");
  await page.getByLabel("Throttle position (%)").selectOption("Throttle %");
  await page.screenshot({ path: screenshotPath("log-mapping"), fullPage: true });
  await page.getByRole("button", { name: "Read the log" }).click();

  // The analysis: readings against plan and target per mode, the refused row by line, the corrections.
  await expect(page).toHaveURL(new RegExp(`/jobs/${jobId}/logs/[0-9a-f-]{36}$`));
  await expect(page.getByRole("img", { name: /Full throttle .* measured against plan/ })).toBeVisible();
  await expect(page.getByRole("img", { name: /Part throttle .* measured against plan/ })).toBeVisible();
  // The throttle snaps from 18 % to 99 % between 2.2 s and 2.4 s: the readings at 2.4, 2.6 and 2.8 s (within the
  // half second after) are set aside, and the refused row at line 26 is not counted as used.
  await expect(page.getByTestId("log-counts")).toContainText("25 rows: 21 used, 3 set aside (3 during fast throttle movement");
  await expect(page.getByRole("table", { name: "Refused rows" })).toContainText("26");
  // Cruise at AFR 14.7 gasoline-scaled is lambda 1.00, on the cruise target: the jets stay.
  await expect(page.getByRole("region", { name: "Main jets" })).toContainText("no jet change");
  const change = (await page.getByTestId("correction-secondary-1").locator("td").last().locator("span").first().textContent())!.trim();
  expect(change).toMatch(/^secondary stage 1: \d+ x \S+ -> \d+ x \S+$/);
  await page.screenshot({ path: screenshotPath("log-analysis"), fullPage: true });
  const accept = page.getByRole("group", { name: /Corrections to carry into revision 2/ });
  for (const box of await accept.getByRole("checkbox").all()) {
    if (!((await box.locator("xpath=..").textContent()) ?? "").includes("secondary stage 1")) await box.uncheck();
  }
  await page.getByRole("button", { name: "Accept 1 correction into revision 2" }).click();

  // Back on the job: a draft again, with the log and its change in the history; approve and release.
  await expect(page).toHaveURL(new RegExp(`/jobs/${jobId}$`));
  await expect(job.state()).toHaveText("draft");
  const logs = page.getByRole("region", { name: "Air-fuel logs" });
  await expect(logs).toContainText("into revision 2");
  await expect(logs).toContainText(change);
  const stateForm = page.getByRole("form", { name: "Job state" });
  const acknowledge = stateForm.getByRole("checkbox", { name: /danger warning/ });
  if (await acknowledge.count()) await acknowledge.check();
  await job.move("Approve as revision 2", /Revision 2 approved/);
  await job.move("Release to the bench", /released/);
  await expect(job.revisionRow(1)).toContainText("superseded");

  // Revision 2's traveler lists the change as the machinist reads it.
  const pdf = await page.request.get(`/api/blocks/${secondaryId}/traveler?revision=2`);
  expect(pdf.status()).toBe(200);
  const file = path.join(mkdtempSync(path.join(tmpdir(), "bw-dyno-")), "traveler.pdf");
  writeFileSync(file, await pdf.body());
  const text = execFileSync("pdftotext", ["-layout", file, "-"], { encoding: "utf8" });
  expect(text.toLowerCase()).toContain("changes from revision 1"); // the section title prints in capitals
  expect(text.replace(/\s+/g, " ")).toContain(change);

  // Revision 1 at the bench reads as superseded.
  await page.goto(`/bench/${secondaryId}?revision=1`);
  await expect(page.getByRole("heading", { level: 1 })).toBeVisible();
  await expect(page.getByText("SUPERSEDED").first()).toBeVisible();
});
