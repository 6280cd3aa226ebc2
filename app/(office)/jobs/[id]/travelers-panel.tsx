import "server-only";
import Link from "next/link";
import { Sheet } from "@/components/ui/sheet";
import { TravelerDownloadButton } from "@/components/traveler-download-button";
import { benchPath } from "@/lib/bench/url";

/** One printed traveler per metering block of the current revision, and the bench page each one's QR code opens. */
export function TravelersPanel({ revision, blocks }: { revision: number; blocks: { id: string; side: "primary" | "secondary" }[] }) {
  return (
    <Sheet title={`Travelers, revision ${revision}`}>
      <ul className="flex flex-col gap-4">
        {blocks.map((block) => (
          <li key={block.id} className="flex flex-wrap items-center gap-3 border-b border-rule pb-3 last:border-b-0 last:pb-0">
            <span className="min-w-24 font-semibold capitalize">{block.side} block</span>
            <TravelerDownloadButton blockId={block.id} revision={revision} label="Letter PDF" />
            <TravelerDownloadButton blockId={block.id} revision={revision} paper="a4" label="A4 PDF" />
            <Link href={benchPath(block.id, revision)} className="text-sm font-semibold text-accent underline">
              Bench page
            </Link>
          </li>
        ))}
      </ul>
    </Sheet>
  );
}
