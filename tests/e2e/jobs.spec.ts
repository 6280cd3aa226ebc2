import { expect, test, type Page } from "@playwright/test";
import { screenshotPath } from "./support/accounts";
import { openSignedIn } from "./support/sessions";

// The office's lists: opening a job through the form, finding it in the jobs table, the customers and
// the drill rack. Runs on the seeded demo shop (three customers, three jobs, inch drills on the rack).

function jobsTable(page: Page) {
  return page.getByRole("table");
}

function jobNumbers(page: Page) {
  return jobsTable(page).locator("tbody tr td:first-child a").allTextContents();
}

test("a tuner opens a job for a new customer, is told what is missing, and finds the job in the sorted, filtered table", async ({ page }) => {
  // A name of its own for each run, so a rerun on the same database still finds exactly one.
  const customer = `Tamsin Ravel ${Date.now().toString(36).slice(-4).toUpperCase()}`;
  await openSignedIn(page, "tuner");
  await page.getByRole("navigation", { name: "Main" }).getByRole("link", { name: "Jobs" }).click();
  await expect(page.getByRole("heading", { level: 1, name: "Jobs" })).toBeVisible();
  await page.getByRole("link", { name: "New job" }).click();
  await expect(page).toHaveURL(/\/jobs\/new$/);

  const form = page.getByRole("form", { name: "New job" });
  await expect(form.getByLabel("Customer", { exact: true })).toHaveValue("");
  await form.getByLabel("New customer's name").fill(customer);
  await form.getByLabel("Displacement", { exact: true }).fill("350");
  await form.getByLabel("Peak boost", { exact: true }).fill("9");
  await form.getByLabel("Intercooled").check();
  await expect(form.getByLabel("Target lambda, atmospheric")).toHaveValue("0.88");
  await form.getByRole("button", { name: "Open the job" }).click();

  // The carburetor was left empty: its error sits beside it, and everything typed is still there.
  await expect(form.getByText("Describe the carburetor.")).toBeVisible();
  await expect(form.getByLabel("Carburetor", { exact: true })).toHaveAttribute("aria-invalid", "true");
  await expect(form.getByLabel("New customer's name")).toHaveValue(customer);
  await expect(form.getByLabel("Displacement", { exact: true })).toHaveValue("350");
  await expect(form.getByLabel("Peak boost", { exact: true })).toHaveValue("9");
  await expect(form.getByLabel("Intercooled")).toBeChecked();
  await page.screenshot({ path: screenshotPath("new-job-error"), fullPage: true });

  await form.getByLabel("Carburetor", { exact: true }).fill("Four-barrel, 750 cfm, mechanical secondaries");
  await form.getByRole("button", { name: "Open the job" }).click();
  await expect(page).toHaveURL(/\/jobs\/[0-9a-f-]{36}$/);

  // The table lists it, as a draft held by the tuner.
  await page.goto("/jobs");
  const row = jobsTable(page).getByRole("row").filter({ hasText: customer });
  await expect(row).toHaveCount(1);
  await expect(row).toContainText("draft");
  await expect(row).toContainText("Mara Quillon");
  const number = (await row.getByRole("link").textContent())!.trim();
  expect(number).toMatch(/^BW-\d{4}$/);

  // Sorting is the server's: by job number, one way and the other.
  await jobsTable(page).getByRole("button", { name: "Job", exact: true }).click();
  await expect(page).toHaveURL(/sort=number&dir=asc/);
  await expect(jobsTable(page).locator("tbody tr").first()).toContainText("BW-0001");
  const ascending = await jobNumbers(page);
  expect(ascending).toEqual([...ascending].sort());
  await jobsTable(page).getByRole("button", { name: "Job", exact: true }).click();
  await expect(page).toHaveURL(/sort=number&dir=desc/);
  await expect(jobsTable(page).locator("tbody tr").first()).toContainText(number);

  // Filtering by state keeps only drafts, and the address keeps the filter through a reload.
  const filters = page.getByRole("search", { name: "Filter jobs" });
  await filters.getByLabel("State").selectOption("released");
  await expect(page).toHaveURL(/state=released/);
  await expect(jobsTable(page).getByRole("row").filter({ hasText: customer })).toHaveCount(0);
  await expect(jobsTable(page).locator("tbody tr").first()).toContainText("released");
  await filters.getByLabel("State").selectOption("draft");
  await expect(jobsTable(page).getByRole("row").filter({ hasText: customer })).toHaveCount(1);
  await page.reload();
  await expect(filters.getByLabel("State")).toHaveValue("draft");
  await expect(jobsTable(page).getByRole("row").filter({ hasText: customer })).toHaveCount(1);
  const states = await jobsTable(page).locator("tbody tr td:nth-child(2)").allTextContents();
  expect(states.length).toBeGreaterThan(0);
  expect(states.every((s) => s.trim() === "draft")).toBe(true);

  // The search box narrows the list once typing pauses.
  await filters.getByLabel("Search").fill(customer.split(" ")[1]!);
  await expect(page).toHaveURL(/q=Ravel/);
  await expect(jobsTable(page).getByRole("row").filter({ hasText: customer })).toHaveCount(1);
  await expect(jobsTable(page).locator("tbody tr").filter({ hasNotText: "Ravel" })).toHaveCount(0);
  await filters.getByLabel("Search").fill("");
  await filters.getByRole("button", { name: "Clear filters" }).click();
  await expect(page).toHaveURL(/\/jobs\?sort=number&dir=desc$/);
  await expect(page.getByRole("status").filter({ hasText: /^1–\d+ of \d+$/ })).toBeVisible();
  await page.screenshot({ path: screenshotPath("jobs-table"), fullPage: true });
});

test("a search that matches nothing says so, and clearing it brings the jobs back", async ({ page }) => {
  await openSignedIn(page, "admin");
  await page.goto("/jobs?q=no-such-job-anywhere");
  await expect(page.getByText("No jobs match “no-such-job-anywhere”.")).toBeVisible();
  await page.getByRole("table").getByRole("button", { name: "Clear filters" }).click();
  await expect(page).toHaveURL(/\/jobs$/);
  await expect(page.getByRole("table").locator("tbody tr").first()).toContainText(/BW-\d{4}/);
});

test("when the list cannot be read the table says why, and Retry reads it again", async ({ page }) => {
  await openSignedIn(page, "tuner");
  let failing = true;
  await page.route(/\/api\/jobs\?/, (route) =>
    failing
      ? route.fulfill({ status: 500, contentType: "application/json", body: JSON.stringify({ error: { code: "internal", message: "Something went wrong on the server." } }) })
      : route.continue(),
  );
  await page.goto("/jobs");
  const alert = page.getByRole("main").getByRole("alert");
  await expect(alert).toContainText("The jobs could not be loaded: Something went wrong on the server.");
  failing = false;
  await alert.getByRole("button", { name: "Retry" }).click();
  await expect(page.getByRole("table").locator("tbody tr").first()).toContainText(/BW-\d{4}/);
  await expect(alert).toHaveCount(0);
});

test("a machinist sees released work only, and no way to open a job", async ({ page }) => {
  await openSignedIn(page, "machinist");
  await page.goto("/jobs");
  await expect(page.getByRole("status").filter({ hasText: /of \d+$/ })).toBeVisible();
  const states = await page.getByRole("table").locator("tbody tr td:nth-child(2)").allTextContents();
  expect(states.length).toBeGreaterThan(0);
  expect(states.some((s) => s.trim() === "draft")).toBe(false);
  await expect(page.getByRole("link", { name: "New job" })).toHaveCount(0);
});

test("an admin finds a customer and follows their jobs into the filtered table", async ({ page }) => {
  await openSignedIn(page, "admin");
  await page.goto("/shop/customers");
  await expect(page.getByRole("heading", { level: 1, name: "Customers" })).toBeVisible();
  const search = page.getByRole("search", { name: "Find customers" });
  await search.getByLabel("Search").fill("juniper");
  await search.getByRole("button", { name: "Search" }).click();
  await expect(page).toHaveURL(/q=juniper/);
  const row = page.getByTestId("customer-row-Juniper Ashdown");
  await expect(row).toBeVisible();
  await page.getByRole("link", { name: "Show all" }).click();
  await expect(page.getByTestId("customer-row-Castor Vell")).toBeVisible();
  await page.screenshot({ path: screenshotPath("customers"), fullPage: true });

  await page.getByTestId("customer-row-Juniper Ashdown").getByRole("link", { name: /^\d+ jobs? →$/ }).click();
  await expect(page).toHaveURL(/\/jobs\?customer=[0-9a-f-]{36}$/);
  await expect(page.getByRole("search", { name: "Filter jobs" }).getByLabel("Customer")).toHaveValue(/[0-9a-f-]{36}/);
  // The table reads the list in the browser: wait for the filtered rows before reading them all.
  await expect(page.getByRole("table").locator("tbody tr td:nth-child(3)").first()).toHaveText("Juniper Ashdown");
  const customers = await page.getByRole("table").locator("tbody tr td:nth-child(3)").allTextContents();
  expect(customers.length).toBeGreaterThan(0);
  expect(new Set(customers)).toEqual(new Set(["Juniper Ashdown"]));
});

test("an admin adds a customer and corrects them, with the field named when it is wrong", async ({ page }) => {
  const name = `Ottoline Brisk ${Date.now().toString(36).slice(-4).toUpperCase()}`;
  await openSignedIn(page, "admin");
  await page.goto("/shop/customers");
  const add = page.getByRole("form", { name: "Add a customer" });
  await add.getByLabel("Name").fill(name);
  await add.getByLabel("E-mail").fill("not an address");
  await add.getByRole("button", { name: "Add customer" }).click();
  await expect(add.getByText("Enter a valid e-mail address, or leave it empty.")).toBeVisible();
  await add.getByLabel("E-mail").fill("ottoline@example.test");
  await add.getByRole("button", { name: "Add customer" }).click();
  await expect(add.getByRole("status")).toContainText(`${name} added.`);
  const row = page.getByTestId(`customer-row-${name}`);
  await expect(row).toContainText("0 jobs");
  await row.getByRole("link", { name: `Edit ${name}` }).click();
  const edit = page.getByRole("form", { name: `Edit ${name}` });
  await edit.getByLabel("Phone").fill("555 0177");
  await edit.getByRole("button", { name: "Save changes" }).click();
  await expect(edit.getByRole("status")).toContainText("saved");
  await expect(page.getByTestId(`customer-row-${name}`)).toContainText("555 0177");
});

test("an admin takes a drill off the rack and it stays off after a reload", async ({ page }) => {
  await openSignedIn(page, "admin");
  await page.goto("/shop/drills");
  await expect(page.getByRole("heading", { level: 1, name: "Drill rack" })).toBeVisible();
  const drill = page.getByRole("checkbox", { name: "#43 on the rack" });
  const count = page.getByTestId("rack-count");
  // The demo shop keeps every number drill on its rack; put #43 there first if an earlier run left it off.
  if (!(await drill.isChecked())) {
    await drill.check();
    await expect(page.getByText("saving…")).toHaveCount(0);
    await page.reload();
  }
  await expect(drill).toBeChecked();
  const before = Number(await count.textContent());
  const saved = page.waitForResponse((response) => response.request().method() === "POST" && response.url().includes("/shop/drills"));
  await drill.uncheck();
  await expect(drill).not.toBeChecked();
  await expect(count).toHaveText(String(before - 1));
  await saved;
  await expect(page.getByText("saving…")).toHaveCount(0);
  await expect(page.getByRole("main").getByRole("alert")).toHaveCount(0);

  await page.reload();
  await expect(page.getByRole("checkbox", { name: "#43 on the rack" })).not.toBeChecked();
  await expect(page.getByTestId("rack-count")).toHaveText(String(before - 1));
  await page.screenshot({ path: screenshotPath("drill-rack"), fullPage: true });

  // Put it back, so the demo rack is whole again.
  await page.getByRole("checkbox", { name: "#43 on the rack" }).check();
  await expect(page.getByText("saving…")).toHaveCount(0);
  await page.reload();
  await expect(page.getByRole("checkbox", { name: "#43 on the rack" })).toBeChecked();
});

test("a tuner sees the rack but cannot change it", async ({ page }) => {
  await openSignedIn(page, "tuner");
  await page.goto("/shop/drills");
  await expect(page.getByText("Only an admin changes the rack.")).toBeVisible();
  await expect(page.getByRole("checkbox", { name: "#43 on the rack" })).toBeDisabled();
  await expect(page.getByRole("button", { name: /^Stock all/ })).toHaveCount(0);
});
