"use client";

import { useCallback, useEffect, useRef, useState } from "react";
import { useResendWhenOnline } from "./use-resend-when-online";
import { FetchError, sendJson } from "./fetcher";

/** What the installer typed, as typed, and the id the reading will have (made on this phone). */
export type TestOutDraft = { cfm50: string; outdoorTempF: string; windMph: string; notes: string; clientRequestId: string };

/** A reading waiting on the phone: its body is fixed when Record is pressed, so every resend is the same request. */
export type QueuedTestOut = { body: Record<string, unknown>; queuedAt: number; attempts: number };

type Stored = { draft: TestOutDraft; queued: QueuedTestOut | null };

export type TestOutAnswer = { replayed: boolean; movedToVerified: boolean; readingId: string; stage: string };

const storageKey = (jobId: string) => `warmstead:test-out:${jobId}`;
const oldDraftKey = (jobId: string) => `warmstead:test-out-draft:${jobId}`;

export const freshTestOutDraft = (): TestOutDraft => ({ cfm50: "", outdoorTempF: "", windMph: "", notes: "", clientRequestId: crypto.randomUUID() });

const isDraft = (d: unknown): d is TestOutDraft =>
  typeof d === "object" && d !== null && ["cfm50", "outdoorTempF", "windMph", "notes", "clientRequestId"].every((k) => typeof (d as Record<string, unknown>)[k] === "string");

function read(jobId: string): Stored {
  try {
    const raw = localStorage.getItem(storageKey(jobId));
    if (raw) {
      const s = JSON.parse(raw) as Partial<Stored>;
      if (isDraft(s.draft)) return { draft: s.draft, queued: s.queued && typeof s.queued.body === "object" ? s.queued : null };
    }
    // A draft kept by the earlier form (typed values only).
    const old = localStorage.getItem(oldDraftKey(jobId));
    const d = old ? (JSON.parse(old) as unknown) : null;
    if (isDraft(d)) return { draft: d, queued: null };
  } catch {
    // unreadable: start afresh
  }
  return { draft: freshTestOutDraft(), queued: null };
}

function write(jobId: string, s: Stored) {
  try {
    localStorage.setItem(storageKey(jobId), JSON.stringify(s));
    localStorage.removeItem(oldDraftKey(jobId));
  } catch {
    // storage blocked or full: kept in memory for this visit
  }
}

/** A number where the text is one, else the text itself (the server names the field that is wrong). */
const numOrText = (s: string) => (s.trim() === "" ? undefined : Number.isFinite(Number(s)) ? Number(s) : s);

/** A refusal the server gave on purpose (do not resend) versus a lost connection or a server hiccup (resend). */
const isRefusal = (err: unknown) => err instanceof FetchError && err.status >= 400 && err.status < 500 && err.status !== 408 && err.status !== 429;

/**
 * The test-out reading on the crew phone. Pressing Record stores the reading on the phone first,
 * then sends it; without a connection (or when the server does not answer) it stays queued —
 * through a reload — and is sent again on the `online` event, every 20 s, or with "Send now".
 * Every resend carries the same clientRequestId, which the server uses as the reading's id, so a
 * reading whose answer was lost is recorded once. A refusal (a bad value, a closed job) puts the
 * reading back in the form with the reasons, nothing lost.
 */
export function useTestOut(jobId: string, onRecorded: (answer: TestOutAnswer) => void) {
  const [stored, setStored] = useState<Stored | null>(null);
  const [errors, setErrors] = useState<Record<string, string[]>>({});
  const [message, setMessage] = useState<{ kind: "ok" | "error"; text: string } | null>(null);
  const [sending, setSending] = useState(false);
  const [lastError, setLastError] = useState<string | null>(null);
  const flushing = useRef(false);
  const onRecordedRef = useRef(onRecorded);
  useEffect(() => {
    onRecordedRef.current = onRecorded;
  }, [onRecorded]);

  const save = useCallback(
    (next: Stored) => {
      write(jobId, next);
      setStored(next);
    },
    [jobId],
  );

  const flush = useCallback(async () => {
    const current = read(jobId);
    if (!current.queued || flushing.current) return;
    flushing.current = true;
    setSending(true);
    try {
      const answer = await sendJson<TestOutAnswer>(`/api/jobs/${jobId}/test-out`, "POST", current.queued.body);
      save({ draft: freshTestOutDraft(), queued: null });
      setErrors({});
      setLastError(null);
      setMessage({ kind: "ok", text: answer.movedToVerified ? "Test-out recorded. The job is now Verified." : "Test-out recorded." });
      onRecordedRef.current(answer);
    } catch (err) {
      if (isRefusal(err)) {
        const e = err as FetchError;
        const fields = (e.body.fields as Record<string, string[]> | undefined) ?? {};
        // A key the server says is taken can never succeed: the reading gets a new one.
        const draft = fields.clientRequestId ? { ...current.draft, clientRequestId: crypto.randomUUID() } : current.draft;
        save({ draft, queued: null });
        setErrors(fields);
        setLastError(null);
        setMessage({ kind: "error", text: e.status === 422 ? "Not recorded: check the fields marked below." : `Not recorded: ${e.message}` });
      } else {
        save({ ...current, queued: { ...current.queued, attempts: current.queued.attempts + 1 } });
        setLastError(err instanceof FetchError ? `The server did not take it (${err.status}); it will be sent again.` : "No connection; it will be sent when the phone is back online.");
      }
    } finally {
      flushing.current = false;
      setSending(false);
    }
  }, [jobId, save]);

  useEffect(() => {
    // What a previous visit left on this phone (useResendWhenOnline below sends it if it was waiting).
    // eslint-disable-next-line react-hooks/set-state-in-effect
    setStored(read(jobId));
  }, [jobId]);
  const hasPending = useCallback(() => Boolean(read(jobId).queued), [jobId]);
  const online = useResendWhenOnline(flush, hasPending);

  const change = useCallback(
    (patch: Partial<Omit<TestOutDraft, "clientRequestId">>) => {
      const current = read(jobId);
      if (current.queued) return; // a queued reading is sent as it was recorded
      save({ ...current, draft: { ...current.draft, ...patch } });
    },
    [jobId, save],
  );

  /** Queues the reading as typed (with the time it was taken) and tries to send it at once. */
  const record = useCallback(() => {
    const current = read(jobId);
    if (current.queued) return void flush();
    const d = current.draft;
    const queuedAt = Date.now();
    const body = { clientRequestId: d.clientRequestId, cfm50: numOrText(d.cfm50), outdoorTempF: numOrText(d.outdoorTempF), windMph: numOrText(d.windMph), notes: d.notes.trim() || undefined, testedAt: queuedAt };
    save({ draft: d, queued: { body, queuedAt, attempts: 0 } });
    setMessage(null);
    setErrors({});
    void flush();
  }, [jobId, flush, save]);

  return { draft: stored?.draft ?? null, queued: stored?.queued ?? null, loaded: stored !== null, errors, message, sending, online, lastError, change, record, retry: flush };
}
