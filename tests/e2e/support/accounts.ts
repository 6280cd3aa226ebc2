import { expect, type Page } from "@playwright/test";

export const DEMO_PASSWORD = "blockwright-demo";
export const ACCOUNTS = {
  admin: { email: "admin@blockwright.test", name: "Avery Lindqvist" },
  tuner: { email: "tuner@blockwright.test", name: "Mara Quillon" },
  machinist: { email: "machinist@blockwright.test", name: "Theo Varga" },
} as const;
export type DemoRole = keyof typeof ACCOUNTS;

/** The sign-in screen as a user meets it. */
export class SignInPage {
  constructor(private readonly page: Page) {}

  async open(path = "/sign-in") {
    await this.page.goto(path);
    await expect(this.page.getByRole("heading", { name: "Sign in" })).toBeVisible();
  }

  async signIn(email: string, password: string) {
    await this.page.getByLabel("E-mail").fill(email);
    await this.page.getByLabel("Password").fill(password);
    await this.page.getByRole("button", { name: "Sign in" }).click();
  }

  async signInAs(role: DemoRole) {
    await this.open();
    await this.signIn(ACCOUNTS[role].email, DEMO_PASSWORD);
    await expect(this.page.getByTestId("signed-in-user")).toContainText(role);
  }
}

export function screenshotPath(name: string): string {
  return `tests/e2e/screenshots/${name}.png`;
}
