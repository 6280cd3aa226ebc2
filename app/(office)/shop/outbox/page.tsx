import type { Metadata } from "next";
import Link from "next/link";
import { PageHeader, Sheet } from "@/components/ui/sheet";
import { Table, Td, Th } from "@/components/ui/table";
import { requireRole } from "@/lib/auth/session";
import { shopTimeZone } from "@/lib/server/env";
import { listOutbox, outboxDir } from "@/lib/server/outbox";
import { formatBytes, formatSent, outboxHref } from "./format";

export const metadata: Metadata = { title: "Outbox" };

/** What the app has sent, as the local mail fake kept it: newest first. */
export default async function OutboxPage() {
  await requireRole(["admin"], "/shop/outbox");
  const { folderExists, messages } = await listOutbox();
  const timeZone = shopTimeZone();
  return (
    <>
      <PageHeader
        kicker="Shop"
        title="Outbox"
        actions={
          <Link href="/shop/outbox/queue" className="text-accent underline-offset-2 hover:underline">
            Mail queue
          </Link>
        }
      />
      <p className="mb-4 max-w-3xl text-sm text-graphite">
        Every message Blockwright sent through the local mail fake, read from <code className="numeric">{outboxDir()}</code>. Nothing here
        left the machine.
      </p>
      <Sheet title={folderExists ? `${messages.length} ${messages.length === 1 ? "message" : "messages"}` : "No outbox folder"}>
        {!folderExists ? (
          <p className="text-graphite" data-testid="outbox-empty">
            The mail fake has not created its folder yet: nothing has been sent. Start it with <code className="numeric">npm run fakes</code> (or{" "}
            <code className="numeric">npm start</code>), and messages appear here as they are sent.
          </p>
        ) : messages.length === 0 ? (
          <p className="text-graphite" data-testid="outbox-empty">
            No messages yet. Sign-offs with readings outside plan and finished jobs send the tuner a message.
          </p>
        ) : (
          <Table aria-label="Messages">
            <thead>
              <tr>
                <Th>Sent</Th>
                <Th>To</Th>
                <Th>Subject</Th>
                <Th>Attachments</Th>
              </tr>
            </thead>
            <tbody>
              {messages.map((m) => (
                <tr key={m.name} data-testid="outbox-row">
                  <Td className="numeric whitespace-nowrap text-graphite">{formatSent(m.date, timeZone)}</Td>
                  <Td className="text-graphite">{m.to || "—"}</Td>
                  <Td>
                    <Link href={outboxHref(m.name)} className="font-medium text-accent underline-offset-2 hover:underline">
                      {m.subject}
                    </Link>
                  </Td>
                  <Td>
                    {m.attachments.length === 0 ? (
                      <span className="text-pencil">none</span>
                    ) : (
                      <ul className="flex flex-col gap-0.5">
                        {m.attachments.map((a) => (
                          <li key={a.index}>
                            {a.filename} <span className="numeric text-pencil">{formatBytes(a.size)}</span>
                          </li>
                        ))}
                      </ul>
                    )}
                  </Td>
                </tr>
              ))}
            </tbody>
          </Table>
        )}
      </Sheet>
    </>
  );
}
