// Integration tests run the real data layer against PostgreSQL (DATABASE_URL, a test database prepared
// by scripts/test.sh). Only the edges Next.js owns are replaced: the session lookup and the cache.
import { tmpdir } from "node:os";
import { vi } from "vitest";

process.env.NEXTAUTH_SECRET ??= "integration-test-secret-0123456789";
// The outbox page reads the mail fake's folder: tests get their own, never the developer's .data/outbox.
process.env.MAIL_OUTBOX_DIR ??= `${tmpdir()}/blockwright-it-outbox-${process.pid}`;
if (!process.env.DATABASE_URL) {
  throw new Error("DATABASE_URL must point at a test database: run the integration tests through `npm test`.");
}

vi.mock("next-auth", async (importOriginal) => {
  const original = await importOriginal<typeof import("next-auth")>();
  const { currentSession } = await import("./support/session-double");
  return { ...original, getServerSession: vi.fn(async () => currentSession()) };
});

vi.mock("next/cache", () => ({
  revalidatePath: vi.fn(),
  revalidateTag: vi.fn(),
}));
