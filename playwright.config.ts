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

export default defineConfig({
  testDir: "tests/e2e",
  outputDir: "test-results",
  fullyParallel: false,
  workers: 1,
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
  projects: [
    { name: "desktop", use: { ...devices["Desktop Chrome"], launchOptions: chromium }, testIgnore: /\.phone\.spec\.ts$/ },
    { name: "phone", use: { ...devices["Pixel 7"], launchOptions: chromium }, testMatch: /\.phone\.spec\.ts$/ },
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
      },
    },
  ],
});
