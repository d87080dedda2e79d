"use client";

import { useRouter } from "next/navigation";
import { useState } from "react";
import { FetchError, sendJson } from "@/lib/hooks/fetcher";

export function AcceptForm({ docId, total }: { docId: string; total: string }) {
  const router = useRouter();
  const [name, setName] = useState("");
  const [consent, setConsent] = useState(false);
  const [fields, setFields] = useState<Record<string, string[]>>({});
  const [message, setMessage] = useState<string | null>(null);
  const [busy, setBusy] = useState(false);
  async function submit(e: React.FormEvent) {
    e.preventDefault();
    setBusy(true);
    setMessage(null);
    try {
      await sendJson(`/api/documents/${docId}/accept`, "POST", { name, consent });
      router.refresh();
    } catch (err) {
      if (err instanceof FetchError) {
        setFields((err.body.fields ?? {}) as Record<string, string[]>);
        setMessage(err.message);
      } else setMessage("Could not reach the server. Nothing was recorded; try again.");
    } finally {
      setBusy(false);
    }
  }
  return (
    <form onSubmit={submit} noValidate className="card space-y-4" aria-labelledby="accept-h">
      <h2 id="accept-h" className="text-xl font-semibold text-spruce-800">Accept this proposal</h2>
      <p className="text-ink-muted">By typing your name and ticking the box you accept the work described, its terms and the total of {total}. We record your name, the time, your internet address and a fingerprint of this exact document.</p>
      {message ? <p role="status" className="rounded-md bg-danger-bg px-3 py-2 text-danger" data-testid="accept-message">{message}</p> : null}
      <div>
        <label htmlFor="accept-name" className="field-label">Your full name</label>
        <input id="accept-name" className="field-input" value={name} onChange={(e) => setName(e.target.value)} aria-invalid={Boolean(fields.name) || undefined} aria-describedby="accept-name-err" autoComplete="name" />
        <p id="accept-name-err" className="field-error" aria-live="polite">{fields.name?.join(" ")}</p>
      </div>
      <div>
        <label className="flex min-h-11 items-center gap-3">
          <input type="checkbox" className="h-5 w-5" checked={consent} onChange={(e) => setConsent(e.target.checked)} aria-describedby="accept-consent-err" />
          I accept this proposal and its terms.
        </label>
        <p id="accept-consent-err" className="field-error" aria-live="polite">{fields.consent?.join(" ")}</p>
      </div>
      <button type="submit" className="btn-accent" disabled={busy}>{busy ? "Recording…" : "Accept proposal"}</button>
    </form>
  );
}
