import "server-only";
import { z } from "zod";
import { canonicalTimeZone } from "@/lib/format/dates";

// The one place that reads process.env. Validated on first use, not at import, so that
// `next build` can load modules without a running database.
const envSchema = z.object({
  DATABASE_URL: z.url({ error: "DATABASE_URL must be a postgres:// URL" }),
  NEXTAUTH_SECRET: z.string().min(16, { error: "NEXTAUTH_SECRET must be at least 16 characters" }),
  APP_BASE_URL: z.url().default("http://127.0.0.1:3000"),
  // How many reverse proxies stand in front and append to X-Forwarded-For; 0 ignores the header (anyone can write it).
  TRUSTED_PROXY: z.coerce.number().int().min(0, { error: "TRUSTED_PROXY must be 0 or more" }).max(5).default(0),
  SMTP_HOST: z.string().default("127.0.0.1"),
  SMTP_PORT: z.coerce.number().int().positive().default(2525),
  SMTP_USER: z.string().optional(),
  SMTP_PASSWORD: z.string().optional(),
  MAIL_FROM: z.string().default("Blockwright <no-reply@blockwright.test>"),
  MAIL_OUTBOX_DIR: z.string().default(".data/outbox"),
  // The mail queue (pg-boss, schema pgboss): how often a failed message is tried again, the first wait between
  // tries (doubling, with jitter, after each), and how often the worker looks for new messages.
  MAIL_RETRY_LIMIT: z.coerce.number().int().min(0, { error: "MAIL_RETRY_LIMIT must be 0 or more" }).max(20).default(5),
  MAIL_RETRY_DELAY_SECONDS: z.coerce.number().int().min(1, { error: "MAIL_RETRY_DELAY_SECONDS must be at least 1" }).default(60),
  MAIL_POLL_SECONDS: z.coerce.number().min(0.5, { error: "MAIL_POLL_SECONDS must be at least 0.5" }).default(2),
  S3_ENDPOINT: z.url().default("http://127.0.0.1:4569"),
  S3_REGION: z.string().default("us-east-1"),
  S3_BUCKET: z.string().default("blockwright"),
  S3_ACCESS_KEY_ID: z.string().default("S3RVER"),
  S3_SECRET_ACCESS_KEY: z.string().default("S3RVER"),
  // The shop as its customers' conversion records name it, and how to reach it (empty: the job's tuner, by e-mail).
  SHOP_NAME: z.string().trim().min(1, { error: "SHOP_NAME must not be empty" }).max(120).default("Blockwright"),
  SHOP_CONTACT: z.string().trim().max(300).default(""),
  // The zone every page, mail and traveler prints dates in (an IANA name such as America/Chicago), stated once.
  SHOP_TIME_ZONE: z
    .string()
    .default("UTC")
    .transform((zone, ctx) => {
      const canonical = canonicalTimeZone(zone);
      if (canonical) return canonical;
      ctx.addIssue({ code: "custom", message: "SHOP_TIME_ZONE must be an IANA time zone such as America/Chicago or UTC" });
      return z.NEVER;
    }),
});

export type Env = z.infer<typeof envSchema>;

let cached: Env | undefined;

export function getEnv(): Env {
  if (!cached) {
    const parsed = envSchema.safeParse(process.env);
    if (!parsed.success) {
      const fields = parsed.error.issues.map((issue) => `${issue.path.join(".")}: ${issue.message}`);
      throw new Error(`Invalid configuration:\n  ${fields.join("\n  ")}`);
    }
    cached = parsed.data;
  }
  return cached;
}

/** The shop's time zone, for lib/format/dates.ts: server code reads it here and hands it to client components. */
export function shopTimeZone(): string {
  return getEnv().SHOP_TIME_ZONE;
}
