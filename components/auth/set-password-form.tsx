"use client";

import Link from "next/link";
import { useActionState } from "react";
import { setPasswordAction } from "@/app/(auth)/welcome/actions";
import { Field, FormMessage } from "@/components/forms/field";
import type { ActionState } from "@/lib/authz/actions";
import { LINK_GONE } from "@/lib/validation/invite";

export function SetPasswordForm({ token, email }: { token: string; email: string }) {
  const [state, action, pending] = useActionState<ActionState, FormData>(setPasswordAction, {});
  return (
    <form action={action} className="mt-5 space-y-4" noValidate>
      <input type="hidden" name="token" value={token} />
      {/* For password managers: the account the new password belongs to. */}
      <input type="email" name="username" autoComplete="username" value={email} readOnly hidden />
      <FormMessage message={state.message} ok={state.ok} />
      {state.ok ? <p><Link href="/sign-in" className="font-semibold text-spruce-700 underline">Go to sign in</Link></p> : null}
      {state.message === LINK_GONE ? <p><Link href="/sign-in/link" className="font-semibold text-spruce-700 underline">E-mail me a new sign-in link</Link></p> : null}
      <Field name="password" label="New password" type="password" autoComplete="new-password" errors={state.fields?.password} hint="At least 10 characters. A few unrelated words make a good one." required />
      <Field name="confirm" label="Confirm password" type="password" autoComplete="new-password" errors={state.fields?.confirm} required />
      <button type="submit" className="btn-primary w-full" disabled={pending}>
        {pending ? "Setting your password…" : "Set password and continue"}
      </button>
    </form>
  );
}
