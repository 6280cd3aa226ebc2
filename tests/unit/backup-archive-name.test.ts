// The backup archive's name: the moment in UTC to the minute, with seconds only when that name is taken.
import { mkdtempSync, rmSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import path from "node:path";
import { afterAll, describe, expect, it } from "vitest";
import { archiveName } from "@/scripts/backup/create";

const dir = mkdtempSync(path.join(tmpdir(), "blockwright-archive-name-"));
afterAll(() => rmSync(dir, { recursive: true, force: true }));

describe("archiveName", () => {
  it("names the UTC minute, whatever the time zone the date was written in", () => {
    // 2026-12-03 01:07:09 at UTC+2 is 2026-12-02 23:07:09 UTC (ISO 8601 offsets, worked by hand).
    expect(archiveName(new Date("2026-12-03T01:07:09+02:00"), dir)).toBe("blockwright-2026-12-02T2307Z.tar.gz");
  });

  it("adds the seconds when a backup of the same minute exists, so none is overwritten", () => {
    writeFileSync(path.join(dir, "blockwright-2026-12-02T2307Z.tar.gz"), "");
    expect(archiveName(new Date("2026-12-02T23:07:41Z"), dir)).toBe("blockwright-2026-12-02T230741Z.tar.gz");
  });
});
