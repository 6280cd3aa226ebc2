import { expect, test } from "@playwright/test";
import { ACCOUNTS, screenshotPath, SignInPage, type DemoRole } from "./support/accounts";

test("the sign-in page greets an anonymous visitor, and pages send them there", async ({ page }) => {
  await page.goto("/shop/users");
  await expect(page).toHaveURL(/\/sign-in\?callbackUrl=%2Fshop%2Fusers/);
  await expect(page.getByRole("heading", { name: "Blockwright" })).toBeVisible();
  await page.screenshot({ path: screenshotPath("sign-in"), fullPage: true });
});

test("a wrong password is refused with a message, not a crash", async ({ page }) => {
  const signIn = new SignInPage(page);
  await signIn.open();
  await signIn.signIn(ACCOUNTS.tuner.email, "not-the-password");
  await expect(page.getByRole("alert").filter({ hasText: "Wrong e-mail or password" })).toBeVisible();
});

test("the sign-in form names the field that is missing", async ({ page }) => {
  const signIn = new SignInPage(page);
  await signIn.open();
  await page.getByRole("button", { name: "Sign in" }).click();
  await expect(page.getByText("Enter the e-mail address of your account.")).toBeVisible();
});

for (const role of Object.keys(ACCOUNTS) as DemoRole[]) {
  test(`${role} signs in and sees their home page`, async ({ page }) => {
    await new SignInPage(page).signInAs(role);
    await expect(page.getByRole("heading", { level: 1 })).toContainText(ACCOUNTS[role].name.split(" ")[0]!);
    // The home page is the person's work; the cautions are one click away.
    await expect(page.getByRole("link", { name: /^Safety: \d+ cautions/ })).toBeVisible();
    await expect(page.getByRole("status").filter({ hasText: "Reading your work" })).toHaveCount(0);
    await page.screenshot({ path: screenshotPath(`home-${role}`), fullPage: true });
    await page.getByRole("button", { name: "Sign out" }).click();
    await expect(page).toHaveURL(/\/sign-in/);
  });
}

test("the users page is forbidden to a machinist and a tuner", async ({ page }) => {
  for (const role of ["machinist", "tuner"] as const) {
    await new SignInPage(page).signInAs(role);
    await page.goto("/shop/users");
    await expect(page.getByRole("heading", { name: "Forbidden" })).toBeVisible();
    await page.context().clearCookies();
  }
});

test("an admin adds a user, who signs in; once deactivated they cannot, and their session stops", async ({ browser }) => {
  const adminContext = await browser.newContext();
  const admin = await adminContext.newPage();
  await new SignInPage(admin).signInAs("admin");
  await admin.goto("/shop/users");
  const email = `bench-${Date.now()}@blockwright.test`;
  const form = admin.getByRole("form", { name: "Add a user" });
  await form.getByLabel("Name").fill("Rowan Pell");
  await form.getByLabel("E-mail").fill(email);
  await form.getByLabel("Role").selectOption("machinist");
  await form.getByLabel("Starting password").fill("a-long-start-password");
  await form.getByRole("button", { name: "Add user" }).click();
  await expect(admin.getByRole("status")).toContainText("Rowan Pell can now sign in as machinist");
  await admin.screenshot({ path: screenshotPath("shop-users"), fullPage: true });

  const newcomerContext = await browser.newContext();
  const newcomer = await newcomerContext.newPage();
  const signIn = new SignInPage(newcomer);
  await signIn.open();
  await signIn.signIn(email, "a-long-start-password");
  await expect(newcomer.getByTestId("signed-in-user")).toContainText("machinist");

  const row = admin.getByTestId(`user-row-${email}`);
  await row.getByRole("button", { name: "Deactivate" }).click();
  await expect(row.getByText("deactivated")).toBeVisible();

  // The open session no longer works.
  await newcomer.goto("/");
  await expect(newcomer).toHaveURL(/\/sign-in/);
  await signIn.signIn(email, "a-long-start-password");
  await expect(newcomer.getByRole("alert").filter({ hasText: "the account is deactivated" })).toBeVisible();
  await adminContext.close();
  await newcomerContext.close();
});
