"use client";

import Link from "next/link";
import { useCallback, useEffect, useState } from "react";
import { useCrewLog, useCrewQueue } from "@/lib/hooks/use-crew-log";
import { CrewSummary } from "./crew-summary";
import { sameLocalDay } from "./format";
import { SafetyPrompt } from "./safety-prompt";
import { TestOutForm, TestOutResultPanel } from "./test-out";
import { WallCard } from "./wall-card";

/**
 * The crew log of a job. Installers: today's safety prompt, then a card per dense-pack wall with
 * steppers, and the test-out form; every write waits on the phone until the server has it.
 * Office staff: the same cards read-only, the summary, refreshed every few seconds.
 */
export function CrewLogScreen({ jobId }: { jobId: string }) {
  const { data, error, mutate } = useCrewLog(jobId);
  const refresh = useCallback(() => mutate(), [mutate]);
  const q = useCrewQueue(jobId, refresh);
  // The clock for "acknowledged today", ticking each minute so a page left open asks again after midnight.
  const [now, setNow] = useState<number | null>(null);
  useEffect(() => {
    const tick = () => setNow(Date.now());
    tick();
    const t = window.setInterval(tick, 60_000);
    return () => window.clearInterval(t);
  }, []);

  const { prune } = q;
  useEffect(() => {
    if (!data) return;
    const logged = new Set(data.walls.flatMap((w) => w.entries.map((e) => e.clientRequestId)).concat(data.otherEntries.map((e) => e.clientRequestId)));
    const acked = data.safety.mine?.acknowledgedAt ?? 0;
    prune((r) => (r.kind === "entry" ? logged.has(r.clientRequestId) : acked >= r.queuedAt - 5 * 60_000));
  }, [data, prune]);

  if (!data || now === null) {
    return error ? (
      <p role="alert" className="rounded-md bg-danger-bg px-3 py-2 text-danger">{error.message} <button type="button" className="btn-ghost ml-2" onClick={() => void mutate()}>Try again</button></p>
    ) : (
      <p className="text-ink-muted">Loading the crew log…</p>
    );
  }

  const keys = data.safety.cautions.map((c) => c.id);
  const coversAll = (given: unknown) => Array.isArray(given) && keys.every((k) => given.includes(k));
  const ackedOnServer = data.safety.mine && sameLocalDay(data.safety.mine.acknowledgedAt, now) && coversAll(data.safety.mine.cautionKeys);
  const ackedOnPhone = q.queue.some((r) => r.kind === "safety-ack" && r.state !== "rejected" && sameLocalDay(r.queuedAt, now) && coversAll(r.body.cautionKeys));
  const needsSafety = data.canWrite && !ackedOnServer && !ackedOnPhone;

  const pendingCount = q.pending.length;
  return (
    <div className="space-y-4">
      {data.canWrite && (!needsSafety || pendingCount > 0) ? (
        <div className={`flex flex-wrap items-center justify-between gap-2 rounded-md px-3 py-2 ${pendingCount ? "bg-warn-bg text-warn" : "bg-spruce-50 text-spruce-800"}`} role="status" data-testid="sync-status">
          <span className="font-semibold">
            {pendingCount
              ? `${pendingCount} ${pendingCount === 1 ? "entry" : "entries"} pending on this phone${q.online ? (q.sending ? " — sending…" : "") : " — offline"}`
              : q.online ? "All entries saved." : "Offline — new entries will be kept on this phone."}
          </span>
          {pendingCount ? <button type="button" className="btn-ghost min-h-12" onClick={() => void q.retry()} disabled={q.sending}>Retry now</button> : null}
          {q.lastError && pendingCount ? <span className="w-full text-sm">{q.lastError}</span> : null}
        </div>
      ) : data.canWrite ? null : (
        <p className="rounded-md bg-spruce-50 px-3 py-2 text-spruce-800" role="status">Read-only for the office; updates every few seconds as the crew logs.</p>
      )}

      {data.issues.length ? (
        <p role="alert" className="rounded-md bg-warn-bg px-3 py-2 text-warn">The assessment is incomplete, so the dense-pack walls cannot be listed yet: {data.issues.slice(0, 3).map((i) => i.message).join("; ")}</p>
      ) : null}

      {needsSafety ? (
        <SafetyPrompt cautions={data.safety.cautions} onAcknowledge={(cautionKeys) => q.enqueue("safety-ack", `/api/jobs/${jobId}/safety-ack`, { cautionKeys })} />
      ) : (
        <>
          {data.walls.length === 0 && !data.issues.length ? <p className="text-ink-muted">This job has no walls in a dense-pack upgrade.</p> : null}
          {data.walls.map((w) => (
            <WallCard key={w.surfaceId} jobId={jobId} wall={w} thresholds={data.thresholds} queued={q.queue} canWrite={data.canWrite} onSave={(body) => q.enqueue("entry", `/api/jobs/${jobId}/crew-log`, body)} onDiscard={q.discard} />
          ))}
          {!data.canWrite ? <CrewSummary log={data} /> : null}
          <TestOutResultPanel result={data.testOut} />
          {data.canRecordTestOut ? <TestOutForm jobId={jobId} onRecorded={() => void mutate()} /> : null}
          <p><Link href={`/jobs/${jobId}/photos`} className="btn-ghost min-h-12 w-full sm:w-auto">Photos of this job →</Link></p>
        </>
      )}
    </div>
  );
}
