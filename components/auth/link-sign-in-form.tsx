"use client";

import Link from "next/link";
import { useActionState } from "react";
import { linkSignInAction } from "@/app/(auth)/welcome/actions";
import { FormMessage } from "@/components/forms/field";
import type { ActionState } from "@/lib/authz/actions";
import { LINK_GONE } from "@/lib/validation/invite";

// A button, not an automatic sign-in: mail scanners that open links must not use them up.
export function LinkSignInForm({ token }: { token: string }) {
  const [state, action, pending] = useActionState<ActionState, FormData>(linkSignInAction, {});
  return (
    <form action={action} className="mt-5 space-y-4">
      <input type="hidden" name="token" value={token} />
      <FormMessage message={state.message} ok={state.ok} />
      {state.message === LINK_GONE ? <p><Link href="/sign-in/link" className="font-semibold text-spruce-700 underline">E-mail me a new sign-in link</Link></p> : null}
      <button type="submit" className="btn-primary w-full" disabled={pending}>
        {pending ? "Signing in…" : "Sign in and continue"}
      </button>
    </form>
  );
}
