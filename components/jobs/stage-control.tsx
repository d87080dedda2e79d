"use client";

import { useRouter } from "next/navigation";
import { useState } from "react";
import { FetchError, sendJson } from "@/lib/hooks/fetcher";
import { jobStageLabels, jobStages, type JobStage } from "@/lib/stages";

export function StageControl({ jobId, stage, version }: { jobId: string; stage: JobStage; version: number }) {
  const router = useRouter();
  const [next, setNext] = useState<JobStage>(stage);
  const [note, setNote] = useState("");
  const [busy, setBusy] = useState(false);
  const [message, setMessage] = useState<{ ok: boolean; text: string } | null>(null);

  async function submit(e: React.FormEvent) {
    e.preventDefault();
    if (next === stage) return setMessage({ ok: false, text: "Choose a different stage to move the job." });
    setBusy(true);
    setMessage(null);
    try {
      await sendJson(`/api/jobs/${jobId}`, "PATCH", { version, stage: next, stageNote: note || undefined });
      setNote("");
      setMessage({ ok: true, text: `Moved to ${jobStageLabels[next]}.` });
      router.refresh();
    } catch (err) {
      const text = err instanceof FetchError ? err.message : "Could not reach the server. Your choice is kept; try again.";
      setMessage({ ok: false, text });
      if (err instanceof FetchError && err.status === 409) router.refresh();
    } finally {
      setBusy(false);
    }
  }

  return (
    <form onSubmit={submit} className="mt-3 flex flex-wrap items-end gap-3">
      <div>
        <label htmlFor="stage-next" className="field-label">Move to</label>
        <select id="stage-next" className="field-input" value={next} onChange={(e) => setNext(e.target.value as JobStage)}>
          {jobStages.map((s) => (
            <option key={s} value={s}>{jobStageLabels[s]}</option>
          ))}
        </select>
      </div>
      <div className="min-w-56 flex-1">
        <label htmlFor="stage-note" className="field-label">Note (optional)</label>
        <input id="stage-note" className="field-input" value={note} maxLength={500} onChange={(e) => setNote(e.target.value)} />
      </div>
      <button type="submit" className="btn-primary" disabled={busy}>{busy ? "Saving…" : "Change stage"}</button>
      {message ? (
        <p role="status" data-testid="stage-message" className={`w-full text-sm font-medium ${message.ok ? "text-spruce-800" : "text-danger"}`}>{message.text}</p>
      ) : null}
    </form>
  );
}
