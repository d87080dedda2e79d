"use client";

import { useActionState } from "react";
import { addUserAction } from "@/app/(office)/team/actions";
import { Field, FormMessage } from "@/components/forms/field";
import { SelectField } from "@/components/forms/select-field";
import type { ActionState } from "@/lib/authz/actions";

export function AddUserForm() {
  const [state, action, pending] = useActionState<ActionState, FormData>(addUserAction, {});
  const v = state.ok ? {} : (state.values ?? {});
  const e = state.fields ?? {};
  return (
    <form action={action} noValidate className="card space-y-4">
      <h2 className="text-xl font-semibold text-spruce-800">Add a team member</h2>
      <FormMessage message={state.message} ok={state.ok} />
      <div className="grid gap-4 sm:grid-cols-2">
        <Field key={`n${v.name}`} name="name" label="Name" defaultValue={v.name} errors={e.name} />
        <Field key={`e${v.email}`} name="email" label="E-mail" type="email" defaultValue={v.email} errors={e.email} />
        <SelectField name="role" label="Role" value={v.role} errors={e.role} options={[{ value: "auditor", label: "Auditor" }, { value: "installer", label: "Installer" }, { value: "owner", label: "Owner" }]} />
        <Field name="password" label="Temporary password" type="password" autoComplete="new-password" errors={e.password} hint="At least 10 characters; share it with them in person." />
      </div>
      <button type="submit" className="btn-primary" disabled={pending}>{pending ? "Adding…" : "Add member"}</button>
    </form>
  );
}
