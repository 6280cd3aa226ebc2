"use client";

import { useSyncExternalStore } from "react";

const noSubscription = () => () => undefined;

function hoursMinutes(iso: string, timeZone?: string): string {
  return new Intl.DateTimeFormat("en-GB", { hour: "2-digit", minute: "2-digit", hour12: false, timeZone }).format(new Date(iso));
}

function dayOf(iso: string, timeZone?: string): string {
  return new Intl.DateTimeFormat("en-GB", { day: "numeric", month: "short", timeZone }).format(new Date(iso));
}

/**
 * A time as HH:MM on the phone's clock. The server renders it in UTC (it cannot know the phone's zone);
 * the phone re-renders it in its own zone once it runs, without a hydration mismatch.
 */
export function LocalTime({ iso, withDay = false }: { iso: string; withDay?: boolean }) {
  const onPhone = useSyncExternalStore(
    noSubscription,
    () => true,
    () => false,
  );
  const zone = onPhone ? undefined : "UTC";
  const today = dayOf(new Date().toISOString(), zone) === dayOf(iso, zone);
  return (
    <time dateTime={iso} className="numeric">
      {hoursMinutes(iso, zone)}
      {withDay && !today ? ` on ${dayOf(iso, zone)}` : ""}
      {onPhone ? "" : " UTC"}
    </time>
  );
}
