import { sql } from "drizzle-orm";
import { boolean, index, integer, jsonb, pgEnum, pgTable, text, timestamp, uuid } from "drizzle-orm/pg-core";

export const userRole = pgEnum("user_role", ["admin", "tuner", "machinist"]);
export type UserRole = (typeof userRole.enumValues)[number];
export const USER_ROLES = userRole.enumValues;

export const users = pgTable("users", {
  id: uuid("id").primaryKey().defaultRandom(),
  email: text("email").notNull().unique(),
  name: text("name").notNull(),
  role: userRole("role").notNull(),
  passwordHash: text("password_hash").notNull(),
  active: boolean("active").notNull().default(true),
  /** Display preference for lengths and areas; values are stored in SI whatever this says. */
  lengthUnit: text("length_unit", { enum: ["in", "mm"] }).notNull().default("in"),
  createdAt: timestamp("created_at", { withTimezone: true }).notNull().defaultNow(),
  updatedAt: timestamp("updated_at", { withTimezone: true }).notNull().defaultNow(),
});
export type User = typeof users.$inferSelect;

/** Every sign-in try, kept to throttle guessing per account and per address. */
export const signInAttempts = pgTable(
  "sign_in_attempts",
  {
    id: integer("id").primaryKey().generatedAlwaysAsIdentity(),
    email: text("email").notNull(),
    address: text("address").notNull(),
    succeeded: boolean("succeeded").notNull(),
    at: timestamp("at", { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [index("sign_in_attempts_email_at").on(t.email, t.at), index("sign_in_attempts_address_at").on(t.address, t.at)],
);

/** Who changed what and when: kept for warranty questions and the next visit of the same car. */
export const auditEvents = pgTable(
  "audit_events",
  {
    id: integer("id").primaryKey().generatedAlwaysAsIdentity(),
    actorId: uuid("actor_id").references(() => users.id),
    action: text("action").notNull(),
    subjectType: text("subject_type").notNull(),
    subjectId: text("subject_id").notNull(),
    details: jsonb("details").notNull().default(sql`'{}'::jsonb`),
    at: timestamp("at", { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [index("audit_events_subject").on(t.subjectType, t.subjectId)],
);
