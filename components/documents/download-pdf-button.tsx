"use client";

import { useId, useState, useSyncExternalStore } from "react";

type State =
  | { phase: "idle" }
  | { phase: "preparing" }
  | { phase: "receiving"; received: number; total: number | null }
  | { phase: "saved"; fileName: string }
  | { phase: "error"; message: string };

const noSubscribe = () => () => {};

/** The name from Content-Disposition (attachment; filename="…"), else the fallback. */
function fileNameOf(res: Response, fallback: string) {
  const m = /filename="([^"]+)"/.exec(res.headers.get("content-disposition") ?? "");
  return m?.[1] ?? fallback;
}

async function errorText(res: Response) {
  const body = (await res.json().catch(() => ({}))) as { error?: string };
  if (res.status === 401) return "Your session has ended. Sign in again, then download the PDF.";
  if (res.status === 404) return "This document is not available to you (or no longer exists).";
  return body.error ?? `The server could not make the PDF (error ${res.status}). Try again in a moment.`;
}

/** Saves bytes under a name through a temporary object URL. */
function save(blob: Blob, fileName: string) {
  const url = URL.createObjectURL(blob);
  const a = document.createElement("a");
  a.href = url;
  a.download = fileName;
  a.rel = "noopener";
  document.body.appendChild(a);
  a.click();
  a.remove();
  setTimeout(() => URL.revokeObjectURL(url), 10_000);
}

/**
 * "Download PDF" with progress: "Preparing the PDF…" while the server renders, then the share of
 * bytes received (from Content-Length), then the file is saved. Before the script runs (or without
 * it) this is a plain link to the same route, which downloads the file the ordinary way.
 */
export function DownloadPdfButton({ href, fileName, label = "Download PDF", compact = false }: { href: string; fileName: string; label?: string; compact?: boolean }) {
  // false while the server renders and until hydration: the plain link stays in place till then
  const ready = useSyncExternalStore(noSubscribe, () => true, () => false);
  const [state, setState] = useState<State>({ phase: "idle" });
  const statusId = useId();

  const busy = state.phase === "preparing" || state.phase === "receiving";
  const linkClass = compact ? "text-spruce-700 underline" : "font-semibold text-spruce-700 underline";

  if (!ready) {
    return <a className={linkClass} href={href} download={fileName}>{label}</a>;
  }

  async function download() {
    setState({ phase: "preparing" });
    try {
      const res = await fetch(href, { headers: { accept: "application/pdf" } });
      if (!res.ok) return setState({ phase: "error", message: await errorText(res) });
      // Content-Length when it reaches us; `next start` drops it from route handlers, so the route also sends X-Content-Length
      const length = Number(res.headers.get("content-length") ?? res.headers.get("x-content-length"));
      const total = Number.isFinite(length) && length > 0 ? length : null;
      const name = fileNameOf(res, fileName);
      let blob: Blob;
      if (res.body) {
        const reader = res.body.getReader();
        const chunks: Uint8Array<ArrayBuffer>[] = [];
        let received = 0;
        setState({ phase: "receiving", received, total });
        for (;;) {
          const { done, value } = await reader.read();
          if (done) break;
          chunks.push(value);
          received += value.byteLength;
          setState({ phase: "receiving", received, total });
        }
        blob = new Blob(chunks, { type: "application/pdf" });
      } else {
        blob = await res.blob();
      }
      save(blob, name);
      setState({ phase: "saved", fileName: name });
    } catch {
      setState({ phase: "error", message: "The download was interrupted: check your connection and try again." });
    }
  }

  const status =
    state.phase === "preparing" ? "Preparing the PDF…"
    : state.phase === "receiving" ? (state.total ? `Downloading… ${Math.min(100, Math.round((state.received / state.total) * 100))} %` : `Downloading… ${Math.round(state.received / 1024)} KB`)
    : state.phase === "saved" ? `Saved ${state.fileName}.`
    : state.phase === "error" ? state.message
    : "";

  return (
    <span className="inline-flex flex-wrap items-center gap-2" data-testid="pdf-download">
      <button
        type="button"
        className={compact ? "min-h-9 rounded-md px-1 text-spruce-700 underline disabled:opacity-60" : "btn-ghost"}
        onClick={() => void download()}
        disabled={busy}
        aria-busy={busy || undefined}
        aria-describedby={status ? statusId : undefined}
      >
        {busy ? (compact ? "PDF…" : "Downloading…") : label}
      </button>
      {state.phase === "receiving" && state.total ? (
        <progress className="h-2 w-24" max={state.total} value={state.received} aria-label="PDF download progress" />
      ) : null}
      <span id={statusId} role="status" aria-live="polite" className={`text-sm ${state.phase === "error" ? "font-medium text-danger" : "text-ink-muted"}`}>{status}</span>
    </span>
  );
}
