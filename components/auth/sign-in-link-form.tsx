"use client";

import { useActionState } from "react";
import { requestSignInLinkAction } from "@/app/(auth)/sign-in/actions";
import { Field, FormMessage } from "@/components/forms/field";
import type { ActionState } from "@/lib/authz/actions";

export function SignInLinkForm() {
  const [state, action, pending] = useActionState<ActionState, FormData>(requestSignInLinkAction, {});
  return (
    <form action={action} className="mt-5 space-y-4" noValidate>
      <FormMessage message={state.message} ok={state.ok} />
      <Field key={state.values?.email} name="email" label="E-mail" type="email" autoComplete="email" defaultValue={state.values?.email} errors={state.fields?.email} required />
      <button type="submit" className="btn-primary w-full" disabled={pending}>
        {pending ? "Sending…" : "E-mail me a sign-in link"}
      </button>
    </form>
  );
}
