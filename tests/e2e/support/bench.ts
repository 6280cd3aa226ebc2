import { execFileSync } from "node:child_process";
import { mkdtempSync, readFileSync, rmSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import path from "node:path";
import { expect, type APIRequestContext, type Locator, type Page } from "@playwright/test";
import jsQR from "jsqr";
import { PNG } from "pngjs";
import sharp from "sharp";
import { demoBlocksBody, demoJobBody } from "../../support/job-fixtures";

// The journey from the office's API to the machinist's phone: a released job, its printed traveler's QR
// code, and the bench page it opens.

/** The demo job as the tuner enters it through the JSON API, its engine given in litres and °C. */
export function benchJobBody(customer: string) {
  return demoJobBody({
    newCustomerName: customer,
    carburetor: "Four-barrel, 750 cfm class, blow-through hat",
    displacement: { value: 5.7, unit: "L" },
    ambientTemperature: { value: 25, unit: "°C" },
  });
}

/** Both blocks of the demo job: the plan holds together on the whole-engine model (no danger to acknowledge). */
export const benchBlocksBody = demoBlocksBody;

export interface JobDto {
  id: string;
  number: string;
  state: string;
  blocks: { id: string; side: "primary" | "secondary" }[];
  currentRevision: { number: number } | null;
}

async function json<T>(response: Awaited<ReturnType<APIRequestContext["get"]>>, status: number): Promise<T> {
  expect(response.status(), await response.text()).toBe(status);
  return (await response.json()) as T;
}

export async function readJob(request: APIRequestContext, jobId: string): Promise<JobDto> {
  return (await json<{ job: JobDto }>(await request.get(`/api/jobs/${jobId}`), 200)).job;
}

export async function moveJob(request: APIRequestContext, jobId: string, to: "planned" | "released"): Promise<void> {
  await json(await request.post(`/api/jobs/${jobId}/state`, { data: { to } }), 200);
}

/** Creates the job with both blocks, approves it and releases it: what the tuner does before printing. */
export async function releaseNewJob(request: APIRequestContext, customer: string): Promise<JobDto> {
  const created = await json<{ job: JobDto }>(await request.post("/api/jobs", { data: benchJobBody(customer) }), 201);
  await json(await request.patch(`/api/jobs/${created.job.id}`, { data: benchBlocksBody() }), 200);
  await moveJob(request, created.job.id, "planned");
  await moveJob(request, created.job.id, "released");
  const job = await readJob(request, created.job.id);
  expect(job.state).toBe("released");
  return job;
}

export function blockOf(job: JobDto, side: "primary" | "secondary"): string {
  const block = job.blocks.find((b) => b.side === side);
  if (!block) throw new Error(`job ${job.number} has no ${side} block`);
  return block.id;
}

/**
 * Reads the QR code on the first page of a traveler PDF the way a phone would see the paper: rendered to
 * pixels (poppler's pdftoppm, 150 dpi), then searched over the whole page.
 */
export function travelerQrText(pdf: Buffer): string {
  const dir = mkdtempSync(path.join(tmpdir(), "blockwright-traveler-"));
  try {
    const file = path.join(dir, "traveler.pdf");
    writeFileSync(file, pdf);
    execFileSync("pdftoppm", ["-png", "-r", "150", "-f", "1", "-l", "1", "-singlefile", file, path.join(dir, "page")]);
    const image = PNG.sync.read(readFileSync(path.join(dir, "page.png")));
    const code = jsQR(new Uint8ClampedArray(image.data.buffer, image.data.byteOffset, image.data.length), image.width, image.height);
    if (!code) throw new Error("no QR code found on the traveler's first page");
    return code.data;
  } finally {
    rmSync(dir, { recursive: true, force: true });
  }
}

export async function downloadTraveler(request: APIRequestContext, blockId: string, revision?: number): Promise<Buffer> {
  const response = await request.get(`/api/blocks/${blockId}/traveler${revision ? `?revision=${revision}` : ""}`);
  expect(response.status()).toBe(200);
  expect(response.headers()["content-type"]).toContain("application/pdf");
  return Buffer.from(await response.body());
}

/** A small photo made for the test: a 96 x 64 PNG of the colour of a freshly cut aluminium face. */
export async function benchPhoto(): Promise<{ name: string; mimeType: string; buffer: Buffer }> {
  const buffer = await sharp({ create: { width: 96, height: 64, channels: 3, background: { r: 196, g: 200, b: 204 } } })
    .png()
    .toBuffer();
  return { name: "boss-after-grind.png", mimeType: "image/png", buffer };
}

/** The bench page for one block, as the machinist's phone shows it. */
export class BenchPage {
  constructor(readonly page: Page) {}

  cards(): Locator {
    return this.page.getByTestId("operation-card");
  }

  openCards(): Locator {
    return this.page.locator('[data-testid="operation-card"][data-signed="no"]');
  }

  doneButtons(): Locator {
    return this.page.getByRole("button", { name: "Done", exact: true });
  }

  progress(): Locator {
    return this.page.getByTestId("bench-progress");
  }

  /**
   * Types every reading of an open card exactly on plan, reading the planned value the card shows in its
   * default unit ("Plan 0.0520 in"), and checks the card calls it within plan before anything is sent.
   */
  async fillOnPlan(card: Locator): Promise<number> {
    const boxes = card.locator('input[inputmode="decimal"]');
    const count = await boxes.count();
    for (let i = 0; i < count; i++) {
      const box = boxes.nth(i);
      const describedBy = (await box.getAttribute("aria-describedby"))!.split(" ")[0]!;
      const tolerance = await card.locator(`[id="${describedBy}"]`).textContent();
      const planned = /Plan ([\d.]+) (in|psi)/.exec(tolerance ?? "");
      if (!planned) throw new Error(`no planned value in "${tolerance}"`);
      await box.fill(planned[1]!);
    }
    if (count) await expect(card.getByText("Outside plan")).toHaveCount(0);
    return count;
  }

  async signCard(card: Locator, options: { note?: string; photo?: { name: string; mimeType: string; buffer: Buffer } } = {}): Promise<void> {
    await this.fillOnPlan(card);
    if (options.note) await card.getByLabel("Note").fill(options.note);
    if (options.photo) {
      await card.getByLabel(/Add a photo/).setInputFiles(options.photo);
      const thumbnail = card.getByRole("img", { name: "Uploaded photo" });
      await expect(thumbnail).toBeVisible();
      await expect.poll(() => thumbnail.evaluate((img: HTMLImageElement) => img.complete && img.naturalWidth > 0)).toBe(true);
    }
    const id = await card.getAttribute("data-operation-id");
    await card.getByRole("button", { name: "Done", exact: true }).click();
    await expect(this.page.locator(`[data-operation-id="${id}"]`).getByTestId("signed-by")).toBeVisible();
  }

  /** Signs every open card of the page in order, the first one with a photo. */
  async signEverything(photo: { name: string; mimeType: string; buffer: Buffer } | null): Promise<void> {
    let first = true;
    while ((await this.openCards().count()) > 0) {
      await this.signCard(this.openCards().first(), { photo: first && photo ? photo : undefined, note: first ? "Checked at the bench." : undefined });
      first = false;
    }
  }
}
