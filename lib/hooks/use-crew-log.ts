"use client";

import { useCallback, useEffect, useRef, useState } from "react";
import useSWR from "swr";
import type { CrewLogView } from "@/lib/data/crew-log";
import { fetcher, FetchError, sendJson } from "./fetcher";
import { useResendWhenOnline } from "./use-resend-when-online";

export const crewLogKey = (jobId: string) => `/api/jobs/${jobId}/crew-log`;

/** A job's crew log, keyed by the API path; polled every 5 s so the office sees the crew live. */
export function useCrewLog(jobId: string) {
  return useSWR<CrewLogView>(crewLogKey(jobId), fetcher, { refreshInterval: 5000, keepPreviousData: true });
}

/** One request waiting on the device: sent in order, its clientRequestId making a resend harmless. */
export type QueuedRequest = {
  clientRequestId: string;
  kind: "entry" | "safety-ack";
  url: string;
  body: Record<string, unknown>;
  queuedAt: number;
  /**
   * pending: not yet accepted by the server; sent: accepted, kept until the crew log read back
   * contains it (so the tally never dips while the list refreshes); rejected: refused, kept to show why.
   */
  state: "pending" | "sent" | "rejected";
  error?: string;
  fields?: Record<string, string[]>;
};

const queueKey = (jobId: string) => `warmstead:crew-queue:${jobId}`;

function readQueue(jobId: string): QueuedRequest[] {
  try {
    const raw = localStorage.getItem(queueKey(jobId));
    const parsed = raw ? (JSON.parse(raw) as unknown) : [];
    return Array.isArray(parsed) ? (parsed as QueuedRequest[]) : [];
  } catch {
    return [];
  }
}

function writeQueue(jobId: string, q: QueuedRequest[]) {
  try {
    if (q.length) localStorage.setItem(queueKey(jobId), JSON.stringify(q));
    else localStorage.removeItem(queueKey(jobId));
  } catch {
    // storage full or blocked: the in-memory queue still sends
  }
}

/** A refusal the server gave on purpose (do not resend) versus a lost connection or a server hiccup (resend). */
const isRefusal = (err: unknown) => err instanceof FetchError && err.status >= 400 && err.status < 500 && err.status !== 408 && err.status !== 429;

/**
 * The device-side queue of crew-log writes. Every write is stored in localStorage first and then
 * sent; anything not accepted stays "pending" through a reload or a dropped connection and is
 * replayed in order on the `online` event, on a timer, or with the retry button.
 */
export function useCrewQueue(jobId: string, onSent: () => Promise<unknown>) {
  const [queue, setQueue] = useState<QueuedRequest[]>([]);
  const [sending, setSending] = useState(false);
  const [lastError, setLastError] = useState<string | null>(null);
  const flushing = useRef(false);
  const onSentRef = useRef(onSent);
  useEffect(() => {
    onSentRef.current = onSent;
  }, [onSent]);

  const update = useCallback(
    (fn: (q: QueuedRequest[]) => QueuedRequest[]) => {
      const next = fn(readQueue(jobId));
      writeQueue(jobId, next);
      setQueue(next);
      return next;
    },
    [jobId],
  );

  const flush = useCallback(async () => {
    if (flushing.current) return;
    flushing.current = true;
    setSending(true);
    let sent = false;
    try {
      for (;;) {
        const next = readQueue(jobId).find((r) => r.state === "pending");
        if (!next) break;
        try {
          await sendJson(next.url, "POST", next.body);
          sent = true;
          setLastError(null);
          update((q) => q.map((r) => (r.clientRequestId === next.clientRequestId ? { ...r, state: "sent" } : r)));
          void onSentRef.current().catch(() => undefined);
        } catch (err) {
          if (isRefusal(err)) {
            const e = err as FetchError;
            update((q) => q.map((r) => (r.clientRequestId === next.clientRequestId ? { ...r, state: "rejected", error: e.message, fields: e.body.fields as Record<string, string[]> | undefined } : r)));
            continue;
          }
          setLastError(err instanceof FetchError ? err.message : "No connection. Kept on this phone; it will be sent when you are back online.");
          break;
        }
      }
    } finally {
      flushing.current = false;
      setSending(false);
      if (sent) void onSentRef.current().catch(() => undefined);
    }
  }, [jobId, update]);

  useEffect(() => {
    // What a previous visit left on this phone (useResendWhenOnline below sends it).
    // eslint-disable-next-line react-hooks/set-state-in-effect
    setQueue(readQueue(jobId));
  }, [jobId]);
  const hasPending = useCallback(() => readQueue(jobId).some((r) => r.state === "pending"), [jobId]);
  const online = useResendWhenOnline(flush, hasPending);

  const enqueue = useCallback(
    (kind: QueuedRequest["kind"], url: string, body: Record<string, unknown>) => {
      const clientRequestId = crypto.randomUUID();
      update((q) => [...q, { clientRequestId, kind, url, body: { ...body, clientRequestId }, queuedAt: Date.now(), state: "pending" }]);
      void flush();
      return clientRequestId;
    },
    [flush, update],
  );

  /** Drops the sent requests the server's answer now shows (and any sent more than 10 minutes ago). */
  const prune = useCallback(
    (confirmed: (r: QueuedRequest) => boolean) => {
      const stale = Date.now() - 10 * 60_000;
      if (readQueue(jobId).some((r) => r.state === "sent" && (confirmed(r) || r.queuedAt < stale))) update((q) => q.filter((r) => !(r.state === "sent" && (confirmed(r) || r.queuedAt < stale))));
    },
    [jobId, update],
  );

  const discard = useCallback((clientRequestId: string) => update((q) => q.filter((r) => r.clientRequestId !== clientRequestId)), [update]);

  return { queue, pending: queue.filter((r) => r.state === "pending"), rejected: queue.filter((r) => r.state === "rejected"), sending, online, lastError, enqueue, retry: flush, discard, prune };
}
