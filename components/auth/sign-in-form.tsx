"use client";

import { useActionState } from "react";
import { signInAction } from "@/app/(auth)/sign-in/actions";
import { Field, FormMessage } from "@/components/forms/field";
import type { ActionState } from "@/lib/authz/actions";

export function SignInForm({ next }: { next?: string }) {
  const [state, action, pending] = useActionState<ActionState, FormData>(signInAction, {});
  return (
    <form action={action} className="mt-5 space-y-4" noValidate>
      {next ? <input type="hidden" name="next" value={next} /> : null}
      <FormMessage message={state.message} ok={state.ok} />
      <Field name="email" label="E-mail" type="email" autoComplete="username" defaultValue={state.values?.email} errors={state.fields?.email} required />
      <Field name="password" label="Password" type="password" autoComplete="current-password" errors={state.fields?.password} required />
      <button type="submit" className="btn-primary w-full" disabled={pending}>
        {pending ? "Signing in…" : "Sign in"}
      </button>
    </form>
  );
}
