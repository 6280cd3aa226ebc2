"use client";

import { useState } from "react";
import { useServerForm } from "@/components/forms/use-server-form";
import { Button } from "@/components/ui/button";
import { Select } from "@/components/ui/field";
import type { UserRole } from "@/db/schema";
import { sendResetLinkAction, updateUserAction } from "./actions";

export function UserRowControls({ user }: { user: { id: string; name: string; role: UserRole; active: boolean } }) {
  // The role and the active state are changed by one action from two small forms; the answer to the form
  // sent last is the one shown.
  const [sentLast, setSentLast] = useState<"role" | "active">("role");
  const roleForm = useServerForm(updateUserAction, { id: `user-role-${user.id}` });
  const activeForm = useServerForm(updateUserAction, { id: `user-active-${user.id}` });
  const resetForm = useServerForm(sendResetLinkAction, { id: `user-reset-${user.id}` });
  const pending = roleForm.pending || activeForm.pending;
  const result = sentLast === "role" ? roleForm.lastResult : activeForm.lastResult;
  const { lastResult: resetResult, pending: resetPending } = resetForm;
  const resetError = resetResult && resetResult.httpStatus !== 200 ? (resetResult.error?.[""] ?? []) : undefined;
  const error = result && result.httpStatus !== 200 ? (result.error?.[""] ?? Object.values(result.error ?? {}).flat()) : undefined;
  return (
    <div className="flex flex-col gap-1">
      <div className="flex flex-wrap items-center gap-2">
        <form {...roleForm.formProps} onSubmitCapture={() => setSentLast("role")} className="flex items-center gap-2">
          <input type="hidden" name="userId" value={user.id} />
          <label className="sr-only" htmlFor={`role-${user.id}`}>
            Role of {user.name}
          </label>
          <Select id={`role-${user.id}`} name="role" defaultValue={user.role} className="w-36" disabled={!user.active}>
            <option value="admin">admin</option>
            <option value="tuner">tuner</option>
            <option value="machinist">machinist</option>
          </Select>
          <Button type="submit" variant="secondary" disabled={pending || !user.active}>
            Set role
          </Button>
        </form>
        <form {...activeForm.formProps} onSubmitCapture={() => setSentLast("active")}>
          <input type="hidden" name="userId" value={user.id} />
          <input type="hidden" name="active" value={user.active ? "false" : "true"} />
          <Button type="submit" variant="quiet" disabled={pending}>
            {user.active ? "Deactivate" : "Reactivate"}
          </Button>
        </form>
        {user.active ? (
          <form {...resetForm.formProps}>
            <input type="hidden" name="userId" value={user.id} />
            <Button type="submit" variant="quiet" disabled={resetPending}>
              {resetPending ? "Sending…" : "Send reset link"}
            </Button>
          </form>
        ) : null}
      </div>
      {error?.length ? (
        <p role="alert" className="text-sm text-fault">
          {error.join(" ")}
        </p>
      ) : null}
      {resetError?.length ? (
        <p role="alert" className="text-sm text-fault">
          {resetError.join(" ")}
        </p>
      ) : resetResult?.httpStatus === 200 ? (
        <p role="status" className="text-sm text-graphite">
          {resetResult.message}
        </p>
      ) : null}
    </div>
  );
}
