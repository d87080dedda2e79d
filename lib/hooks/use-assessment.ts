"use client";

import { useCallback, useEffect, useRef, useState } from "react";
import useSWR from "swr";
import { assessmentDocSchema, type AssessmentDoc } from "@/lib/assessment/doc";
import { fetcher, FetchError, sendJson } from "./fetcher";

export type SaveStatus = "loading" | "saved" | "pending" | "saving" | "offline" | "failed" | "conflict" | "invalid";
export type Issue = { path: string; message: string };
type Loaded = { version: number; doc: AssessmentDoc; companyLibrary: AssessmentDoc["assemblies"]; pricesVisible: boolean; canEdit: boolean; issues: Issue[] };
type Pending = { baseVersion: number; doc: AssessmentDoc; at: number };

const SAVE_DELAY_MS = 800;
const storageKey = (jobId: string) => `warmstead:assessment:${jobId}`;

function readPending(jobId: string): Pending | null {
  try {
    const raw = localStorage.getItem(storageKey(jobId));
    return raw ? (JSON.parse(raw) as Pending) : null;
  } catch {
    return null;
  }
}

type Part = keyof typeof assessmentDocSchema.shape;
const parts = Object.keys(assessmentDocSchema.shape) as Part[];
const surfaceSchema = assessmentDocSchema.shape.surfaces.element;
const NONE: Issue[] = [];
// A part's reasons, remembered per object: an edit replaces only the objects on its path
// (context.tsx setAt), so a keystroke checks the edited surface and the parts above it again,
// not the other 59 surfaces.
const checked = new WeakMap<object, { path: string; message: string }[]>();

type Schema = { safeParse: (v: unknown) => { success: boolean; error?: { issues: { path: PropertyKey[]; message: string }[] } } };

/** One part's reasons, with paths under `prefix` (remembered without it: a surface can move). */
function check(value: unknown, schema: Schema, prefix: string): Issue[] {
  const key = typeof value === "object" && value !== null ? value : null;
  let found = key ? checked.get(key) : undefined;
  if (!found) {
    const r = schema.safeParse(value);
    found = r.success ? [] : r.error!.issues.map((i) => ({ path: i.path.map(String).join("."), message: i.message }));
    if (key) checked.set(key, found);
  }
  return found.map((i) => ({ path: i.path ? `${prefix}.${i.path}` : prefix, message: i.message }));
}

/**
 * Local structural check with the API's own schema: field → reasons; empty when the document can
 * be sent. The same schema and messages as one `assessmentDocSchema.safeParse`, part by part (and
 * surface by surface), with the reasons of an unchanged part remembered.
 */
export function docIssues(doc: AssessmentDoc): Issue[] {
  if (!doc || typeof doc !== "object" || !Array.isArray(doc.surfaces) || doc.surfaces.length > 1000) {
    const r = assessmentDocSchema.safeParse(doc);
    return r.success ? NONE : r.error.issues.map((i) => ({ path: i.path.join("."), message: i.message }));
  }
  const out: Issue[] = [];
  for (const part of parts) {
    if (part === "surfaces") doc.surfaces.forEach((s, i) => out.push(...check(s, surfaceSchema, `surfaces.${i}`)));
    else out.push(...check(doc[part], assessmentDocSchema.shape[part] as Schema, part));
  }
  return out.length ? out : NONE;
}

/**
 * The assessment being edited: saves as you go (debounced), keeps unsent edits on the device
 * through a reload or a dropped connection and sends them when it can, and reports a concurrent
 * save by someone else as a conflict instead of overwriting it.
 */
export function useAssessment(jobId: string) {
  const { data, error, mutate } = useSWR<Loaded>(`/api/jobs/${jobId}/assessment`, fetcher, { revalidateOnFocus: false, revalidateOnReconnect: false });
  const [doc, setDoc] = useState<AssessmentDoc | null>(null);
  const [status, setStatus] = useState<SaveStatus>("loading");
  const [message, setMessage] = useState<string | null>(null);
  /** What the server refused in the last save (422), by field. */
  const [blocking, setBlocking] = useState<Issue[]>(NONE);
  const version = useRef(0);
  const latest = useRef<AssessmentDoc | null>(null);
  const timer = useRef<ReturnType<typeof setTimeout> | undefined>(undefined);
  const inFlight = useRef(false);
  const sendRef = useRef<() => Promise<void>>(async () => {});

  const send = useCallback(async () => {
    const current = latest.current;
    if (!current || inFlight.current) return;
    // The reasons themselves are shown from docIssues by the workspace; here they only stop the save.
    if (docIssues(current).length) {
      setBlocking(NONE);
      return setStatus("invalid");
    }
    if (typeof navigator !== "undefined" && !navigator.onLine) return setStatus("offline");
    inFlight.current = true;
    setStatus("saving");
    try {
      const r = await sendJson<{ version: number }>(`/api/jobs/${jobId}/assessment`, "PUT", { version: version.current, doc: current });
      version.current = r.version;
      if (latest.current === current) {
        localStorage.removeItem(storageKey(jobId));
        setStatus("saved");
        setMessage(null);
      } else {
        localStorage.setItem(storageKey(jobId), JSON.stringify({ baseVersion: r.version, doc: latest.current, at: Date.now() }));
        timer.current = setTimeout(() => void sendRef.current(), SAVE_DELAY_MS);
      }
    } catch (err) {
      if (err instanceof FetchError && err.status === 409) {
        setStatus("conflict");
        setMessage(err.message);
      } else if (err instanceof FetchError && err.status === 422) {
        const fields = (err.body.fields ?? {}) as Record<string, string[]>;
        setBlocking(Object.entries(fields).flatMap(([path, msgs]) => msgs.map((m) => ({ path, message: m }))));
        setStatus("invalid");
      } else if (err instanceof FetchError) {
        setStatus("failed");
        setMessage(err.message);
      } else {
        setStatus("offline");
      }
    } finally {
      inFlight.current = false;
    }
  }, [jobId]);
  useEffect(() => {
    sendRef.current = send;
  }, [send]);

  // First load: the server's document, or unsent edits kept on this device.
  useEffect(() => {
    if (!data || doc) return;
    version.current = data.version;
    const pending = readPending(jobId);
    // One-time hydration from the server, or from edits this device has not sent yet.
    /* eslint-disable react-hooks/set-state-in-effect */
    if (pending && pending.baseVersion === data.version) {
      latest.current = pending.doc;
      setDoc(pending.doc);
      setMessage("Unsent edits from this device were restored and are being saved.");
      void send();
    } else if (pending) {
      latest.current = pending.doc;
      setDoc(pending.doc);
      setStatus("conflict");
      setMessage("This device has unsent edits, but someone saved the assessment since. Keep yours (replacing theirs) or discard yours.");
    } else {
      latest.current = data.doc;
      setDoc(data.doc);
      setStatus("saved");
    }
    /* eslint-enable react-hooks/set-state-in-effect */
  }, [data, doc, jobId, send]);

  useEffect(() => {
    const online = () => status === "offline" && void send();
    window.addEventListener("online", online);
    return () => window.removeEventListener("online", online);
  }, [send, status]);

  const update = useCallback(
    (change: (d: AssessmentDoc) => AssessmentDoc) => {
      const next = change(latest.current!);
      latest.current = next;
      setDoc(next);
      localStorage.setItem(storageKey(jobId), JSON.stringify({ baseVersion: version.current, doc: next, at: Date.now() }));
      setStatus((s) => (s === "conflict" ? s : "pending"));
      // The document's own reasons come from docIssues in the workspace (from the rendered copy);
      // what the server said about an earlier copy no longer applies.
      setBlocking((b) => (b.length ? NONE : b));
      clearTimeout(timer.current);
      timer.current = setTimeout(() => void send(), SAVE_DELAY_MS);
      return next;
    },
    [jobId, send],
  );

  /** After a conflict: keep this device's edits on top of the newest version, or take the server's. */
  const resolveConflict = useCallback(
    async (keepMine: boolean) => {
      const fresh = await mutate();
      if (!fresh) return;
      version.current = fresh.version;
      if (keepMine) {
        setStatus("pending");
        void send();
      } else {
        localStorage.removeItem(storageKey(jobId));
        latest.current = fresh.doc;
        setDoc(fresh.doc);
        setStatus("saved");
      }
      setMessage(null);
    },
    [jobId, mutate, send],
  );

  return { loaded: data, loadError: error as FetchError | undefined, doc, update, status, message, blocking, resolveConflict, retry: send };
}
