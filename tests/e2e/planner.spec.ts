import { expect, test } from "@playwright/test";
import { screenshotPath } from "./support/accounts";
import { openSignedIn } from "./support/sessions";
import { BlocksForm, JobPage, newJobBody } from "./support/planner";

// The tuner's way through a job: blocks and stages in, the plan and its fuel curve out, a layout of their
// own choosing, approval and release; the machinist reading it; an edit after release making revision 2
// while revision 1 stays as it was approved.

test("a tuner plans, approves and releases a job; the machinist reads it; an edit makes revision 2", async ({ browser }) => {
  test.setTimeout(240_000);
  const tunerContext = await browser.newContext();
  const page = await tunerContext.newPage();
  await openSignedIn(page, "tuner");

  // The job comes in through the JSON API, from the signed-in page.
  const customer = `Ilse Marrow ${Date.now().toString(36).slice(-4).toUpperCase()}`;
  const created = await page.request.post("/api/jobs", { data: newJobBody(customer) });
  expect(created.status()).toBe(201);
  const jobId = ((await created.json()) as { job: { id: string } }).job.id;

  const job = new JobPage(page);
  await job.open(jobId);
  await expect(job.state()).toHaveText("draft");
  await page.getByRole("link", { name: "Add the metering blocks" }).click();

  // Primary block: measurements, a vacuum valve, then a boost valve.
  const blocks = new BlocksForm(page);
  await expect(blocks.form).toBeVisible();
  const primary = blocks.block("Primary");
  await blocks.fill(primary, "Main-jet diameter", "0.076");
  await blocks.fill(primary, "Channel length", "0.30");
  await blocks.fill(primary, "Least web", "0.030");
  await blocks.fill(primary, "Passage diameter", "0.085");
  await blocks.fill(primary, "Wall around it", "0.20");
  await blocks.fill(primary, "Depth available", "0.40");
  await blocks.fill(primary, "Valve protrusion", "0.060");
  await blocks.fill(primary, "Clay gap", "0.010");
  await blocks.fill(primary, "Boss wall", "0.25");
  const vacuum = blocks.stage("Primary", 1);
  await expect(vacuum.getByLabel("Valve", { exact: true })).toHaveValue("vacuum");
  await blocks.box(vacuum, "Vacuum rating").fill("6.5");
  await blocks.box(vacuum, "AFR before").fill("12.8");
  await blocks.box(vacuum, "AFR after").fill("12.0");

  await blocks.addStage("Primary");
  const boost = blocks.stage("Primary", 2);
  await expect(boost.getByLabel("Valve", { exact: true })).toHaveValue("boost");
  await blocks.box(boost, "Opening pressure").fill("3");
  await blocks.box(boost, "AFR before").fill("12.0");
  await blocks.box(boost, "AFR after").fill("11.4");
  // What was typed before the round trip of the list intent is still there.
  await expect(blocks.box(primary, "Main-jet diameter")).toHaveValue("0.076");
  await expect(blocks.box(vacuum, "Vacuum rating")).toHaveValue("6.5");

  // Secondary block: a second boost valve, with its pickup tube.
  await blocks.addBlock("secondary");
  const secondary = blocks.block("Secondary");
  await blocks.fill(secondary, "Main-jet diameter", "0.086");
  await blocks.fill(secondary, "Channel length", "0.30");
  await blocks.fill(secondary, "First straight run", "0.50");
  await blocks.fill(secondary, "Bend", "60");
  await blocks.fill(secondary, "Bend radius", "0.25");
  await blocks.fill(secondary, "Second straight run", "0.40");
  await blocks.fill(secondary, "Swage engagement", "0.20");
  const secondaryBoost = blocks.stage("Secondary", 1);
  await blocks.box(secondaryBoost, "Opening pressure").fill("7");
  await secondaryBoost.getByLabel("Target given as").selectOption("percentMainJet");
  await blocks.box(secondaryBoost, "Enrichment").fill("14");
  await expect(blocks.box(blocks.stage("Primary", 1), "AFR after")).toHaveValue("12.0");
  await page.screenshot({ path: screenshotPath("blocks-form"), fullPage: true });
  await blocks.save();

  // The plan: hole layouts per stage, the fuel curve for part and full throttle.
  await expect(page).toHaveURL(new RegExp(`/jobs/${jobId}$`));
  await expect(page.getByTestId("staging-chart-part").locator("svg[role=img]")).toBeVisible();
  await expect(page.getByTestId("staging-chart-full").locator("svg[role=img]")).toBeVisible();
  await expect(page.getByRole("table", { name: "Primary and secondary balance" })).toBeVisible();
  await expect(page.getByRole("note", { name: /WARNING: Grinding/ })).toBeVisible();
  await expect(page.getByRole("note", { name: /WARNING: Pressurized fuel bowls/ })).toBeVisible();

  // The tuner prefers the solver's second layout for the boost stage.
  const layouts = job.layouts("primary", 2);
  await expect(layouts.locator("tr[data-chosen]")).toContainText("chosen · by solver");
  const pick = layouts.getByRole("button", { name: /^Use / }).first();
  const label = (await pick.getAttribute("aria-label"))!.replace(/^Use /, "");
  await pick.click();
  await expect(layouts.locator("tr[data-chosen]")).toContainText("chosen · by tuner");
  await expect(layouts.locator("tr[data-chosen] td").first()).toHaveText(label);
  await page.screenshot({ path: screenshotPath("planner"), fullPage: true });

  // Only a primary boost valve at 3 psi and a 14 % secondary stage for 9 psi: the plan runs lean beyond 10 %
  // under boost, so approving it needs the tuner's explicit acknowledgement.
  const warnings = page.getByRole("region", { name: "Plan warnings" });
  await expect(warnings.locator('[data-level="danger"]').first()).toBeVisible();
  const stateForm = page.getByRole("form", { name: "Job state" });
  await stateForm.getByRole("button", { name: "Approve as revision 1" }).click();
  await expect(stateForm.getByRole("alert")).toContainText(/danger warning/);
  await expect(job.state()).toHaveText("draft");
  await stateForm.getByRole("checkbox", { name: /danger warning/ }).check();
  await job.move("Approve as revision 1", /Revision 1 approved/);
  await expect(job.state()).toHaveText("planned");
  await job.move("Release to the bench", /released/);
  await expect(job.state()).toHaveText("released");
  await expect(job.revisionRow(1)).toContainText("current");

  // The released revision's travelers download from the job page, one per block.
  await page.reload();
  const travelers = page.getByRole("region", { name: "Travelers, revision 1" });
  const [download] = await Promise.all([page.waitForEvent("download"), travelers.getByRole("button", { name: "Letter PDF" }).first().click()]);
  expect(download.suggestedFilename()).toMatch(/^BW-\d{4}-primary-rev1\.pdf$/);

  // Revision 1 as approved: the chosen layout and the primary main jets, to compare later.
  await page.goto(`/jobs/${jobId}/revisions/1`);
  await expect(page.getByTestId("superseded-banner")).toHaveCount(0);
  const rev1Layout = page.getByRole("region", { name: "primary stages" }).getByRole("table", { name: "Hole layouts for stage 2" }).locator("tr[data-chosen] td").first();
  await expect(rev1Layout).toHaveText(label);
  const rev1Jets = page.getByRole("definition").filter({ hasText: "2 × 0.0760 in" }).first();
  await expect(rev1Jets).toBeVisible();

  // The machinist, in a browser of their own, reads the released job and can change nothing.
  const benchContext = await browser.newContext();
  const bench = await benchContext.newPage();
  await openSignedIn(bench, "machinist");
  await new JobPage(bench).open(jobId);
  await expect(bench.getByTestId("job-state")).toHaveText("released");
  await expect(bench.getByTestId("staging-chart-full").locator("svg[role=img]")).toBeVisible();
  await expect(bench.getByRole("link", { name: /Edit/ })).toHaveCount(0);
  await expect(bench.getByRole("button", { name: /Use |Approve|Release|Reopen/ })).toHaveCount(0);
  await expect(bench.getByRole("form", { name: "Job state" })).toHaveCount(0);
  const refused = await bench.request.post(`/api/jobs/${jobId}/state`, { data: { to: "draft" } });
  expect(refused.status()).toBe(403);
  await benchContext.close();

  // After release the tuner changes the primary's main jets: the job goes back to draft.
  await new JobPage(page).open(jobId);
  await page.getByRole("link", { name: "Edit blocks and stages" }).click();
  await expect(blocks.form).toBeVisible();
  await expect(page.getByRole("note").filter({ hasText: "Saving makes a new revision when approved; revision 1 stays as it is" })).toBeVisible();
  await expect(blocks.box(blocks.block("Primary"), "Main-jet diameter")).toHaveValue("0.076");
  await blocks.fill(blocks.block("Primary"), "Main-jet diameter", "0.080");
  await blocks.save();
  await expect(page).toHaveURL(new RegExp(`/jobs/${jobId}$`));
  await expect(job.state()).toHaveText("draft");
  // Still the same lean staging: revision 2 is approved with the acknowledgement too, and it is kept with it.
  await stateForm.getByRole("checkbox", { name: /danger warning/ }).check();
  await job.move("Approve as revision 2", /Revision 2 approved/);
  await expect(job.revisionRow(2)).toContainText("current");
  await expect(job.revisionRow(1)).toContainText("superseded");

  // Revision 1 is unchanged and says it is superseded; revision 2 carries the new jets.
  await page.goto(`/jobs/${jobId}/revisions/1`);
  await expect(page.getByTestId("superseded-banner")).toContainText("Superseded");
  await expect(page.getByTestId("superseded-banner")).toContainText("Revision 2 replaced it");
  await expect(rev1Layout).toHaveText(label);
  await expect(page.getByRole("definition").filter({ hasText: "2 × 0.0760 in" }).first()).toBeVisible();
  await page.screenshot({ path: screenshotPath("revision-superseded"), fullPage: true });
  await page.goto(`/jobs/${jobId}/revisions/2`);
  await expect(page.getByTestId("superseded-banner")).toHaveCount(0);
  await expect(page.getByRole("definition").filter({ hasText: "2 × 0.0800 in" }).first()).toBeVisible();
  await tunerContext.close();
});
