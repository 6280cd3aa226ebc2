// Integration tests run the real data layer against PostgreSQL: each worker on its own database, copied
// from a migrated template by global-setup.ts. Only the edges Next.js owns are replaced: the session
// lookup and the cache.
import { tmpdir } from "node:os";
import { afterAll, inject, vi } from "vitest";
import { claimWorkerDatabase } from "./support/claim-database";

process.env.NEXTAUTH_SECRET ??= "integration-test-secret-0123456789";
// The outbox page reads the mail fake's folder: tests get their own, never the developer's .data/outbox.
process.env.MAIL_OUTBOX_DIR ??= `${tmpdir()}/blockwright-it-outbox-${process.pid}`;
// The mail queue's worker looks for messages every half second and tries a failed one again after a second or
// two (the least pg-boss allows), so tests wait on mail for seconds, not minutes.
process.env.MAIL_POLL_SECONDS ??= "0.5";
process.env.MAIL_RETRY_DELAY_SECONDS ??= "1";
// Before anything reads the configuration: this worker's database, not the base one named in DATABASE_URL.
const baseDatabaseUrl = process.env.DATABASE_URL;
if (!baseDatabaseUrl) {
  throw new Error("DATABASE_URL must point at a test database: run the integration tests through `npm test`.");
}
process.env.DATABASE_URL = await claimWorkerDatabase(baseDatabaseUrl, inject("workerDatabaseUrls"), Number(process.env.VITEST_POOL_ID ?? "1") - 1);

vi.mock("next-auth", async (importOriginal) => {
  const original = await importOriginal<typeof import("next-auth")>();
  const { currentSession } = await import("./support/session-double");
  return { ...original, getServerSession: vi.fn(async () => currentSession()) };
});

vi.mock("next/cache", () => ({
  revalidatePath: vi.fn(),
  revalidateTag: vi.fn(),
}));

// A file that queued mail has opened the queue's connections (and perhaps its worker): close them with the file.
afterAll(async () => {
  const { stopMailQueue } = await import("@/lib/server/mail-queue");
  await stopMailQueue();
});
