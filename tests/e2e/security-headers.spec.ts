import { expect, test } from "@playwright/test";
import { SignInPage } from "./support/accounts";

// The served app, not the functions that build its headers: every answer carries them, Next puts the request's
// nonce on its own scripts, and pages run without a single Content-Security-Policy refusal.

const REQUIRED = {
  "x-frame-options": /^DENY$/,
  "referrer-policy": /^strict-origin-when-cross-origin$/,
  "permissions-policy": /geolocation=\(\)/,
  "x-content-type-options": /^nosniff$/,
  "strict-transport-security": /max-age=\d+/,
};

test("pages and the API carry the security headers, and pages run under the CSP", async ({ page }) => {
  const refusals: string[] = [];
  page.on("console", (message) => {
    if (/Content Security Policy|Refused to (execute|load|apply|connect|frame)/i.test(message.text())) refusals.push(message.text());
  });
  const signInAnswer = await page.goto("/sign-in");
  const headers = signInAnswer!.headers();
  const csp = headers["content-security-policy"] ?? "";
  expect(csp).toMatch(/script-src 'self' 'nonce-[^']+' 'strict-dynamic'/);
  expect(csp).not.toMatch(/script-src[^;]*'unsafe-inline'/);
  expect(csp).toContain("frame-ancestors 'none'");
  for (const [name, pattern] of Object.entries(REQUIRED)) expect(headers[name], name).toMatch(pattern);

  // Next reads the nonce from the request's policy and puts it on every script it writes.
  const nonce = /'nonce-([^']+)'/.exec(csp)![1];
  const scriptNonces = await page.locator("script").evaluateAll((scripts) => scripts.map((s) => (s as HTMLScriptElement).nonce));
  expect(scriptNonces.length).toBeGreaterThan(0);
  expect(scriptNonces.every((n) => n === nonce)).toBe(true);

  await new SignInPage(page).signInAs("tuner");
  for (const path of ["/jobs", "/reference", "/reference/calculators", "/account"]) {
    const answer = await page.goto(path);
    expect(answer!.headers()["content-security-policy"], path).toMatch(/'nonce-/);
    await expect(page.getByTestId("signed-in-user")).toBeVisible();
  }
  const api = await page.request.get("/api/jobs");
  for (const [name, pattern] of Object.entries(REQUIRED)) expect(api.headers()[name], `/api/jobs ${name}`).toMatch(pattern);
  expect(refusals).toEqual([]);
});

test("a cross-site form post to the API changes nothing", async ({ page }) => {
  await new SignInPage(page).signInAs("admin");
  const answer = await page.request.post("/api/users", {
    headers: { origin: "http://elsewhere.example", "content-type": "text/plain" },
    data: JSON.stringify({ name: "Mallory Vance", email: "mallory@blockwright.test", role: "admin", password: "copper lathe quiet harbor" }),
  });
  expect(answer.status()).toBe(403);
});
