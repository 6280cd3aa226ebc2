import { describe, expect, it } from "vitest";
import { canonicalTimeZone, formatDate, formatDateTime, formatTime, sameDay } from "@/lib/format/dates";

// Expected values worked by hand from the zones' rules (IANA tz database, as Node's ICU ships it):
// - United States: standard time UTC-6 in America/Chicago (CST); daylight time UTC-5 (CDT) from the second
//   Sunday of March at 02:00 local to the first Sunday of November at 02:00 local (Energy Policy Act of 2005,
//   section 110, amending 15 U.S.C. 260a).
//   2026: 1 January is a Thursday, so 1 March (59 days on, 59 mod 7 = 3) is a Sunday and the second Sunday is
//   8 March; 1 November (245 days after 1 March, 245 mod 7 = 0) is a Sunday.
//   Spring forward: 02:00 CST on 8 March = 08:00 UTC. Fall back: 02:00 CDT on 1 November = 07:00 UTC.
// - European Union: summer time from 01:00 UTC on the last Sunday of March (Directive 2000/84/EC, articles 2-3);
//   Europe/Berlin is UTC+1, UTC+2 in summer. 2026: 29 March (8 March + 21 days) is the last Sunday of March.
// - India: Asia/Kolkata is UTC+05:30 all year, no daylight time.

describe("dates in the shop's time zone", () => {
  it("prints UTC as it is, with its name", () => {
    expect(formatDateTime("2026-03-14T09:05:00.000Z", "UTC")).toBe("2026-03-14 09:05 UTC");
    expect(formatDate("2025-06-02T08:00:00.000Z", "UTC")).toBe("2025-06-02");
  });

  it("writes midnight as 00, not 24", () => {
    expect(formatDateTime("2026-03-15T00:05:00.000Z", "UTC")).toBe("2026-03-15 00:05 UTC");
  });

  it("takes a Date as well as an ISO string", () => {
    expect(formatDateTime(new Date(Date.UTC(2026, 2, 14, 9, 5)), "UTC")).toBe("2026-03-14 09:05 UTC");
  });

  it("moves to daylight time in Chicago at 08:00 UTC on 8 March 2026", () => {
    // 07:30 UTC - 6 h = 01:30 CST, still standard time.
    expect(formatDateTime("2026-03-08T07:30:00Z", "America/Chicago")).toBe("2026-03-08 01:30 CST");
    // 08:30 UTC is past 08:00 UTC: 08:30 - 5 h = 03:30 CDT (the local hour 02:00-02:59 never happens).
    expect(formatDateTime("2026-03-08T08:30:00Z", "America/Chicago")).toBe("2026-03-08 03:30 CDT");
  });

  it("prints the night clocks fall back in Chicago twice at 01:30, told apart by the zone's name", () => {
    // 1 November 2026: 06:30 UTC - 5 h = 01:30 CDT; 07:30 UTC (past 07:00 UTC) - 6 h = 01:30 CST.
    expect(formatTime("2026-11-01T06:30:00Z", "America/Chicago")).toBe("01:30 CDT");
    expect(formatTime("2026-11-01T07:30:00Z", "America/Chicago")).toBe("01:30 CST");
  });

  it("gives the shop's calendar day, not UTC's", () => {
    // 05:59 UTC on 8 March - 6 h = 23:59 CST on 7 March.
    expect(formatDate("2026-03-08T05:59:00Z", "America/Chicago")).toBe("2026-03-07");
    // 20:00 UTC + 5 h 30 min = 01:30 on the next day in Kolkata.
    expect(formatDateTime("2026-03-14T20:00:00Z", "Asia/Kolkata")).toMatch(/^2026-03-15 01:30 /);
  });

  it("follows the European rule in Berlin: summer time from 01:00 UTC on 29 March 2026", () => {
    // 00:30 UTC + 1 h = 01:30 (winter time); 01:30 UTC + 2 h = 03:30 (summer time).
    expect(formatDateTime("2026-03-29T00:30:00Z", "Europe/Berlin")).toMatch(/^2026-03-29 01:30 /);
    expect(formatDateTime("2026-03-29T01:30:00Z", "Europe/Berlin")).toMatch(/^2026-03-29 03:30 /);
  });

  it("tells whether two instants share a day in the zone", () => {
    // 04:00 UTC and 06:30 UTC on 8 March are 22:00 CST on the 7th and 00:30 CST on the 8th in Chicago,
    // but the same day in UTC.
    expect(sameDay("2026-03-08T04:00:00Z", "2026-03-08T06:30:00Z", "America/Chicago")).toBe(false);
    expect(sameDay("2026-03-08T04:00:00Z", "2026-03-08T06:30:00Z", "UTC")).toBe(true);
  });

  it("refuses what is not a date", () => {
    expect(() => formatDate("last Tuesday", "UTC")).toThrow(RangeError);
  });
});

describe("time zone names", () => {
  it("knows the IANA zones and spells them canonically", () => {
    expect(canonicalTimeZone("America/Chicago")).toBe("America/Chicago");
    expect(canonicalTimeZone("america/chicago")).toBe("America/Chicago");
    expect(canonicalTimeZone("UTC")).toBe("UTC");
  });

  it("refuses names that are no zone", () => {
    expect(canonicalTimeZone("Mars/Olympus")).toBeUndefined();
    expect(canonicalTimeZone("")).toBeUndefined();
    expect(canonicalTimeZone("CST6CDT-ish")).toBeUndefined();
  });
});
