"use client";

import { useActionState } from "react";
import { setDisabledAction, setRoleAction } from "@/app/(office)/team/actions";
import type { ActionState } from "@/lib/authz/actions";
import type { RoleName } from "@/lib/authz/permissions";

export function UserRowActions({ userId, role, disabled, self }: { userId: string; role: RoleName; disabled: boolean; self: boolean }) {
  const [roleState, roleAction, rolePending] = useActionState<ActionState, FormData>(setRoleAction, {});
  const [disState, disAction, disPending] = useActionState<ActionState, FormData>(setDisabledAction, {});
  const message = roleState.message ?? disState.message;
  const ok = roleState.message ? roleState.ok : disState.ok;
  if (role === "homeowner") return <span className="text-sm text-ink-muted">Homeowner (linked to a client)</span>;
  return (
    <div className="flex flex-wrap items-center gap-2">
      <form action={roleAction} className="flex items-center gap-2">
        <input type="hidden" name="userId" value={userId} />
        <label className="sr-only" htmlFor={`role-${userId}`}>Role</label>
        <select id={`role-${userId}`} name="role" defaultValue={role} className="field-input w-auto">
          <option value="owner">Owner</option>
          <option value="auditor">Auditor</option>
          <option value="installer">Installer</option>
        </select>
        <button type="submit" className="btn-ghost" disabled={rolePending}>Set role</button>
      </form>
      {self ? null : (
        <form action={disAction}>
          <input type="hidden" name="userId" value={userId} />
          <input type="hidden" name="disabled" value={disabled ? "false" : "true"} />
          <button type="submit" className={disabled ? "btn-ghost" : "btn-ghost text-danger"} disabled={disPending}>{disabled ? "Enable" : "Disable"}</button>
        </form>
      )}
      {message ? <p role="status" className={`w-full text-sm ${ok ? "text-spruce-800" : "text-danger"}`}>{message}</p> : null}
    </div>
  );
}
