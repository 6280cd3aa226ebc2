import Link from "next/link";
import type { ReactNode } from "react";
import { Sheet } from "@/components/ui/sheet";

/** One list of a work queue: a titled sheet with its count, the rows, or what an empty list means. */
export function QueueSection({ title, count, empty, children }: { title: string; count: number; empty: string; children: ReactNode }) {
  return (
    <Sheet
      title={
        <span className="flex items-baseline gap-2">
          {title}
          <span className="numeric text-sm font-normal text-pencil">({count})</span>
        </span>
      }
    >
      {count === 0 ? <p className="text-sm text-graphite">{empty}</p> : <ul className="flex flex-col divide-y divide-rule">{children}</ul>}
    </Sheet>
  );
}

/** A row of a queue that opens the place where the work is done. */
export function QueueRow({ href, title, detail, aside }: { href: string; title: ReactNode; detail?: ReactNode; aside?: ReactNode }) {
  return (
    <li>
      <Link href={href} className="flex min-h-11 flex-wrap items-center justify-between gap-x-4 gap-y-1 py-2 hover:bg-accent-soft">
        <span className="flex flex-col">
          <span className="font-semibold text-accent-strong">{title}</span>
          {detail ? <span className="text-sm text-graphite">{detail}</span> : null}
        </span>
        {aside ? <span className="text-sm text-pencil">{aside}</span> : null}
      </Link>
    </li>
  );
}
