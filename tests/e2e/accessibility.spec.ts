import AxeBuilder from "@axe-core/playwright";
import { expect, test, type Page } from "@playwright/test";
import type { DemoRole } from "./support/accounts";
import { openSignedIn } from "./support/sessions";

// Every screen a person works from, checked with axe against WCAG 2.1 A and AA: the home queues of each role,
// the cautions, the jobs table, a job, a customer's record and a bench page on a phone-sized screen.

const WCAG = ["wcag2a", "wcag2aa", "wcag21a", "wcag21aa"];

async function expectNoViolations(page: Page, where: string) {
  const results = await new AxeBuilder({ page }).withTags(WCAG).analyze();
  // Serious and critical findings fail the check; moderate and minor ones are listed in the report only.
  const found = results.violations
    .filter((v) => v.impact === "serious" || v.impact === "critical")
    .map((v) => `${v.id} (${v.impact}): ${v.nodes.map((n) => n.target.join(" ")).join(", ")}`);
  expect(found, where).toEqual([]);
}

for (const role of ["tuner", "machinist", "admin"] as const satisfies readonly DemoRole[]) {
  test(`the ${role}'s home queue and the cautions have no accessibility violations`, async ({ page }) => {
    await openSignedIn(page, role);
    // The queue is read after the page loads: wait for it, not for the loading line.
    await expect(page.getByRole("status").filter({ hasText: "Reading your work" })).toHaveCount(0);
    await expectNoViolations(page, `${role} home`);
    await page.getByRole("link", { name: /^Safety:/ }).click();
    await expect(page.getByRole("heading", { name: "Safety", level: 1 })).toBeVisible();
    await expectNoViolations(page, `${role} safety`);
  });
}

test("the jobs table, a job and a customer's page have no accessibility violations", async ({ page }) => {
  await openSignedIn(page, "tuner");
  await page.goto("/jobs");
  await expect(page.locator("tbody tr").first()).toBeVisible();
  await expectNoViolations(page, "jobs");
  await page.locator("tbody tr a").first().click();
  await expect(page.getByRole("form", { name: "Job state" })).toBeVisible();
  await expectNoViolations(page, "job");
  await page.goto("/shop/customers");
  await page.locator("tbody tr a").first().click();
  await expect(page.getByRole("heading", { level: 1 })).toBeVisible();
  await expectNoViolations(page, "customer");
});

test.describe("on a phone", () => {
  test.use({ viewport: { width: 412, height: 915 }, isMobile: true, hasTouch: true });

  test("a bench page opened from the machinist's queue has no accessibility violations", async ({ page }) => {
    await openSignedIn(page, "machinist");
    // The demo shop has released work: the queue links its blocks' bench pages.
    const block = page.getByRole("link", { name: /block, revision \d+/ }).first();
    await expect(block).toBeVisible();
    await block.click();
    await expect(page).toHaveURL(/\/bench\/[^/?]+\?revision=\d+/);
    await expectNoViolations(page, "bench");
  });
});
