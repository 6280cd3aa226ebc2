import Link from "next/link";
import { requireRole, ALL_ROLES } from "@/lib/auth/session";
import { PageHeader } from "@/components/ui/sheet";
import { ALL_CAUTIONS } from "@/lib/safety/cautions";
import type { UserRole } from "@/db/schema";
import { WorkQueue } from "./_components/work-queue";

const KICKER: Record<UserRole, string> = {
  admin: "The shop this week",
  tuner: "Your jobs",
  machinist: "At the bench",
};

export default async function HomePage() {
  const user = await requireRole(ALL_ROLES, "/");
  return (
    <>
      <PageHeader
        kicker={KICKER[user.role]}
        title={`Good to see you, ${user.name.split(" ")[0]}`}
        actions={
          <Link href="/safety" className="inline-flex min-h-11 items-center rounded-[var(--radius-sheet)] border-2 border-ink px-4 text-sm font-semibold hover:bg-accent-soft">
            Safety: {ALL_CAUTIONS.length} cautions →
          </Link>
        }
      />
      <WorkQueue />
    </>
  );
}
