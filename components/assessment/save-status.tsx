"use client";

import type { SaveStatus } from "@/lib/hooks/use-assessment";

const text: Record<SaveStatus, string> = {
  loading: "Loading…",
  saved: "All changes saved",
  pending: "Unsaved changes…",
  saving: "Saving…",
  offline: "Offline: changes are kept on this device and sent when the connection is back",
  failed: "Save failed: changes are kept on this device",
  conflict: "Someone else saved this assessment",
  invalid: "Fix the highlighted fields to save",
};

export function SaveStatusBadge({ status, message, onRetry, onResolve }: { status: SaveStatus; message: string | null; onRetry: () => void; onResolve: (keepMine: boolean) => void }) {
  const tone = status === "saved" ? "bg-spruce-50 text-spruce-800" : status === "failed" || status === "conflict" || status === "invalid" ? "bg-danger-bg text-danger" : "bg-warn-bg text-warn";
  return (
    <div role="status" aria-live="polite" data-testid="save-status" data-status={status} className={`flex flex-wrap items-center gap-3 rounded-md px-3 py-2 text-sm font-semibold ${tone}`}>
      <span>{text[status]}</span>
      {message ? <span className="font-normal">{message}</span> : null}
      {status === "failed" || status === "offline" ? <button type="button" className="btn-ghost" onClick={onRetry}>Try again</button> : null}
      {status === "conflict" ? (
        <>
          <button type="button" className="btn-ghost" onClick={() => onResolve(true)}>Keep mine</button>
          <button type="button" className="btn-ghost" onClick={() => onResolve(false)}>Discard mine, load theirs</button>
        </>
      ) : null}
    </div>
  );
}
