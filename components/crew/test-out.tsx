"use client";

import type { TestOutResult } from "@/lib/data/crew-log";
import { useTestOut, type TestOutDraft } from "@/lib/hooks/use-test-out";
import { intText, whenText } from "./format";

type FieldName = Exclude<keyof TestOutDraft, "clientRequestId">;

/**
 * The test-out reading. Record keeps it on the phone first and then sends it; with no connection it
 * waits there, shown as pending, and goes by itself when the phone is back online. Every resend has
 * the same clientRequestId, so a reading whose answer was lost is recorded once.
 */
export function TestOutForm({ jobId, onRecorded }: { jobId: string; onRecorded: () => void }) {
  const t = useTestOut(jobId, onRecorded);
  if (!t.draft) return null;
  const { draft, queued, errors } = t;
  const locked = Boolean(queued);

  const submit = (e: React.FormEvent) => {
    e.preventDefault();
    t.record();
  };

  const field = (name: FieldName, label: string, hint?: string) => (
    <div>
      <label htmlFor={`to-${name}`} className="field-label">{label}</label>
      <input id={`to-${name}`} className="field-input min-h-12 text-lg read-only:bg-paper-deep" inputMode="decimal" value={draft[name]} readOnly={locked} onChange={(e) => t.change({ [name]: e.target.value })} aria-invalid={errors[name] ? true : undefined} aria-describedby={`to-${name}-error`} />
      {hint ? <p className="mt-1 text-sm text-ink-muted">{hint}</p> : null}
      <p id={`to-${name}-error`} aria-live="polite" className="field-error">{errors[name]?.join(" ")}</p>
    </div>
  );

  return (
    <form onSubmit={submit} className="rounded-lg border border-line bg-white p-4 shadow-sm" aria-labelledby="test-out-title" data-testid="test-out-form" noValidate>
      <h2 id="test-out-title" className="text-xl font-bold text-spruce-900">Record test-out</h2>
      <p className="mt-1 text-ink-muted">The blower-door reading after the work. Recording it on an installing job moves the job to Verified.</p>
      <div className="mt-3 grid grid-cols-1 gap-3 sm:grid-cols-3">
        {field("cfm50", "CFM50", "Airflow at 50 Pa, CFM")}
        {field("outdoorTempF", "Outdoor temperature (°F)")}
        {field("windMph", "Wind (mph)")}
      </div>
      <div className="mt-1">
        <label htmlFor="to-notes" className="field-label">Notes (optional)</label>
        <textarea id="to-notes" className="field-input min-h-20 read-only:bg-paper-deep" value={draft.notes} readOnly={locked} onChange={(e) => t.change({ notes: e.target.value })} maxLength={1000} aria-invalid={errors.notes ? true : undefined} aria-describedby="to-notes-error" />
        <p id="to-notes-error" aria-live="polite" className="field-error">{errors.notes?.join(" ")}</p>
      </div>
      {errors.clientRequestId || errors.testedAt ? <p className="field-error">{[...(errors.clientRequestId ?? []), ...(errors.testedAt ?? [])].join(" ")}</p> : null}
      <p className="text-sm text-ink-muted">Where air sealing was done, run combustion-safety tests on the appliances as local codes and licensed practice require.</p>
      {queued ? (
        <div className="mt-3 rounded-md bg-warn-bg px-3 py-2 text-warn" role="status" data-testid="test-out-pending">
          <p className="font-semibold">
            Test-out pending on this phone{t.online ? (t.sending ? " — sending…" : "") : " — offline"}
          </p>
          <p className="mt-1 text-sm">
            {typeof queued.body.cfm50 === "number" ? `${intText(queued.body.cfm50)} CFM50, ` : ""}taken {whenText(queued.queuedAt)}. It is kept here and sent by itself when the connection is back; sending it again never records it twice.
          </p>
          {t.lastError ? <p className="mt-1 text-sm" data-testid="test-out-pending-reason">{t.lastError}</p> : null}
          <button type="button" className="btn-ghost mt-2 min-h-12 w-full" onClick={() => void t.retry()} disabled={t.sending}>Send now</button>
        </div>
      ) : (
        <button type="submit" className="btn-accent mt-3 min-h-14 w-full text-lg" disabled={t.sending}>{t.sending ? "Recording…" : "Record test-out"}</button>
      )}
      {t.message && !queued ? <p role={t.message.kind === "error" ? "alert" : "status"} className={`mt-3 rounded-md px-3 py-2 ${t.message.kind === "error" ? "bg-danger-bg text-danger" : "bg-spruce-50 text-spruce-800"}`}>{t.message.text}</p> : null}
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
