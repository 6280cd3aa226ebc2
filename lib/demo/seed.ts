// Demo data for an invented shop. Idempotent: running it again changes nothing that exists.
// Every name, customer and engine here is made up. Run with `tsx --conditions=react-server` so the
// server-only data layer can be used as it is.
import bcrypt from "bcryptjs";
import { drizzle, type NodePgDatabase } from "drizzle-orm/node-postgres";
import path from "node:path";
import { Pool } from "pg";
import * as schema from "@/db/schema";

export const DEMO_PASSWORD = "blockwright-demo";

export const DEMO_USERS = [
  { email: "admin@blockwright.test", name: "Avery Lindqvist", role: "admin" },
  { email: "tuner@blockwright.test", name: "Mara Quillon", role: "tuner" },
  { email: "machinist@blockwright.test", name: "Theo Varga", role: "machinist" },
] as const;

/** The three demo accounts; tests start from these too. */
let demoHash: Promise<string> | undefined;

export async function seedDemoUsers(db: NodePgDatabase<typeof schema>): Promise<void> {
  // One hash for all three accounts, computed once per process (tests reseed often).
  demoHash ??= bcrypt.hash(DEMO_PASSWORD, 10);
  const passwordHash = await demoHash;
  for (const user of DEMO_USERS) {
    await db
      .insert(schema.users)
      .values({ ...user, passwordHash })
      .onConflictDoNothing({ target: schema.users.email });
  }
}

if (process.argv[1] && path.resolve(process.argv[1]) === path.resolve(import.meta.filename)) {
  const url = process.env.DATABASE_URL;
  if (!url) throw new Error("DATABASE_URL is not set");
  const pool = new Pool({ connectionString: url, max: 1 });
  try {
    await seedDemoUsers(drizzle(pool, { schema }));
  } finally {
    await pool.end();
  }
  const { seedDemoShop } = await import("./shop");
  await seedDemoShop();
  const { closeDb } = await import("@/db/client");
  await closeDb();
  console.log("[blockwright] demo data seeded");
}
