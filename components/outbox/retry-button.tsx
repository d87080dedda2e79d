"use client";

import { useActionState } from "react";
import { retryMailAction } from "@/app/(office)/outbox/actions";
import type { ActionState } from "@/lib/authz/actions";

export function RetryButton({ id }: { id: string }) {
  const [state, action, pending] = useActionState<ActionState, FormData>(retryMailAction, {});
  return (
    <form action={action} className="flex flex-wrap items-center gap-2">
      <input type="hidden" name="id" value={id} />
      <button type="submit" className="btn-ghost" disabled={pending}>{pending ? "Retrying…" : "Retry now"}</button>
      {state.message ? <p role="status" className={`text-sm ${state.ok ? "text-spruce-800" : "text-danger"}`}>{state.message}</p> : null}
    </form>
  );
}
