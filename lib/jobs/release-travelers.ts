import "server-only";
import { getJob } from "@/db/jobs";
import type { Viewer } from "@/db/visibility";
import { listActiveUsersByRole } from "@/db/users";
import { benchUrl } from "@/lib/bench/url";
import { getEnv, shopTimeZone } from "@/lib/server/env";
import { sendMail, type MailAttachment } from "@/lib/server/mail";
import { enqueueTravelerRender, type TravelerRenderRequest } from "@/lib/server/mail-queue";
import { log } from "@/lib/server/log";
import { ALL_CAUTIONS } from "@/lib/safety/cautions";
import { getTravelerData } from "@/lib/traveler/data";
import { storedTravelerPdf } from "@/lib/traveler/stored-traveler";
import { PAPER_SIZES, type TravelerData } from "@/lib/traveler/types";

// A release renders every block's traveler, a second or so each: too slow for the request that releases.
// The request queues the renders; the worker stores each traveler in both paper sizes (the download route
// then serves them without rendering) and sends the machinists the release mail with the letter files.

/** Queues the release's renders and mail; a queue that cannot take them is logged, the release stands. */
export async function queueReleaseTravelers(actor: Viewer, jobId: string, revision: number): Promise<boolean> {
  try {
    await enqueueTravelerRender({ actor: { id: actor.id, role: actor.role }, jobId, revision });
    return true;
  } catch (error) {
    log.error({ err: error, jobId }, "release: travelers not queued");
    return false;
  }
}

/** The render queue's work: store every block's traveler for every paper size, then mail the machinists. */
export async function renderReleaseTravelers({ actor, jobId, revision }: TravelerRenderRequest): Promise<void> {
  const record = await getJob(actor, jobId);
  if (!record) return;
  const { job, blocks } = record;
  const timeZone = shopTimeZone();
  const printed: { side: string; blockId: string; data: TravelerData; letter: Uint8Array }[] = [];
  for (const block of [...blocks].sort((a, b) => a.side.localeCompare(b.side))) {
    try {
      const data = await getTravelerData(actor, { blockId: block.id, revision });
      const { pdf } = await storedTravelerPdf(data, { paper: "letter", timeZone });
      printed.push({ side: block.side, blockId: block.id, data, letter: pdf });
    } catch (error) {
      log.error({ err: error, side: block.side }, "release: traveler not attached");
    }
  }
  await mailReleaseNotice({ jobId, jobNumber: job.number, carburetor: job.carburetor, revision, printed });
  // The other sizes after the mail, which need not wait for them; a failure here does not send it again.
  for (const { data, side } of printed) {
    for (const paper of PAPER_SIZES.filter((p) => p !== "letter")) {
      await storedTravelerPdf(data, { paper, timeZone }).catch((error: unknown) => log.error({ err: error, side, paper }, "release: traveler not stored"));
    }
  }
}

async function mailReleaseNotice(input: {
  jobId: string;
  jobNumber: string;
  carburetor: string;
  revision: number;
  printed: { side: string; blockId: string; letter: Uint8Array }[];
}): Promise<void> {
  const machinists = await listActiveUsersByRole("machinist");
  if (machinists.length === 0) return;
  const { jobId, jobNumber, carburetor, revision, printed } = input;
  const attachments: MailAttachment[] = printed.map((p) => ({
    filename: `${jobNumber}-${p.side}-rev${revision}.pdf`,
    content: Buffer.from(p.letter),
    contentType: "application/pdf",
  }));
  // Thrown on when the mail queue cannot take it: the render job is tried again, and finds its files stored.
  await sendMail({
    to: machinists.map((m) => m.email),
    subject: `${jobNumber} released: revision ${revision} travelers`,
    text: [
      `${jobNumber} (${carburetor}) is released to the bench, revision ${revision}.`,
      "",
      "The travelers are attached, one per metering block. Scan a traveler's QR code or open:",
      ...printed.map((p) => `  ${p.side} block: ${benchUrl(p.blockId, revision)}`),
      "",
      `Job page: ${getEnv().APP_BASE_URL}/jobs/${jobId}`,
      "",
      ...ALL_CAUTIONS.map((c) => `${c.signal} (${c.title}): ${c.text}`),
    ].join("\n"),
    attachments,
  });
}
