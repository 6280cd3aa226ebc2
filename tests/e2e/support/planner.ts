import { expect, type Locator, type Page } from "@playwright/test";
import { demoJobBody } from "../../support/job-fixtures";

// The job page and its blocks form, as the tuner and the machinist meet them.

/** The demo job in the JSON API's terms, with the planner journey's own carburetor, 9 psi and lambda 0.78 at peak. */
export function newJobBody(customer: string) {
  return demoJobBody({
    newCustomerName: customer,
    carburetor: "Four-barrel, 750 cfm, boost-referenced secondaries",
    peakBoost: { value: 9, unit: "psi" },
    targetLambdaPeak: 0.78,
  });
}

export class BlocksForm {
  readonly form: Locator;

  constructor(private readonly page: Page) {
    this.form = page.getByRole("form", { name: "Metering blocks" });
  }

  block(side: "Primary" | "Secondary"): Locator {
    return this.form.getByRole("region", { name: `${side} block` });
  }

  stage(side: "Primary" | "Secondary", n: number): Locator {
    return this.block(side).getByRole("group", { name: `Stage ${n}`, exact: true });
  }

  /** The number box labelled `label` (not the unit chosen beside it), marked optional or not. */
  box(scope: Locator, label: string): Locator {
    const escaped = label.replace(/[.*+?^${}()|[\]\\]/g, "\\$&");
    return scope.getByRole("textbox", { name: new RegExp(`^${escaped}( \\(optional\\))?$`) });
  }

  async fill(scope: Locator, label: string, value: string) {
    await this.box(scope, label).fill(value);
  }

  async addStage(side: "Primary" | "Secondary") {
    const before = await this.block(side).getByRole("group", { name: /^Stage \d$/ }).count();
    await this.block(side).getByRole("button", { name: /^Add a stage/ }).click();
    await expect(this.block(side).getByRole("group", { name: /^Stage \d$/ })).toHaveCount(before + 1);
  }

  async addBlock(side: "primary" | "secondary") {
    await this.form.getByRole("button", { name: `Add the ${side} block` }).click();
    await expect(this.block(side === "primary" ? "Primary" : "Secondary")).toBeVisible();
  }

  async save() {
    await this.form.getByRole("button", { name: "Save blocks and stages" }).click();
  }
}

export class JobPage {
  constructor(private readonly page: Page) {}

  async open(id: string) {
    await this.page.goto(`/jobs/${id}`);
    await expect(this.page.getByRole("heading", { level: 2, name: "Plan" })).toBeVisible();
  }

  state(): Locator {
    return this.page.getByTestId("job-state");
  }

  layouts(side: "primary" | "secondary", stage: number): Locator {
    return this.page.getByRole("region", { name: `${side} stages` }).getByRole("table", { name: `Hole layouts for stage ${stage}` });
  }

  async move(button: string | RegExp, expected: RegExp) {
    await this.page.getByRole("form", { name: "Job state" }).getByRole("button", { name: button }).click();
    // Releasing sends the travelers out by mail: allow it the time that takes.
    await expect(this.page.getByRole("status")).toContainText(expected, { timeout: 30_000 });
  }

  revisionRow(n: number): Locator {
    return this.page.getByTestId(`revision-${n}`);
  }
}
