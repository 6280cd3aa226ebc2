import type { Metadata } from "next";
import { ALL_ROLES, requireRole } from "@/lib/auth/session";
import { PasswordForm, SignOutEverywhereForm } from "./password-form";

export const metadata: Metadata = { title: "Account" };

export default async function AccountPage() {
  const user = await requireRole(ALL_ROLES, "/account");
  return (
    <div className="grid max-w-3xl gap-10 md:grid-cols-2">
      <section aria-labelledby="password-heading">
        <h1 id="password-heading" className="mb-1 text-2xl font-bold">
          Your password
        </h1>
        <p className="mb-6 text-sm text-graphite">
          Signed in as {user.email}. A new password signs you out everywhere, here too: sign in again with it.
        </p>
        <PasswordForm />
      </section>
      <section aria-labelledby="sessions-heading">
        <h2 id="sessions-heading" className="mb-1 text-xl font-semibold">
          Every device
        </h2>
        <p className="mb-6 text-sm text-graphite">
          Left signed in on a shop phone or another computer? This ends every session of yours at once.
        </p>
        <SignOutEverywhereForm />
      </section>
    </div>
  );
}
