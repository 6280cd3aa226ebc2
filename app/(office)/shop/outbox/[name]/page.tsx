import type { Metadata } from "next";
import Link from "next/link";
import { notFound } from "next/navigation";
import { PageHeader, Sheet } from "@/components/ui/sheet";
import { requireRole } from "@/lib/auth/session";
import { shopTimeZone } from "@/lib/server/env";
import { getOutboxMessage, OUTBOX_NAME } from "@/lib/server/outbox";
import { attachmentHref, formatBytes, formatSent, outboxHref } from "../format";

export const metadata: Metadata = { title: "Outbox message" };

/** One message of the outbox: its headers, its text and its attachments to download. */
export default async function OutboxMessagePage({ params }: { params: Promise<{ name: string }> }) {
  const { name } = await params;
  await requireRole(["admin"], outboxHref(name));
  // Only a plain file name the folder itself lists is opened.
  if (!OUTBOX_NAME.test(name)) notFound();
  const message = await getOutboxMessage(name);
  if (!message) notFound();
  return (
    <>
      <PageHeader kicker="Outbox" title={message.subject} actions={<Link href="/shop/outbox" className="font-semibold text-accent underline">All messages</Link>} />
      <div className="flex max-w-4xl flex-col gap-6">
        <Sheet>
          <dl className="grid grid-cols-[8rem_1fr] gap-y-1 text-sm">
            <dt className="text-graphite">Sent</dt>
            <dd className="numeric">{formatSent(message.date, shopTimeZone())}</dd>
            <dt className="text-graphite">From</dt>
            <dd>{message.from || "—"}</dd>
            <dt className="text-graphite">To</dt>
            <dd>{message.to || "—"}</dd>
            <dt className="text-graphite">File</dt>
            <dd className="numeric text-pencil">{message.name}</dd>
          </dl>
        </Sheet>
        <Sheet title="Text">
          <pre className="numeric overflow-x-auto text-sm leading-relaxed whitespace-pre-wrap" data-testid="outbox-text">
            {message.text || "(no text part)"}
          </pre>
        </Sheet>
        <Sheet title={`Attachments (${message.attachments.length})`}>
          {message.attachments.length === 0 ? (
            <p className="text-graphite">None.</p>
          ) : (
            <ul className="flex flex-col gap-2">
              {message.attachments.map((a) => (
                <li key={a.index} className="flex flex-wrap items-baseline gap-x-3">
                  <a href={attachmentHref(message.name, a.index)} download={a.filename} className="font-semibold text-accent underline">
                    {a.filename}
                  </a>
                  <span className="text-sm text-graphite">
                    {a.contentType}, <span className="numeric">{formatBytes(a.size)}</span>
                  </span>
                </li>
              ))}
            </ul>
          )}
        </Sheet>
      </div>
    </>
  );
}
