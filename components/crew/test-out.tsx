"use client";

import { useEffect, useState } from "react";
import type { TestOutResult } from "@/lib/data/crew-log";
import { FetchError, sendJson } from "@/lib/hooks/fetcher";
import { intText } from "./format";

type Draft = { cfm50: string; outdoorTempF: string; windMph: string; notes: string; clientRequestId: string };
const key = (jobId: string) => `warmstead:test-out-draft:${jobId}`;
const fresh = (): Draft => ({ cfm50: "", outdoorTempF: "", windMph: "", notes: "", clientRequestId: crypto.randomUUID() });

/**
 * The test-out reading. What is typed stays on the phone until the server accepts it, with the same
 * clientRequestId, so pressing Record again after a lost connection records it once.
 */
export function TestOutForm({ jobId, onRecorded }: { jobId: string; onRecorded: () => void }) {
  const [draft, setDraft] = useState<Draft | null>(null);
  const [errors, setErrors] = useState<Record<string, string[]>>({});
  const [message, setMessage] = useState<{ kind: "ok" | "error"; text: string } | null>(null);
  const [busy, setBusy] = useState(false);
  useEffect(() => {
    let d: Draft | null = null;
    try {
      const raw = localStorage.getItem(key(jobId));
      d = raw ? (JSON.parse(raw) as Draft) : null;
    } catch {
      d = null;
    }
    // eslint-disable-next-line react-hooks/set-state-in-effect
    setDraft(d ?? fresh());
  }, [jobId]);
  if (!draft) return null;
  const change = (patch: Partial<Draft>) => {
    const next = { ...draft, ...patch };
    setDraft(next);
    try {
      localStorage.setItem(key(jobId), JSON.stringify(next));
    } catch {
      // storage blocked: kept in memory
    }
  };
  const numOrText = (s: string) => (s.trim() === "" ? undefined : Number.isFinite(Number(s)) ? Number(s) : s);

  const submit = async (e: React.FormEvent) => {
    e.preventDefault();
    setBusy(true);
    setMessage(null);
    try {
      const r = await sendJson<{ movedToVerified: boolean; replayed: boolean }>(`/api/jobs/${jobId}/test-out`, "POST", {
        clientRequestId: draft.clientRequestId, cfm50: numOrText(draft.cfm50), outdoorTempF: numOrText(draft.outdoorTempF), windMph: numOrText(draft.windMph), notes: draft.notes.trim() || undefined,
      });
      setErrors({});
      localStorage.removeItem(key(jobId));
      setDraft(fresh());
      setMessage({ kind: "ok", text: r.movedToVerified ? "Test-out recorded. The job is now Verified." : "Test-out recorded." });
      onRecorded();
    } catch (err) {
      if (err instanceof FetchError && err.status === 422) {
        setErrors((err.body.fields as Record<string, string[]>) ?? {});
        setMessage({ kind: "error", text: "Check the fields marked below." });
      } else if (err instanceof FetchError && err.status < 500) {
        setMessage({ kind: "error", text: err.message });
      } else {
        setMessage({ kind: "error", text: "Not sent: no connection or the server did not answer. The reading is kept on this phone; press Record test-out again." });
      }
    } finally {
      setBusy(false);
    }
  };

  const field = (name: keyof Draft, label: string, mode: "decimal" | "text", hint?: string) => (
    <div>
      <label htmlFor={`to-${name}`} className="field-label">{label}</label>
      <input id={`to-${name}`} className="field-input min-h-12 text-lg" inputMode={mode === "decimal" ? "decimal" : undefined} value={draft[name]} onChange={(e) => change({ [name]: e.target.value })} aria-invalid={errors[name] ? true : undefined} aria-describedby={`to-${name}-error`} />
      {hint ? <p className="mt-1 text-sm text-ink-muted">{hint}</p> : null}
      <p id={`to-${name}-error`} aria-live="polite" className="field-error">{errors[name]?.join(" ")}</p>
    </div>
  );

  return (
    <form onSubmit={submit} className="rounded-lg border border-line bg-white p-4 shadow-sm" aria-labelledby="test-out-title" data-testid="test-out-form" noValidate>
      <h2 id="test-out-title" className="text-xl font-bold text-spruce-900">Record test-out</h2>
      <p className="mt-1 text-ink-muted">The blower-door reading after the work. Recording it on an installing job moves the job to Verified.</p>
      <div className="mt-3 grid grid-cols-1 gap-3 sm:grid-cols-3">
        {field("cfm50", "CFM50", "decimal", "Airflow at 50 Pa, CFM")}
        {field("outdoorTempF", "Outdoor temperature (°F)", "decimal")}
        {field("windMph", "Wind (mph)", "decimal")}
      </div>
      <div className="mt-1">
        <label htmlFor="to-notes" className="field-label">Notes (optional)</label>
        <textarea id="to-notes" className="field-input min-h-20" value={draft.notes} onChange={(e) => change({ notes: e.target.value })} maxLength={1000} />
        <p className="field-error">{errors.notes?.join(" ")}</p>
      </div>
      <p className="text-sm text-ink-muted">Where air sealing was done, run combustion-safety tests on the appliances as local codes and licensed practice require.</p>
      <button type="submit" className="btn-accent mt-3 min-h-14 w-full text-lg" disabled={busy}>{busy ? "Recording…" : "Record test-out"}</button>
      {message ? <p role={message.kind === "error" ? "alert" : "status"} className={`mt-3 rounded-md px-3 py-2 ${message.kind === "error" ? "bg-danger-bg text-danger" : "bg-spruce-50 text-spruce-800"}`}>{message.text}</p> : null}
    </form>
  );
}

const money = (n: number) => n.toLocaleString("en-US", { style: "currency", currency: "USD", maximumFractionDigits: 0 });

/** Predicted against measured leakage, and the savings recomputed with the measured reading. */
export function TestOutResultPanel({ result }: { result: TestOutResult }) {
  if (result.measuredCfm50 === null) return null;
  const s = result.savings;
  return (
    <section className="rounded-lg border border-line bg-white p-4 shadow-sm" aria-labelledby="measured-title" data-testid="test-out-result">
      <h2 id="measured-title" className="text-xl font-bold text-spruce-900">Measured result</h2>
      <dl className="mt-3 grid grid-cols-3 gap-2 text-center">
        <div className="rounded-md bg-paper-deep p-2"><dt className="text-sm text-ink-muted">Test-in</dt><dd className="text-2xl font-bold tabular-nums">{result.testInCfm50 !== null ? intText(result.testInCfm50) : "—"}</dd></div>
        <div className="rounded-md bg-paper-deep p-2"><dt className="text-sm text-ink-muted">Predicted</dt><dd className="text-2xl font-bold tabular-nums">{result.predictedCfm50 !== null ? intText(result.predictedCfm50) : "—"}</dd></div>
        <div className="rounded-md bg-spruce-700 p-2 text-white"><dt className="text-sm">Measured</dt><dd className="text-2xl font-bold tabular-nums" data-testid="measured-cfm50">{intText(result.measuredCfm50)}</dd></div>
      </dl>
      <p className="mt-1 text-center text-sm text-ink-muted">CFM50</p>
      {result.measuredReductionPct !== null ? <p className="mt-2 text-lg">Leakage cut by <strong>{result.measuredReductionPct.toFixed(0)} %</strong> from test-in.</p> : null}
      {s.predicted && s.measured ? (
        <table className="mt-3 w-full text-left text-sm">
          <thead><tr className="border-b border-line"><th className="py-1">Yearly saving</th><th className="py-1 text-right">Predicted</th><th className="py-1 text-right">With measured leakage</th></tr></thead>
          <tbody>
            <tr className="border-b border-line"><td className="py-1">Fuel ({s.measured.fuelUnit})</td><td className="py-1 text-right tabular-nums">{intText(s.predicted.fuelUnits)}</td><td className="py-1 text-right font-semibold tabular-nums">{intText(s.measured.fuelUnits)}</td></tr>
            <tr className="border-b border-line"><td className="py-1">Energy (MMBtu)</td><td className="py-1 text-right tabular-nums">{s.predicted.mmbtu.toFixed(1)}</td><td className="py-1 text-right font-semibold tabular-nums">{s.measured.mmbtu.toFixed(1)}</td></tr>
            {s.predicted.usd !== undefined && s.measured.usd !== undefined ? (
              <tr><td className="py-1">Cost</td><td className="py-1 text-right tabular-nums">{money(s.predicted.usd)}</td><td className="py-1 text-right font-semibold tabular-nums">{money(s.measured.usd)}</td></tr>
            ) : null}
          </tbody>
        </table>
      ) : null}
      <p className="mt-2 text-sm text-ink-muted">
        {result.usesMeasuredLeakage ? "The savings use the measured test-out in place of the air-sealing target." : "No air-sealing upgrade on this job, so the measured reading does not change the savings."}
      </p>
    </section>
  );
}
