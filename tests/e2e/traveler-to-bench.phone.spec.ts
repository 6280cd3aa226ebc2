import { devices, expect, test, type Browser, type BrowserContext } from "@playwright/test";
import { ACCOUNTS, DEMO_PASSWORD, screenshotPath, SignInPage, type DemoRole } from "./support/accounts";
import { openSignedIn } from "./support/sessions";
import { benchPhoto, BenchPage, blockOf, downloadTraveler, moveJob, readJob, releaseNewJob, travelerQrText } from "./support/bench";

// From the printed traveler to the phone at the bench: the QR code opens the right page, the machinist
// signs the work off, the job is verified and the tuner hears about it; an old traveler is refused.

test.describe.configure({ timeout: 180_000 });

async function signedInContext(browser: Browser, baseURL: string, role: DemoRole, device: "phone" | "desk" = "phone"): Promise<BrowserContext> {
  const context = await browser.newContext(device === "phone" ? { ...devices["Pixel 7"], baseURL } : { viewport: { width: 1280, height: 900 }, baseURL });
  const page = await context.newPage();
  await openSignedIn(page, role);
  await page.close();
  return context;
}

/** The QR code's URL as a path on the server under test (they share a base unless configured otherwise). */
function onTestServer(url: string, baseURL: string): string {
  const scanned = new URL(url);
  return scanned.origin === new URL(baseURL).origin ? url : `${baseURL}${scanned.pathname}${scanned.search}`;
}

test("a traveler's QR code opens the bench page, where every operation is signed and the job ends verified", async ({ browser, baseURL }) => {
  const base = baseURL!;
  const tuner = await signedInContext(browser, base, "tuner");
  const job = await releaseNewJob(tuner.request, "Orrin Fairweather");
  const primary = blockOf(job, "primary");
  const secondary = blockOf(job, "secondary");

  const scanned = travelerQrText(await downloadTraveler(tuner.request, primary));
  expect(scanned).toBe(`${base}/bench/${primary}?revision=1`);

  // The machinist scans the paper with a phone that is not signed in yet: sign-in first, then the bench.
  const phone = await browser.newContext({ ...devices["Pixel 7"], baseURL: base });
  const page = await phone.newPage();
  await page.goto(onTestServer(scanned, base));
  await expect(page).toHaveURL(/\/sign-in\?callbackUrl=/);
  await new SignInPage(page).signIn(ACCOUNTS.machinist.email, DEMO_PASSWORD);
  await expect(page).toHaveURL(`${base}/bench/${primary}?revision=1`);

  const bench = new BenchPage(page);
  const topBar = page.getByTestId("bench-top-bar");
  await expect(topBar).toContainText(job.number);
  await expect(topBar).toContainText("Primary block");
  await expect(topBar).toContainText("Rev 1");
  await expect(topBar).toContainText(ACCOUNTS.machinist.name);
  await expect(page.getByRole("button", { name: "Sign out" })).toBeVisible();
  await expect(page.getByText("Orrin Fairweather")).toBeVisible();
  await expect(page.getByTestId("job-state")).toContainText("released");
  const total = await bench.cards().count();
  expect(total).toBeGreaterThan(2);
  await expect(bench.progress()).toHaveText(`0 of ${total} operations signed`);

  // Operation numbers run in tens, and each card carries its hazard's signal word.
  const numbers = await bench.cards().evaluateAll((cards) => cards.map((c) => Number(c.querySelector("header span")?.textContent)));
  expect(numbers).toEqual(numbers.map((_, i) => (i + 1) * 10));
  await expect(bench.cards().first().getByRole("note", { name: /^(DANGER|WARNING|CAUTION|NOTICE): / })).toBeVisible();

  // Every target a thumb meets is at least 44 px tall; the Done button 56 px and the full card width.
  const done = bench.doneButtons().first();
  const doneBox = (await done.boundingBox())!;
  const cardBox = (await bench.cards().first().boundingBox())!;
  expect(doneBox.height).toBeGreaterThanOrEqual(56);
  expect(doneBox.width).toBeGreaterThan(cardBox.width - 48);
  for (const target of await page.locator("main button, main select, main input[inputmode], main label[for]:has(svg)").all()) {
    expect((await target.boundingBox())!.height).toBeGreaterThanOrEqual(44);
  }

  // A reading outside plan is called out as it is typed, and the restriction's total area with it.
  const holes = bench.cards().filter({ has: page.getByTestId("restriction-area") }).first();
  const firstHole = holes.locator('input[inputmode="decimal"]').first();
  await firstHole.fill("0.2000");
  await expect(holes.getByText("Outside plan").first()).toBeVisible();
  await expect(holes.getByTestId("verdict-hole-1")).toContainText("above");
  await bench.fillOnPlan(holes);
  await expect(holes.getByTestId("verdict-area")).toContainText("Within plan");

  // An empty box is named beside it, and nothing is recorded.
  const needsReading = bench.cards().filter({ has: page.locator('input[inputmode="decimal"]') }).first();
  await needsReading.locator('input[inputmode="decimal"]').first().fill("");
  await needsReading.getByRole("button", { name: "Done", exact: true }).click();
  await expect(needsReading.getByRole("alert").first()).toContainText(/: enter the measured value/);
  await expect(bench.progress()).toHaveText(`0 of ${total} operations signed`);

  // The first card, signed with a note and a photo, folds to who signed it, when, and what was read.
  const photo = await benchPhoto();
  await bench.signCard(bench.openCards().first(), { photo, note: "Clay showed a clean gap." });
  await expect(bench.progress()).toHaveText(`1 of ${total} operations signed`);
  await expect(page.getByTestId("job-state")).toContainText("machining");
  const signedCard = bench.cards().first();
  await expect(signedCard.getByTestId("signed-by")).toContainText(`Signed by ${ACCOUNTS.machinist.name} at`);
  await expect(signedCard.getByTestId("signed-by")).toHaveText(/at \d{2}:\d{2}/);
  await expect(signedCard).toContainText("Clay showed a clean gap.");
  await expect(page.getByTestId("block-photos").getByRole("img")).toHaveCount(1);
  await expect(signedCard.getByRole("img", { name: "Photo of this operation" })).toBeVisible();
  await signedCard.screenshot({ path: screenshotPath("bench-signed-card") });

  // Mid-way through the work, with readings typed into the next card: what the phone shows.
  await bench.fillOnPlan(holes);
  await holes.scrollIntoViewIfNeeded();
  await page.screenshot({ path: screenshotPath("bench-phone") });

  await bench.signEverything(null);
  await expect(bench.progress()).toHaveText(`${total} of ${total} operations signed`);
  await expect(bench.doneButtons()).toHaveCount(0);

  // The secondary block's traveler, and the rest of the job.
  await page.goto(`/bench/${secondary}?revision=1`);
  await expect(page.getByTestId("bench-top-bar")).toContainText("Secondary block");
  await bench.signEverything(null);
  await expect(page.getByTestId("job-state")).toContainText("verified");
  await expect(bench.cards().first().getByTestId("signed-by")).toBeVisible();
  await page.evaluate(() => window.scrollTo(0, 0));
  await page.screenshot({ path: screenshotPath("bench-phone-verified") });

  expect((await readJob(tuner.request, job.id)).state).toBe("verified");

  // The tuner's message, as the admin finds it in the outbox.
  const admin = await signedInContext(browser, base, "admin", "desk");
  const office = await admin.newPage();
  await office.goto("/shop/outbox");
  // The folder outlives the database, so an earlier run's job of the same number may be listed too; the
  // newest message comes first, and its link names this job's id.
  const newest = office.getByTestId("outbox-row").first();
  await expect(newest).toContainText(`${job.number} is done`);
  await expect(newest).toContainText(ACCOUNTS.tuner.email);
  await office.screenshot({ path: screenshotPath("outbox"), fullPage: true });
  await newest.getByRole("link").click();
  await expect(office.getByRole("heading", { level: 1 })).toContainText(`${job.number} is done`);
  const text = office.getByTestId("outbox-text");
  await expect(text).toContainText(`/jobs/${job.id}`);
  await expect(text).toContainText("Measured against plan");
  await expect(text).toContainText("PRIMARY BLOCK");
  await expect(text).toContainText("SECONDARY BLOCK");
  await expect(text).toContainText(`signed by ${ACCOUNTS.machinist.name}`);
  await expect(text).not.toContainText("NOT SIGNED");
  await office.screenshot({ path: screenshotPath("outbox-message"), fullPage: true });

  await Promise.all([tuner.close(), phone.close(), admin.close()]);
});

test("an old traveler's QR code opens a superseded page with no way to sign, and the server refuses a sign-off too", async ({ browser, baseURL }) => {
  const base = baseURL!;
  const tuner = await signedInContext(browser, base, "tuner");
  const job = await releaseNewJob(tuner.request, "Ilse Marchetti");
  const primary = blockOf(job, "primary");
  const oldPaper = await downloadTraveler(tuner.request, primary, 1);

  // The car came back: the tuner changes the plan, approves and releases revision 2.
  const patched = await tuner.request.patch(`/api/jobs/${job.id}`, { data: { peakBoost: { value: 10, unit: "psi" } } });
  expect(patched.status()).toBe(200);
  await moveJob(tuner.request, job.id, "planned");
  await moveJob(tuner.request, job.id, "released");
  expect((await readJob(tuner.request, job.id)).currentRevision?.number).toBe(2);

  const scanned = travelerQrText(oldPaper);
  expect(scanned).toBe(`${base}/bench/${primary}?revision=1`);

  const phone = await signedInContext(browser, base, "machinist");
  const page = await phone.newPage();
  await page.goto(onTestServer(scanned, base));
  const warning = page.getByTestId("superseded-warning");
  await expect(warning).toBeVisible();
  await expect(warning).toContainText("Revision 1 is superseded — do not work from this traveler");
  // Full width, at the top, before any operation.
  const viewport = page.viewportSize()!;
  const box = (await warning.boundingBox())!;
  expect(box.width).toBeGreaterThanOrEqual(viewport.width - 1);
  expect(box.y).toBeLessThan(viewport.height / 2);
  const bench = new BenchPage(page);
  expect(await bench.cards().count()).toBeGreaterThan(0);
  await expect(bench.doneButtons()).toHaveCount(0);
  await expect(page.locator('input[type="file"]')).toHaveCount(0);
  await expect(page.locator('input[inputmode="decimal"]')).toHaveCount(0);
  await page.screenshot({ path: screenshotPath("bench-superseded") });

  // A phone that kept the old page open, posting anyway: the server says no.
  const oldOperation = (await bench.cards().first().getAttribute("data-operation-id"))!;
  const refused = await phone.request.post(`/api/operations/${oldOperation}/sign-off`, { data: { readings: [], note: "" } });
  expect(refused.status()).toBe(409);
  expect((await refused.json()).error.message).toContain("Revision 1 is superseded");

  // The big link leads to the current revision, where the work can be signed.
  await warning.getByRole("link", { name: /Open revision 2/ }).click();
  await expect(page).toHaveURL(`${base}/bench/${primary}?revision=2`);
  await expect(page.getByTestId("superseded-warning")).toHaveCount(0);
  await expect(bench.doneButtons().first()).toBeVisible();
  const current = (await bench.cards().first().getAttribute("data-operation-id"))!;
  expect(current).not.toBe(oldOperation);

  // Two phones on the same card: the second Done records nothing and says so.
  const secondPhone = await tuner.newPage();
  await secondPhone.goto(`/bench/${primary}?revision=2`);
  const other = new BenchPage(secondPhone);
  const mine = bench.cards().first();
  const theirs = other.cards().first();
  await bench.fillOnPlan(mine);
  await other.fillOnPlan(theirs);
  await bench.signCard(mine);
  await theirs.getByRole("button", { name: "Done", exact: true }).click();
  await expect(theirs.getByRole("status")).toHaveText("Already signed: nothing was recorded twice.");
  await expect(theirs.getByTestId("signed-by")).toContainText(`Signed by ${ACCOUNTS.machinist.name}`);
  await expect(other.progress()).toContainText("1 of");

  await Promise.all([tuner.close(), phone.close()]);
});
