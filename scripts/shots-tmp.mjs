import { chromium } from "@playwright/test";
const base = process.env.BASE ?? "http://127.0.0.1:3200";
const browser = await chromium.launch({ executablePath: "/usr/bin/chromium", args: ["--headless", "--no-sandbox", "--disable-gpu", "--disable-quic", "--no-first-run", "--disable-background-networking", "--disable-component-update", "--disable-sync"] });
const page = await browser.newPage({ viewport: { width: 1400, height: 1000 } });
await page.goto(`${base}/sign-in`);
await page.getByLabel("E-mail").fill(process.env.WHO ?? "tuner@blockwright.test");
await page.getByLabel("Password").fill("blockwright-demo");
await page.getByRole("button", { name: /sign in/i }).click();
await page.waitForURL((u) => !u.pathname.startsWith("/sign-in"));
const res = await page.request.get(`${base}/api/jobs?pageSize=10`);
const { jobs } = await res.json();
for (const job of jobs) {
  await page.goto(`${base}/jobs/${job.id}`);
  await page.waitForLoadState("networkidle");
  const height = await page.evaluate(() => document.body.scrollHeight);
  for (let y = 0, i = 0; y < height && i < 8; y += 1300, i++) {
    await page.screenshot({ path: `/tmp/bw/shots/job-${job.number}-${i}.png`, clip: { x: 0, y, width: 1400, height: 1300 }, fullPage: true });
  }
  console.log(job.number, job.state);
}
for (const path of (process.env.EXTRA ?? "").split(",").filter(Boolean)) {
  await page.goto(`${base}${path}`);
  await page.waitForLoadState("networkidle");
  await page.screenshot({ path: `/tmp/bw/shots/${path.replaceAll("/", "_")}.png`, fullPage: true });
}
await browser.close();
