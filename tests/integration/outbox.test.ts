// The outbox: the mail fake's .eml files, listed, opened and their attachments downloaded by an admin only.
import { mkdtempSync, rmSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import path from "node:path";
import { afterAll, beforeEach, describe, expect, it } from "vitest";
import { GET as attachmentRoute } from "@/app/api/outbox/[name]/attachments/[index]/route";
import { getOutboxAttachment, getOutboxMessage, listOutbox, outboxDir } from "@/lib/server/outbox";
import { actAs, resetDatabase } from "./support/database";
import { emptyFolder, writeEml } from "./support/outbox";

const scratch = mkdtempSync(path.join(tmpdir(), "blockwright-outbox-test-"));
afterAll(() => {
  rmSync(scratch, { recursive: true, force: true });
  rmSync(outboxDir(), { recursive: true, force: true });
});

const pdfBytes = Buffer.concat([Buffer.from("%PDF-1.7\n"), Buffer.alloc(1991, 0x20)]); // 2000 bytes

function threeMessages(dir: string) {
  // Written out of order, with file times that disagree with the Date headers: the header decides.
  writeEml(dir, { name: "b-second.eml", date: "Tue, 02 Jun 2026 09:15:00 +0000", to: "Mara Quillon <tuner@blockwright.test>", subject: "BW-0002: measurement outside plan", text: "Hole 1 fell outside plan." }, new Date("2026-06-01T00:00:00Z"));
  writeEml(
    dir,
    {
      name: "a-newest.eml",
      date: "Tue, 02 Jun 2026 16:40:00 +0000",
      to: "tuner@blockwright.test",
      subject: "BW-0002 is done",
      text: "Every operation of BW-0002 is signed.\nMeasured against plan:",
      attachment: { filename: "BW-0002 record.pdf", contentType: "application/pdf", content: pdfBytes },
    },
    new Date("2026-05-01T00:00:00Z"),
  );
  writeEml(dir, { name: "c-oldest.eml", date: "Mon, 01 Jun 2026 08:00:00 +0000", to: "tuner@blockwright.test", subject: "BW-0001 is done", text: "Done." }, new Date("2026-07-01T00:00:00Z"));
}

describe("reading the outbox folder", () => {
  it("says there is no folder rather than failing", async () => {
    expect(await listOutbox(path.join(scratch, "never-made"))).toEqual({ folderExists: false, messages: [] });
  });

  it("lists messages newest first with date, recipient, subject and attachment names and sizes", async () => {
    const dir = path.join(scratch, "list");
    emptyFolder(dir);
    threeMessages(dir);
    writeFileSync(path.join(dir, "notes.txt"), "not a message");
    const { folderExists, messages } = await listOutbox(dir);
    expect(folderExists).toBe(true);
    expect(messages.map((m) => m.subject)).toEqual(["BW-0002 is done", "BW-0002: measurement outside plan", "BW-0001 is done"]);
    expect(messages[0]).toMatchObject({
      name: "a-newest.eml",
      date: "2026-06-02T16:40:00.000Z",
      to: "tuner@blockwright.test",
      attachments: [{ index: 0, filename: "BW-0002 record.pdf", contentType: "application/pdf", size: 2000 }],
    });
    expect(messages[1]!.to).toContain("tuner@blockwright.test");
    expect(messages[1]!.attachments).toEqual([]);
  });

  it("opens a listed message with its text, and nothing the folder does not list", async () => {
    const dir = path.join(scratch, "open", "outbox");
    emptyFolder(dir);
    threeMessages(dir);
    // A message beside the folder, which a crafted name would try to reach.
    writeEml(path.dirname(dir), { name: "outside.eml", date: "Mon, 01 Jun 2026 08:00:00 +0000", to: "x@blockwright.test", subject: "secret", text: "secret" });
    const message = await getOutboxMessage("a-newest.eml", dir);
    expect(message?.text).toContain("Every operation of BW-0002 is signed.");
    expect(await getOutboxMessage("../outside.eml", dir)).toBeUndefined();
    expect(await getOutboxMessage("missing.eml", dir)).toBeUndefined();
    expect(await getOutboxAttachment("../outside.eml", 0, dir)).toBeUndefined();
    const attachment = await getOutboxAttachment("a-newest.eml", 0, dir);
    expect(attachment?.content.equals(pdfBytes)).toBe(true);
    expect(await getOutboxAttachment("a-newest.eml", 1, dir)).toBeUndefined();
  });
});

describe("GET /api/outbox/{name}/attachments/{index}", () => {
  beforeEach(async () => {
    await resetDatabase();
    emptyFolder(outboxDir());
    threeMessages(outboxDir());
  });

  const download = (name: string, index: string) =>
    attachmentRoute(new Request(`http://127.0.0.1/api/outbox/${encodeURIComponent(name)}/attachments/${index}`), {
      params: Promise.resolve({ name, index }),
    });

  it("gives an admin the attachment's bytes as a download", async () => {
    await actAs("admin");
    const response = await download("a-newest.eml", "0");
    expect(response.status).toBe(200);
    expect(response.headers.get("content-type")).toBe("application/pdf");
    expect(response.headers.get("content-disposition")).toContain("attachment;");
    expect(response.headers.get("content-disposition")).toContain("filename*=UTF-8''BW-0002%20record.pdf");
    expect(Buffer.from(await response.arrayBuffer()).equals(pdfBytes)).toBe(true);
  });

  it("refuses other roles and anonymous callers", async () => {
    await actAs("tuner");
    expect((await download("a-newest.eml", "0")).status).toBe(403);
    await actAs("machinist");
    expect((await download("a-newest.eml", "0")).status).toBe(403);
    await actAs("anonymous");
    expect((await download("a-newest.eml", "0")).status).toBe(401);
  });

  it("names a bad file name or index (400) and answers 404 for what is not there", async () => {
    await actAs("admin");
    const traversal = await download("../outside.eml", "0");
    expect(traversal.status).toBe(400);
    expect((await traversal.json()).error.field).toBe("name");
    const badIndex = await download("a-newest.eml", "first");
    expect((await badIndex.json()).error.field).toBe("index");
    expect((await download("missing.eml", "0")).status).toBe(404);
    expect((await download("a-newest.eml", "3")).status).toBe(404);
  });
});
