import { sql } from "drizzle-orm";
import { JOB_STATES, type JobState } from "./job-states";
import { boolean, doublePrecision, index, integer, jsonb, pgEnum, pgSequence, pgTable, text, timestamp, unique, uuid } from "drizzle-orm/pg-core";

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
  /**
   * Carried in every session token and compared on each request: raising it (sign out everywhere, a new
   * password, a reset, deactivation) ends every session issued before.
   */
  sessionVersion: integer("session_version").notNull().default(1),
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

/** A password reset an admin sent: only the token's SHA-256 is kept; it works once, until it expires. */
export const passwordResetTokens = pgTable(
  "password_reset_tokens",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    userId: uuid("user_id")
      .notNull()
      .references(() => users.id, { onDelete: "cascade" }),
    tokenHash: text("token_hash").notNull().unique(),
    createdBy: uuid("created_by").references(() => users.id),
    expiresAt: timestamp("expires_at", { withTimezone: true }).notNull(),
    usedAt: timestamp("used_at", { withTimezone: true }),
    createdAt: timestamp("created_at", { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [index("password_reset_tokens_user").on(t.userId)],
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

// ---------------------------------------------------------------------------------------------------------
// Jobs. Quantities are stored in SI base units with the unit in the column name; pressures are gauge
// (relative to the atmosphere) unless the name says otherwise.

export const customers = pgTable("customers", {
  id: uuid("id").primaryKey().defaultRandom(),
  name: text("name").notNull(),
  email: text("email"),
  phone: text("phone"),
  notes: text("notes").notNull().default(""),
  createdAt: timestamp("created_at", { withTimezone: true }).notNull().defaultNow(),
});
export type Customer = typeof customers.$inferSelect;

export const jobState = pgEnum("job_state", JOB_STATES);
export type { JobState };

/** Numbers the jobs BW-0001, BW-0002 ... without gaps from concurrent inserts colliding. */
export const jobNumberSequence = pgSequence("job_number_seq", { startWith: 1 });

export const FUEL_KIND_VALUES = ["gasoline", "ethanol", "methanol", "blend", "custom"] as const;

export const jobs = pgTable(
  "jobs",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    /** Human job number, BW-0001 onwards. */
    number: text("number").notNull().unique(),
    customerId: uuid("customer_id")
      .notNull()
      .references(() => customers.id),
    tunerId: uuid("tuner_id")
      .notNull()
      .references(() => users.id),
    state: jobState("state").notNull().default("draft"),
    carburetor: text("carburetor").notNull(),
    displacementM3: doublePrecision("displacement_m3").notNull(),
    fuelKind: text("fuel_kind", { enum: FUEL_KIND_VALUES }).notNull(),
    fuelEthanolPct: doublePrecision("fuel_ethanol_pct"),
    fuelDensityKgM3: doublePrecision("fuel_density_kg_m3"),
    fuelStoichAfr: doublePrecision("fuel_stoich_afr"),
    targetPowerW: doublePrecision("target_power_w"),
    peakBoostPa: doublePrecision("peak_boost_pa").notNull(),
    /** Lambda wanted at atmospheric pressure and at peak boost (the target mixture, linear between). */
    targetLambdaAtmosphere: doublePrecision("target_lambda_atmosphere").notNull().default(0.88),
    targetLambdaPeak: doublePrecision("target_lambda_peak").notNull().default(0.78),
    intercooled: boolean("intercooled").notNull().default(false),
    /** Measured charge temperature; when null it is estimated from the compressor and intercooler. */
    chargeTemperatureK: doublePrecision("charge_temperature_k"),
    ambientTemperatureK: doublePrecision("ambient_temperature_k").notNull().default(298.15),
    /** Ambient (barometric) pressure, absolute: the calibration point; gauge pressures are relative to it. */
    ambientPressurePa: doublePrecision("ambient_pressure_pa").notNull().default(101325),
    /** Site elevation when the ambient pressure was derived from it (ISO 2533); null when a barometer was read. */
    siteElevationM: doublePrecision("site_elevation_m"),
    /** Lambda wanted at cruise, under vacuum (common practice: about 1.0). */
    cruiseLambda: doublePrecision("cruise_lambda").notNull().default(1),
    /** Which drills the plan may mix: inch sizes (number, letter, fraction), metric, or both. */
    drillSystem: text("drill_system", { enum: ["inch", "metric", "mixed"] }).notNull().default("inch"),
    compressorEfficiency: doublePrecision("compressor_efficiency").notNull().default(0.7),
    intercoolerEffectiveness: doublePrecision("intercooler_effectiveness").notNull().default(0.7),
    /** Solve with every standard drill instead of the shop's rack. */
    useAllDrills: boolean("use_all_drills").notNull().default(false),
    notes: text("notes").notNull().default(""),
    /** Number of the newest approved revision; 0 before the first approval. */
    currentRevision: integer("current_revision").notNull().default(0),
    createdAt: timestamp("created_at", { withTimezone: true }).notNull().defaultNow(),
    updatedAt: timestamp("updated_at", { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [index("jobs_state").on(t.state), index("jobs_customer").on(t.customerId), index("jobs_tuner").on(t.tunerId)],
);
export type Job = typeof jobs.$inferSelect;

export const CARBURETOR_SIDES = ["primary", "secondary"] as const;
export const carburetorSide = pgEnum("carburetor_side", CARBURETOR_SIDES);

export const meteringBlocks = pgTable(
  "metering_blocks",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    jobId: uuid("job_id")
      .notNull()
      .references(() => jobs.id, { onDelete: "cascade" }),
    side: carburetorSide("side").notNull(),
    mainJetDiameterM: doublePrecision("main_jet_diameter_m").notNull(),
    mainJetCount: integer("main_jet_count").notNull().default(2),
    /** Usable length of each power-valve channel for the row of restriction holes. */
    channelLengthM: doublePrecision("channel_length_m"),
    minWebM: doublePrecision("min_web_m"),
    /** The vacuum passage to plug, measured. */
    passageDiameterM: doublePrecision("passage_diameter_m"),
    passageWallM: doublePrecision("passage_wall_m"),
    passageDepthM: doublePrecision("passage_depth_m"),
    /** Clearance grind inputs, measured with clay. */
    valveProtrusionM: doublePrecision("valve_protrusion_m"),
    runningClearanceM: doublePrecision("running_clearance_m"),
    measuredGapM: doublePrecision("measured_gap_m"),
    bossWallM: doublePrecision("boss_wall_m"),
    /** Pickup extension (secondary): straight runs, one bend, swage engagement. */
    tubeRunsM: jsonb("tube_runs_m").$type<number[]>(),
    tubeBendDeg: doublePrecision("tube_bend_deg"),
    tubeBendRadiusM: doublePrecision("tube_bend_radius_m"),
    tubeSwageM: doublePrecision("tube_swage_m"),
    /** Room the bowl leaves for the tube from the inlet tip: rearward and down (null: not measured). */
    tubeMaxRearwardM: doublePrecision("tube_max_rearward_m"),
    tubeMaxDownwardM: doublePrecision("tube_max_downward_m"),
    createdAt: timestamp("created_at", { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [unique("metering_blocks_job_side").on(t.jobId, t.side)],
);
export type MeteringBlock = typeof meteringBlocks.$inferSelect;

/**
 * The hand-over of a job's blocks to the customer: who handed them over, when, to whom, and where the
 * conversion record was mailed. One per revision: the car may come back, and a new revision is delivered again.
 */
export const deliveries = pgTable("deliveries", {
  id: uuid("id").primaryKey().defaultRandom(),
  jobId: uuid("job_id")
    .notNull()
    .references(() => jobs.id, { onDelete: "cascade" }),
  /** The revision the delivered blocks were machined to. */
  revisionNumber: integer("revision_number").notNull(),
  handedOverById: uuid("handed_over_by_id")
    .notNull()
    .references(() => users.id),
  /** The person who took the blocks, by name as they gave it. */
  handedTo: text("handed_to").notNull(),
  deliveredAt: timestamp("delivered_at", { withTimezone: true }).notNull().defaultNow(),
  /** Where the conversion record was mailed (null: the customer has no e-mail address on file). */
  recordMailedTo: text("record_mailed_to"),
}, (t) => [unique("deliveries_job_revision").on(t.jobId, t.revisionNumber)]);
export type Delivery = typeof deliveries.$inferSelect;

export const VALVE_KINDS = ["vacuum", "boost"] as const;
export const THROTTLE_MODES = ["part", "full"] as const;
export const ENRICHMENT_TARGET_KINDS = ["afr", "lambda", "percentMainJet", "area"] as const;
export type EnrichmentTargetKind = (typeof ENRICHMENT_TARGET_KINDS)[number];

export const enrichmentStages = pgTable("enrichment_stages", {
  id: uuid("id").primaryKey().defaultRandom(),
  blockId: uuid("block_id")
    .notNull()
    .references(() => meteringBlocks.id, { onDelete: "cascade" }),
  position: integer("position").notNull(),
  valveKind: text("valve_kind", { enum: VALVE_KINDS }).notNull(),
  /** Vacuum valve: opens when vacuum falls below this, Pa below atmosphere (positive number). */
  vacuumRatingPa: doublePrecision("vacuum_rating_pa"),
  /** Boost valve: opening pressure, Pa gauge. */
  setpointPa: doublePrecision("setpoint_pa"),
  /** The tuner's terms: AFR or lambda from -> to, percent of main-jet area, or an area in m². */
  targetKind: text("target_kind", { enum: ENRICHMENT_TARGET_KINDS }).notNull(),
  /** The throttle mode the mixture target is read in: part (primary side alone) or full (both sides). */
  mode: text("mode", { enum: THROTTLE_MODES }).notNull().default("full"),
  targetFrom: doublePrecision("target_from"),
  targetTo: doublePrecision("target_to").notNull(),
  /** The valve's own flow window, in series with the holes. */
  valveWindowAreaM2: doublePrecision("valve_window_area_m2"),
  maxHoles: integer("max_holes").notNull().default(4),
  /** The layout the tuner picked among the solver's candidates (null: the solver's first). */
  chosenCount: integer("chosen_count"),
  chosenDrillLabel: text("chosen_drill_label"),
});
export type EnrichmentStage = typeof enrichmentStages.$inferSelect;

export const REVISION_STATUSES = ["current", "superseded"] as const;

/** An approved plan: an immutable snapshot of the inputs and the solved outputs. */
export const planRevisions = pgTable(
  "plan_revisions",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    jobId: uuid("job_id")
      .notNull()
      .references(() => jobs.id, { onDelete: "cascade" }),
    number: integer("number").notNull(),
    status: text("status", { enum: REVISION_STATUSES }).notNull().default("current"),
    snapshot: jsonb("snapshot").notNull(),
    approvedById: uuid("approved_by_id")
      .notNull()
      .references(() => users.id),
    approvedAt: timestamp("approved_at", { withTimezone: true }).notNull().defaultNow(),
    releasedById: uuid("released_by_id").references(() => users.id),
    releasedAt: timestamp("released_at", { withTimezone: true }),
    supersededAt: timestamp("superseded_at", { withTimezone: true }),
    /** Danger warnings the approver acknowledged explicitly ({ code, message }[]); empty when there were none. */
    acknowledgedWarnings: jsonb("acknowledged_warnings").notNull().default(sql`'[]'::jsonb`),
  },
  (t) => [unique("plan_revisions_job_number").on(t.jobId, t.number)],
);
export type PlanRevision = typeof planRevisions.$inferSelect;

/** One step of work on one block in one revision, numbered 10, 20, 30 ... in the order it is done. */
export const operations = pgTable(
  "operations",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    revisionId: uuid("revision_id")
      .notNull()
      .references(() => planRevisions.id, { onDelete: "cascade" }),
    blockId: uuid("block_id")
      .notNull()
      .references(() => meteringBlocks.id),
    number: integer("number").notNull(),
    kind: text("kind").notNull(),
    title: text("title").notNull(),
    instructions: text("instructions").notNull(),
    parameters: jsonb("parameters").notNull().default(sql`'{}'::jsonb`),
    /** What the bench must measure for this step, with plan and tolerance (empty when nothing). */
    measurements: jsonb("measurements").notNull().default(sql`'[]'::jsonb`),
    caution: text("caution"),
  },
  (t) => [unique("operations_revision_block_number").on(t.revisionId, t.blockId, t.number)],
);
export type Operation = typeof operations.$inferSelect;

export const signOffs = pgTable("sign_offs", {
  id: uuid("id").primaryKey().defaultRandom(),
  /** Unique: a step is signed once, however many phones tap it. */
  operationId: uuid("operation_id")
    .notNull()
    .unique()
    .references(() => operations.id, { onDelete: "cascade" }),
  userId: uuid("user_id")
    .notNull()
    .references(() => users.id),
  note: text("note").notNull().default(""),
  signedAt: timestamp("signed_at", { withTimezone: true }).notNull().defaultNow(),
});

export const measurements = pgTable("measurements", {
  id: uuid("id").primaryKey().defaultRandom(),
  operationId: uuid("operation_id")
    .notNull()
    .references(() => operations.id, { onDelete: "cascade" }),
  /** Which of the operation's planned measurements this answers. */
  key: text("key").notNull(),
  valueSi: doublePrecision("value_si").notNull(),
  passed: boolean("passed").notNull(),
  recordedById: uuid("recorded_by_id")
    .notNull()
    .references(() => users.id),
  recordedAt: timestamp("recorded_at", { withTimezone: true }).notNull().defaultNow(),
}, (t) => [unique("measurements_operation_key").on(t.operationId, t.key)]);

export const attachments = pgTable("attachments", {
  id: uuid("id").primaryKey().defaultRandom(),
  blockId: uuid("block_id")
    .notNull()
    .references(() => meteringBlocks.id, { onDelete: "cascade" }),
  operationId: uuid("operation_id").references(() => operations.id, { onDelete: "set null" }),
  storageKey: text("storage_key").notNull().unique(),
  contentType: text("content_type").notNull(),
  byteSize: integer("byte_size").notNull(),
  uploadedById: uuid("uploaded_by_id")
    .notNull()
    .references(() => users.id),
  createdAt: timestamp("created_at", { withTimezone: true }).notNull().defaultNow(),
});

/** The shop's drill rack: which standard drills are on hand (by label). */
export const stockedDrills = pgTable("stocked_drills", {
  label: text("label").primaryKey(),
  addedAt: timestamp("added_at", { withTimezone: true }).notNull().defaultNow(),
});

/**
 * The shop's own limits, one row (id 1). Null columns take the defaults of lib/engineering (the smallest and
 * largest restriction drill the shop will put in a channel, the least web of metal between holes).
 */
export const shopSettings = pgTable("shop_settings", {
  id: integer("id").primaryKey().default(1),
  minRestrictionDrillLabel: text("min_restriction_drill_label"),
  maxRestrictionDrillLabel: text("max_restriction_drill_label"),
  minWebM: doublePrecision("min_web_m"),
  /** Dyno logs: throttle above this percent reads as full throttle. */
  fullThrottleAbovePct: doublePrecision("full_throttle_above_pct"),
  /** Dyno logs: width of a manifold-pressure bin, Pa. */
  logBinWidthPa: doublePrecision("log_bin_width_pa"),
  updatedAt: timestamp("updated_at", { withTimezone: true }).notNull().defaultNow(),
});
export type ShopSettings = typeof shopSettings.$inferSelect;

/**
 * An air-fuel log from the dyno or the street, read against the revision the car ran on. The file itself is in
 * the object store (storageKey); the row keeps the mapping, the counts, the rows refused and the analysis as
 * it was made, and, once the tuner accepts corrections, which ones and the revision they go into.
 */
export const tuningLogs = pgTable("tuning_logs", {
  id: uuid("id").primaryKey().defaultRandom(),
  jobId: uuid("job_id")
    .notNull()
    .references(() => jobs.id, { onDelete: "cascade" }),
  /** The revision the engine ran on while logging. */
  revisionNumber: integer("revision_number").notNull(),
  fileName: text("file_name").notNull(),
  storageKey: text("storage_key").notNull().unique(),
  byteSize: integer("byte_size").notNull(),
  mapping: jsonb("mapping").notNull(),
  totalRows: integer("total_rows").notNull(),
  usedRows: integer("used_rows").notNull(),
  /** Readings set aside, by reason ({ fastThrottle, cold }), and blank or repeated rows skipped. */
  setAside: jsonb("set_aside").notNull(),
  /** Rows refused: { line, reason }[] (the first 1,000; rejectedCount has them all). */
  rejected: jsonb("rejected").notNull(),
  rejectedCount: integer("rejected_count").notNull(),
  analysis: jsonb("analysis").notNull(),
  uploadedById: uuid("uploaded_by_id")
    .notNull()
    .references(() => users.id),
  uploadedAt: timestamp("uploaded_at", { withTimezone: true }).notNull().defaultNow(),
  acceptedById: uuid("accepted_by_id").references(() => users.id),
  acceptedAt: timestamp("accepted_at", { withTimezone: true }),
  /** The corrections accepted: { stageId, side, change }[] in the order applied. */
  acceptedChanges: jsonb("accepted_changes"),
  /** The revision the accepted corrections go into (the job's next approval). */
  nextRevisionNumber: integer("next_revision_number"),
});
export type TuningLog = typeof tuningLogs.$inferSelect;

/** Column mappings the shop has used, by the file's header, so the next file from the same logger maps itself. */
export const logMappings = pgTable("log_mappings", {
  header: text("header").primaryKey(),
  mapping: jsonb("mapping").notNull(),
  updatedAt: timestamp("updated_at", { withTimezone: true }).notNull().defaultNow(),
});

/**
 * A signed reading corrected afterwards (a typo at the bench): the reading as it was, what replaced it, why
 * and by whom. The measurement row holds the reading in force; these rows keep every earlier one.
 */
export const measurementAmendments = pgTable("measurement_amendments", {
  id: uuid("id").primaryKey().defaultRandom(),
  operationId: uuid("operation_id")
    .notNull()
    .references(() => operations.id, { onDelete: "cascade" }),
  key: text("key").notNull(),
  previousValueSi: doublePrecision("previous_value_si").notNull(),
  previousPassed: boolean("previous_passed").notNull(),
  valueSi: doublePrecision("value_si").notNull(),
  passed: boolean("passed").notNull(),
  reason: text("reason").notNull(),
  amendedById: uuid("amended_by_id")
    .notNull()
    .references(() => users.id),
  amendedAt: timestamp("amended_at", { withTimezone: true }).notNull().defaultNow(),
});
