"use client";

import { useSyncExternalStore } from "react";
import { formatDate, formatTime, sameDay } from "@/lib/format/dates";

const noSubscription = () => () => undefined;

/**
 * A time as HH:MM in the shop's zone (passed down from the server page), with its day when that is not today.
 * Server and phone print the same zone; whether the day is today is left to the phone, after hydration, so a
 * render either side of midnight cannot disagree with the server's.
 */
export function ShopTime({ iso, timeZone, withDay = false }: { iso: string; timeZone: string; withDay?: boolean }) {
  const onPhone = useSyncExternalStore(
    noSubscription,
    () => true,
    () => false,
  );
  const today = onPhone && sameDay(new Date(), iso, timeZone);
  return (
    <time dateTime={iso} className="numeric">
      {formatTime(iso, timeZone)}
      {withDay && !today ? ` on ${formatDate(iso, timeZone)}` : ""}
    </time>
  );
}
