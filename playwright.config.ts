import { defineConfig, devices } from "@playwright/test";
import path from "node:path";

// Ports of their own, so the tests never meet a running `npm start`.
const appPort = 3100;
const smtpPort = 2526;
const s3Port = 4570;
export const baseURL = `http://127.0.0.1:${appPort}`;
const dataDir = path.resolve(".data/e2e");

const serviceEnv = {
  SMTP_PORT: String(smtpPort),
  S3_PORT: String(s3Port),
  MAIL_OUTBOX_DIR: path.join(dataDir, "outbox"),
  S3_DATA_DIR: path.join(dataDir, "s3"),
};

const chromium = {
  executablePath: process.env.CHROMIUM_PATH ?? "/usr/bin/chromium",
  args: [
    "--headless",
    "--no-sandbox",
    "--disable-gpu",
    "--disable-quic",
    "--no-first-run",
    "--disable-background-networking",
    "--disable-component-update",
    "--disable-sync",
  ],
};

const desktop = { ...devices["Desktop Chrome"], launchOptions: chromium };

export default defineConfig({
  testDir: "tests/e2e",
  outputDir: "test-results",
  fullyParallel: false,
  // Two browsers at a time; specs that read records another spec changes are chained by the projects below.
  workers: 2,
  retries: 0,
  timeout: 60_000,
  expect: { timeout: 10_000 },
  reporter: [["list"]],
  use: {
    baseURL,
    launchOptions: chromium,
    trace: "retain-on-failure",
    screenshot: "only-on-failure",
  },
  // Each role signs in once ("sign-in"); the specs reuse the session unless signing in is what they test.
  // Specs that share demo records run one after the other, in the order of their dependencies: the tuner's
  // inch/mm choice (reference changes it; the new-job form, the planner and the bench pages read it), the
  // newest job in the sorted table (jobs reads it; planner and phone add jobs) and the outbox's newest
  // message (phone reads it; planner's release sends mail). The sign-in spec signs people out, which ends
  // their saved sessions too, so it runs after all of them.
  projects: [
    { name: "sign-in", use: desktop, testMatch: /\.setup\.ts$/, fullyParallel: true },
    // Signing out ends every session of that person (the session version is per user), the saved ones
    // included: the sign-in spec runs last, one test at a time.
    { name: "desktop", use: desktop, testMatch: /auth\.spec\.ts$/, fullyParallel: false, dependencies: ["phone"] },
    // Signs in through the form and never out: beside the chain.
    { name: "desktop-security", use: desktop, testMatch: /security-headers\.spec\.ts$/, dependencies: ["sign-in"] },
    // Its tests change nothing the others read, so they share the two workers.
    { name: "desktop-jobs", use: desktop, testMatch: /jobs\.spec\.ts$/, fullyParallel: true, dependencies: ["sign-in"] },
    // Reads only: axe on every working screen, beside the chain.
    { name: "desktop-accessibility", use: desktop, testMatch: /accessibility\.spec\.ts$/, dependencies: ["sign-in"] },
    { name: "desktop-reference", use: desktop, testMatch: /reference\.spec\.ts$/, dependencies: ["desktop-jobs"] },
    { name: "desktop-planner", use: desktop, testMatch: /planner\.spec\.ts$/, dependencies: ["desktop-reference"] },
    // Releases a revision 2 (mail to the bench) before the phone spec reads the outbox's newest message.
    { name: "desktop-dyno", use: desktop, testMatch: /dyno\.spec\.ts$/, dependencies: ["desktop-planner"] },
    { name: "phone", use: { ...devices["Pixel 7"], launchOptions: chromium }, testMatch: /\.phone\.spec\.ts$/, dependencies: ["desktop-dyno"] },
  ],
  webServer: [
    {
      command: "npx tsx scripts/fakes.ts",
      port: smtpPort,
      reuseExistingServer: false,
      env: serviceEnv,
      timeout: 30_000,
    },
    {
      command: "bash scripts/serve-e2e.sh",
      url: `${baseURL}/sign-in`,
      reuseExistingServer: false,
      timeout: 300_000,
      env: {
        ...serviceEnv,
        PORT: String(appPort),
        APP_BASE_URL: baseURL,
        NEXTAUTH_URL: baseURL,
        SMTP_HOST: "127.0.0.1",
        S3_ENDPOINT: `http://127.0.0.1:${s3Port}`,
        // Mail leaves through the queue's worker: look for it every half second, so the outbox has it by the
        // time a spec opens the page.
        MAIL_POLL_SECONDS: "0.5",
      },
    },
  ],
});
