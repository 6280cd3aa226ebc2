// Dates and times as the shop reads them, in the shop's own time zone (SHOP_TIME_ZONE, read on the server by
// lib/server/env.ts and handed down; this module reads no configuration, so server and client components
// format alike). Pure: Intl does the zone arithmetic from the IANA tz database Node ships with.
//
// Forms: a date "2026-03-08" (ISO 8601 order, unambiguous in every country); a time "03:30 CDT" (24-hour, with
// the zone's abbreviation, which tells the two 01:30s of the night clocks fall back apart); a date-time
// "2026-03-08 03:30 CDT".

export type Instant = string | Date;

const formatters = new Map<string, Intl.DateTimeFormat>();

function formatter(timeZone: string): Intl.DateTimeFormat {
  let found = formatters.get(timeZone);
  if (!found) {
    found = new Intl.DateTimeFormat("en-US", {
      timeZone,
      year: "numeric",
      month: "2-digit",
      day: "2-digit",
      hour: "2-digit",
      minute: "2-digit",
      hourCycle: "h23",
      timeZoneName: "short",
    });
    formatters.set(timeZone, found);
  }
  return found;
}

function partsOf(at: Instant, timeZone: string): { date: string; time: string; zone: string } {
  const instant = typeof at === "string" ? new Date(at) : at;
  if (Number.isNaN(instant.getTime())) throw new RangeError(`not a date: ${String(at)}`);
  const part: Partial<Record<Intl.DateTimeFormatPartTypes, string>> = {};
  for (const p of formatter(timeZone).formatToParts(instant)) part[p.type] = p.value;
  return { date: `${part.year}-${part.month}-${part.day}`, time: `${part.hour}:${part.minute}`, zone: part.timeZoneName ?? timeZone };
}

/** The zone's canonical IANA name ("america/chicago" -> "America/Chicago"), or undefined when Intl knows no such zone. */
export function canonicalTimeZone(zone: string): string | undefined {
  try {
    return new Intl.DateTimeFormat("en-US", { timeZone: zone }).resolvedOptions().timeZone;
  } catch {
    return undefined;
  }
}

/** "2026-03-08": the calendar day in the shop's zone. */
export function formatDate(at: Instant, timeZone: string): string {
  return partsOf(at, timeZone).date;
}

/** "03:30 CDT". */
export function formatTime(at: Instant, timeZone: string): string {
  const { time, zone } = partsOf(at, timeZone);
  return `${time} ${zone}`;
}

/** "2026-03-08 03:30 CDT". */
export function formatDateTime(at: Instant, timeZone: string): string {
  const { date, time, zone } = partsOf(at, timeZone);
  return `${date} ${time} ${zone}`;
}

/** Whether two instants fall on the same calendar day in the shop's zone. */
export function sameDay(a: Instant, b: Instant, timeZone: string): boolean {
  return formatDate(a, timeZone) === formatDate(b, timeZone);
}
