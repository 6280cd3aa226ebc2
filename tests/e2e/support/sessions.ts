import { readFileSync } from "node:fs";
import path from "node:path";
import { expect, type BrowserContext, type Page } from "@playwright/test";
import type { DemoRole } from "./accounts";

// Each demo role signs in once per run (sign-in.setup.ts) and the tests that are not about signing in reuse
// that session: a real sign-in through the form costs a page, a POST and a redirect every time.

/** Where the setup project keeps a role's session (under .data, ignored by git). */
export function sessionFile(role: DemoRole): string {
  return path.resolve(".data/e2e/sessions", `${role}.json`);
}

/** Puts the role's saved session cookies into a browser context. */
export async function addSession(context: BrowserContext, role: DemoRole): Promise<void> {
  const state = JSON.parse(readFileSync(sessionFile(role), "utf8")) as { cookies: Parameters<BrowserContext["addCookies"]>[0] };
  await context.addCookies(state.cookies);
}

/** The page signed in as the role, on the home page, showing who is signed in: where a sign-in lands. */
export async function openSignedIn(page: Page, role: DemoRole): Promise<void> {
  await addSession(page.context(), role);
  await page.goto("/");
  await expect(page.getByTestId("signed-in-user")).toContainText(role);
}
