import type { Metadata } from "next";
import { PageHeader, Sheet, Tag } from "@/components/ui/sheet";
import { Table, Td, Th } from "@/components/ui/table";
import { requireRole } from "@/lib/auth/session";
import { getEnv } from "@/lib/server/env";
import { listMailQueue, type MailQueueEntry } from "@/lib/server/mail-queue";
import { formatSent } from "../format";

export const metadata: Metadata = { title: "Mail queue" };

const TONES = { queued: "muted", sending: "muted", retrying: "accent", sent: "plain", failed: "fault", cancelled: "muted" } as const;

function stateNote(m: MailQueueEntry, timeZone: string): string {
  switch (m.state) {
    case "queued":
      return "waiting for its first try";
    case "sending":
      return `try ${m.tries} of ${m.maxTries} under way`;
    case "retrying":
      return `${m.tries} of ${m.maxTries} tries failed; next at ${formatSent(m.at, timeZone)}`;
    case "sent":
      return `on try ${m.tries}, ${formatSent(m.at, timeZone)}`;
    case "failed":
      return `after ${m.tries} ${m.tries === 1 ? "try" : "tries"}, ${formatSent(m.at, timeZone)}`;
    case "cancelled":
      return "not sent";
  }
}

/** Every message the app has queued, with where it stands: the SMTP server may be down without anyone noticing. */
export default async function MailQueuePage() {
  await requireRole(["admin"], "/shop/outbox/queue");
  const messages = await listMailQueue();
  const env = getEnv();
  return (
    <>
      <PageHeader kicker="Shop" title="Mail queue" />
      <p className="mb-4 max-w-3xl text-sm text-graphite">
        Messages wait here, in the database, until the SMTP server at <code className="numeric">{`${env.SMTP_HOST}:${env.SMTP_PORT}`}</code> takes
        them. A failed try is repeated up to {env.MAIL_RETRY_LIMIT} more {env.MAIL_RETRY_LIMIT === 1 ? "time" : "times"}, the wait doubling
        each time from about {env.MAIL_RETRY_DELAY_SECONDS} s. Text and attachments are stored sealed and are not shown here.
      </p>
      <Sheet title={`${messages.length} ${messages.length === 1 ? "message" : "messages"}`}>
        {messages.length === 0 ? (
          <p className="text-graphite" data-testid="mail-queue-empty">
            Nothing queued yet. Releases, sign-offs with readings outside plan, finished jobs and password changes queue a message.
          </p>
        ) : (
          <Table aria-label="Queued messages">
            <thead>
              <tr>
                <Th>Queued</Th>
                <Th>To</Th>
                <Th>Subject</Th>
                <Th>State</Th>
                <Th>Last error</Th>
              </tr>
            </thead>
            <tbody>
              {messages.map((m) => (
                <tr key={m.id} data-testid="mail-queue-row">
                  <Td className="numeric whitespace-nowrap text-graphite">{formatSent(m.queuedAt, env.SHOP_TIME_ZONE)}</Td>
                  <Td className="text-graphite">{m.to || "—"}</Td>
                  <Td className="font-medium">{m.subject}</Td>
                  <Td>
                    <div className="flex flex-col items-start gap-0.5">
                      <Tag tone={TONES[m.state]}>{m.state}</Tag>
                      <span className="text-xs text-pencil">{stateNote(m, env.SHOP_TIME_ZONE)}</span>
                    </div>
                  </Td>
                  <Td className="text-graphite">{m.lastError ?? <span className="text-pencil">none</span>}</Td>
                </tr>
              ))}
            </tbody>
          </Table>
        )}
      </Sheet>
    </>
  );
}
