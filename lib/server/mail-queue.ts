import "server-only";
import PgBoss from "pg-boss";
import { getEnv } from "./env";
import { log } from "./log";
import { seal, unseal, type Sealed } from "./mail-seal";
import { deliverMail, type MailAttachment, type Message } from "./mail-transport";
import type { Viewer } from "@/db/visibility";

// Outgoing mail waits in a pg-boss queue kept in PostgreSQL (schema pgboss, made by pg-boss itself on first
// start): a request only inserts a row, and the worker started with the server (instrumentation.ts) sends it,
// trying again with a doubling wait while the SMTP server is down. A restart loses nothing.

export const MAIL_QUEUE = "mail";
/** Travelers of a released revision, rendered and stored off the request path; the release mail follows. */
export const TRAVELER_RENDER_QUEUE = "traveler-render";
const SCHEMA = "pgboss";

interface QueuedMail {
  to: string[];
  subject: string;
  /** Text and attachments (base64), sealed: see mail-seal.ts. */
  body: Sealed;
}

interface SealedBody {
  text: string;
  attachments: { filename: string; contentType: string; content: string }[];
}

// One instance per process, kept on globalThis: Next loads instrumentation and the routes as separate bundles,
// and each would otherwise open its own pool.
const held = globalThis as typeof globalThis & {
  blockwrightMailQueue?: { boss?: Promise<PgBoss>; worker?: Promise<string>; renderWorker?: Promise<string> };
};
const state = (held.blockwrightMailQueue ??= {});

function queue(): Promise<PgBoss> {
  state.boss ??= (async () => {
    const boss = new PgBoss({ connectionString: getEnv().DATABASE_URL, schema: SCHEMA, max: 3, application_name: "blockwright-mail" });
    // pg-boss reports its own background failures (maintenance, polling) here; unheard they would end the process.
    boss.on("error", (error) => log.error({ err: error }, "mail queue"));
    await boss.start();
    await boss.createQueue(MAIL_QUEUE);
    await boss.createQueue(TRAVELER_RENDER_QUEUE);
    return boss;
  })().catch((error: unknown) => {
    state.boss = undefined;
    throw error;
  });
  return state.boss;
}

/** Puts a message in the queue and returns its id; the worker sends it. */
export async function enqueueMail(message: Message): Promise<string> {
  const env = getEnv();
  const body: SealedBody = {
    text: message.text,
    attachments: (message.attachments ?? []).map((a) => ({ filename: a.filename, contentType: a.contentType, content: a.content.toString("base64") })),
  };
  const data: QueuedMail = { to: message.to, subject: message.subject, body: seal(body) };
  const id = await (await queue()).send(MAIL_QUEUE, data, {
    retryLimit: env.MAIL_RETRY_LIMIT,
    retryDelay: env.MAIL_RETRY_DELAY_SECONDS,
    retryBackoff: true,
  });
  if (!id) throw new Error("the mail queue did not accept the message");
  return id;
}

async function deliverQueued(data: QueuedMail): Promise<void> {
  const body = unseal<SealedBody>(data.body);
  const attachments: MailAttachment[] = body.attachments.map((a) => ({ filename: a.filename, contentType: a.contentType, content: Buffer.from(a.content, "base64") }));
  await deliverMail({ to: data.to, subject: data.subject, text: body.text, attachments });
}

/** Starts sending queued mail in this process; a second call does nothing. */
export function startMailWorker(): Promise<string> {
  state.worker ??= (async () => {
    const boss = await queue();
    return boss.work<QueuedMail>(MAIL_QUEUE, { pollingIntervalSeconds: getEnv().MAIL_POLL_SECONDS }, async (jobs) => {
      for (const job of jobs) {
        try {
          await deliverQueued(job.data);
        } catch (error) {
          log.warn({ err: error, job: job.id, subject: job.data.subject }, "mail not sent yet");
          // Thrown on, pg-boss records the error and schedules the next try.
          throw error;
        }
      }
    });
  })().catch((error: unknown) => {
    state.worker = undefined;
    throw error;
  });
  return state.worker;
}

/** What the render queue carries: who released which revision of which job. */
export interface TravelerRenderRequest {
  actor: Viewer;
  jobId: string;
  revision: number;
}

/** Queues the renders of a released revision's travelers; the worker started below does them. */
export async function enqueueTravelerRender(request: TravelerRenderRequest): Promise<string> {
  const env = getEnv();
  const id = await (await queue()).send(TRAVELER_RENDER_QUEUE, request, {
    retryLimit: env.MAIL_RETRY_LIMIT,
    retryDelay: env.MAIL_RETRY_DELAY_SECONDS,
    retryBackoff: true,
  });
  if (!id) throw new Error("the traveler queue did not accept the renders");
  return id;
}

/**
 * Starts sending queued mail and rendering queued travelers in this process (the server's start, and tests);
 * `render` is the workflow's (lib/jobs), which this plumbing does not import. A second call does nothing.
 */
export async function startQueueWorkers(render: (request: TravelerRenderRequest) => Promise<void>): Promise<string[]> {
  state.renderWorker ??= (async () => {
    const boss = await queue();
    return boss.work<TravelerRenderRequest>(TRAVELER_RENDER_QUEUE, { pollingIntervalSeconds: getEnv().MAIL_POLL_SECONDS }, async (jobs) => {
      for (const job of jobs) {
        try {
          await render(job.data);
        } catch (error) {
          log.warn({ err: error, job: job.id, jobId: job.data.jobId }, "travelers not rendered yet");
          throw error;
        }
      }
    });
  })().catch((error: unknown) => {
    state.renderWorker = undefined;
    throw error;
  });
  return Promise.all([startMailWorker(), state.renderWorker]);
}

/** Renders still queued or under way (tests wait for them). */
export async function pendingTravelerRenders(): Promise<number> {
  const boss = await queue();
  const { rows } = await boss.getDb().executeSql(
    `SELECT count(*)::int AS pending FROM ${SCHEMA}.job WHERE name = $1 AND state IN ('created', 'retry', 'active')`,
    [TRAVELER_RENDER_QUEUE],
  );
  return (rows as { pending: number }[])[0]?.pending ?? 0;
}

/** Stops the worker and closes the queue's connections (tests, shutdown). */
export async function stopMailQueue(): Promise<void> {
  const boss = state.boss;
  state.boss = undefined;
  state.worker = undefined;
  state.renderWorker = undefined;
  if (boss) await (await boss).stop({ graceful: true, wait: true, timeout: 5000 });
}

export type MailQueueState = "queued" | "sending" | "retrying" | "sent" | "failed" | "cancelled";

export interface MailQueueEntry {
  id: string;
  to: string;
  subject: string;
  state: MailQueueState;
  /** Tries made so far, the one under way included. */
  tries: number;
  /** How many tries there will be at most. */
  maxTries: number;
  lastError: string | null;
  queuedAt: string;
  /** When it was sent or given up on; for a message still waiting, when it is tried next. */
  at: string | null;
}

const STATES: Record<string, MailQueueState> = {
  created: "queued",
  active: "sending",
  retry: "retrying",
  completed: "sent",
  failed: "failed",
  cancelled: "cancelled",
};

interface JobRow {
  id: string;
  state: string;
  retry_count: number;
  retry_limit: number;
  started_on: Date | null;
  start_after: Date;
  created_on: Date;
  completed_on: Date | null;
  recipients: string[] | null;
  subject: string | null;
  error: string | null;
}

/** The queue's messages, newest first, those already archived by pg-boss included. */
export async function listMailQueue(limit = 200): Promise<MailQueueEntry[]> {
  const boss = await queue();
  const columns = `id, state::text AS state, retry_count, retry_limit, started_on, start_after, created_on, completed_on,
    ARRAY(SELECT jsonb_array_elements_text(data->'to')) AS recipients, data->>'subject' AS subject, output->>'message' AS error`;
  const { rows } = await boss.getDb().executeSql(
    `SELECT ${columns} FROM ${SCHEMA}.job WHERE name = $1
     UNION ALL SELECT ${columns} FROM ${SCHEMA}.archive WHERE name = $1
     ORDER BY created_on DESC, id LIMIT $2`,
    [MAIL_QUEUE, limit],
  );
  return (rows as JobRow[]).map((row) => {
    const mapped = STATES[row.state] ?? "queued";
    const started = row.started_on !== null;
    return {
      id: row.id,
      to: (row.recipients ?? []).join(", "),
      subject: row.subject ?? "",
      state: mapped,
      tries: started ? row.retry_count + 1 : 0,
      maxTries: row.retry_limit + 1,
      lastError: mapped === "sent" ? null : row.error,
      queuedAt: row.created_on.toISOString(),
      at: row.completed_on ? row.completed_on.toISOString() : mapped === "queued" || mapped === "retrying" ? row.start_after.toISOString() : null,
    };
  });
}
