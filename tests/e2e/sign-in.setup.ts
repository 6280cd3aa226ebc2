import { mkdirSync } from "node:fs";
import path from "node:path";
import { test as setup } from "@playwright/test";
import { ACCOUNTS, SignInPage, type DemoRole } from "./support/accounts";
import { sessionFile } from "./support/sessions";

// Signs each demo role in through the form once and keeps the session for the other specs.
for (const role of Object.keys(ACCOUNTS) as DemoRole[]) {
  setup(`sign in as ${role}`, async ({ page }) => {
    await new SignInPage(page).signInAs(role);
    mkdirSync(path.dirname(sessionFile(role)), { recursive: true });
    await page.context().storageState({ path: sessionFile(role) });
  });
}
