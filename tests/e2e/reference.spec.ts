import { expect, test, type Page } from "@playwright/test";
import { screenshotPath } from "./support/accounts";
import { openSignedIn } from "./support/sessions";

// The reference place as a tuner meets it: charts, the inch/mm switch, and the calculators.

async function chooseUnit(page: Page, unit: "in" | "mm") {
  const switcher = page.getByRole("form", { name: "Length unit" });
  await switcher.getByRole("button", { name: unit, exact: true }).click();
  await expect(switcher.getByRole("button", { name: unit, exact: true })).toHaveAttribute("aria-pressed", "true");
}

test.beforeEach(async ({ page }) => {
  await openSignedIn(page, "tuner");
});

test("the drill chart finds drills by label and size, in the unit the user keeps", async ({ page }) => {
  await page.goto("/reference");
  await page.getByRole("link", { name: /Drill chart/ }).click();
  await expect(page.getByRole("heading", { name: "Drill chart", level: 1 })).toBeVisible();
  const chart = page.getByTestId("drill-chart");
  const search = page.getByRole("search", { name: "Find a drill" });

  await search.getByLabel("Find a drill").fill("43");
  await search.getByRole("button", { name: "Find" }).click();
  await expect(page).toHaveURL(/q=43/);
  await expect(chart.locator("tbody tr")).toHaveCount(1);
  // ASME B94.11M: #43 = 0.0890 in
  await expect(chart.getByRole("row", { name: /#43/ })).toContainText("0.0890");

  await search.getByLabel("Find a drill").fill("2.5");
  await search.getByRole("button", { name: "Find" }).click();
  // 2.50 mm = 2.5 / 25.4 = 0.0984 in; #40 = 0.0980 in = 2.489 mm also rounds to 2.5 mm.
  await expect(chart.getByRole("row", { name: /2\.50 mm/ })).toContainText("0.0984");
  await expect(chart.getByRole("row", { name: /#40/ })).toBeVisible();
  await page.screenshot({ path: screenshotPath("reference-drills"), fullPage: true });

  await chooseUnit(page, "mm");
  await expect(chart.getByRole("columnheader", { name: "Diameter, mm" })).toBeVisible();
  // 0.0980 in x 25.4 = 2.4892 mm, shown to thousandths
  await expect(chart.getByRole("row", { name: /#40/ })).toContainText("2.489");
  await page.reload();
  await expect(page.getByRole("form", { name: "Length unit" }).getByRole("button", { name: "mm", exact: true })).toHaveAttribute("aria-pressed", "true");
  await expect(page.getByTestId("drill-chart").getByRole("columnheader", { name: "Diameter, mm" })).toBeVisible();
  await chooseUnit(page, "in");
  await expect(page.getByTestId("drill-chart").getByRole("columnheader", { name: "Diameter, in" })).toBeVisible();
});

test("the tap-drill chart lists every thread with its tap and clearance drills", async ({ page }) => {
  await page.goto("/reference/tap-drills");
  const chart = page.getByTestId("tap-drill-chart");
  // handbook tap-drill table: 1/4-20 -> #7, M6x1 -> 5.0 mm
  await expect(chart.getByRole("row", { name: /1\/4-20 UNC/ })).toContainText("#7");
  await expect(chart.getByRole("row", { name: /M6x1 / })).toContainText("5.00 mm");
  await page.screenshot({ path: screenshotPath("reference-tap-drills"), fullPage: true });

  const search = page.getByRole("search", { name: "Find a thread" });
  await search.getByLabel("Find a thread").fill("4-40");
  await search.getByRole("button", { name: "Find" }).click();
  await expect(chart.locator("tbody tr")).toHaveCount(1);
  await expect(chart.getByRole("row", { name: /#4-40 UNC/ })).toContainText("#43"); // handbook: 4-40 -> #43
});

test("the tap-drill calculator gives #43 for 4-40 and keeps what was typed", async ({ page }) => {
  await page.goto("/reference/calculators/tap-drill");
  const form = page.getByRole("form", { name: "Tap drill" });
  await form.getByRole("button", { name: "Find tap drill" }).click();
  await expect(form.getByText("Enter a thread, such as 4-40 or M3x0.5.")).toBeVisible();

  await form.getByLabel("Thread", { exact: true }).fill("4-40");
  await form.getByRole("button", { name: "Find tap drill" }).click();
  await expect(page.getByTestId("tap-drill-label")).toHaveText("#43"); // handbook tap-drill table: 4-40 -> #43
  // (0.112 - 0.089) / (1.299038 x 0.025) x 100 = 70.8 %
  await expect(page.getByTestId("tap-drill-result")).toContainText("70.8 %");
  await expect(form.getByLabel("Thread", { exact: true })).toHaveValue("4-40");
  await expect(form.getByLabel("Thread engagement", { exact: true })).toHaveValue("75");
});

test("the restriction calculator lays out holes for a target area", async ({ page }) => {
  await page.goto("/reference/calculators/restriction");
  const form = page.getByRole("form", { name: "Restriction holes" });
  await form.getByRole("button", { name: "Find hole layouts" }).click();
  await expect(form.getByText("Enter the target area.")).toBeVisible();

  // ASME B94.11M: #52 = 0.0635 in; 2 x pi/4 x 0.0635^2 = 0.0063338 in2
  await form.getByLabel("Target area", { exact: true }).fill("0.0063338");
  await form.getByLabel("Channel length", { exact: true }).fill("0.30");
  await form.getByLabel("Least web", { exact: true }).fill("0.030");
  await form.getByRole("button", { name: "Find hole layouts" }).click();
  const result = page.getByTestId("restriction-result");
  await expect(result.locator("tbody tr").first()).toContainText("2 × #52");
  await expect(form.getByLabel("Target area", { exact: true })).toHaveValue("0.0063338");
  await page.screenshot({ path: screenshotPath("reference-calculators"), fullPage: true });
});

test("the staging calculator charts a lean zone and proposes setpoints", async ({ page }) => {
  await page.goto("/reference/calculators/staging");
  await expect(page.getByRole("note", { name: /WARNING: Pressurized fuel bowls/ })).toBeVisible();
  const form = page.getByRole("form", { name: "Staging" });
  const fill = (label: string, value: string) => form.getByLabel(label, { exact: true }).fill(value);
  await fill("Primary jet bore", "0.076");
  await fill("Secondary jet bore", "0.089");
  await fill("Valve 1 opens at", "6.5");
  await fill("Valve 1 restriction area", "0.0020");
  await fill("Valve 2 opens at", "3");
  await fill("Valve 2 restriction area", "0.0015");
  await fill("Valve 3 opens at", "8");
  await fill("Valve 3 restriction area", "0.0030");
  await fill("Target without boost", "12.5");
  await fill("Target at peak boost", "11.5");
  await fill("Target at cruise", "14.0");
  await fill("Peak boost", "12");
  await fill("Ambient temperature", "77");
  await fill("Charge temperature at peak boost", "130");
  await form.getByRole("button", { name: "Draw the chart" }).click();

  const full = page.getByTestId("staging-chart-full");
  await expect(full.locator("svg[role=img]")).toBeVisible();
  await expect(full.locator("g.zone-lean").first()).toBeAttached();
  await expect(page.getByTestId("zones-full")).toContainText("Lean");
  await expect(full).toContainText("8.0 psi boost");
  await expect(page.getByTestId("staging-chart-part")).toContainText("6.5 inHg vacuum");
  await expect(form.getByLabel("Valve 3 opens at", { exact: true })).toHaveValue("8");
  await page.screenshot({ path: screenshotPath("reference-staging"), fullPage: true });

  await form.getByRole("button", { name: "Propose setpoints" }).click();
  const proposal = page.getByTestId("staging-proposal");
  await expect(proposal.locator("tbody tr")).toHaveCount(2);
  await expect(page.getByTestId("staging-result")).toContainText("Staging with the proposed setpoints");
  await page.screenshot({ path: screenshotPath("reference-staging-proposal"), fullPage: true });
});
