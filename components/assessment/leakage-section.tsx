"use client";

import { setAt, useAssessmentCtx } from "./context";
import { ChoiceField, NumField, TextField } from "./fields";

const day = new Intl.DateTimeFormat("en-US", { dateStyle: "medium" });

export function LeakageSection() {
  const { doc, update, readOnly } = useAssessmentCtx();
  const tests = doc.leakage.tests;
  const v = doc.house.volumeFt3;
  return (
    <section aria-labelledby="leak-h" className="card isolate space-y-4">
      <h2 id="leak-h" className="text-xl font-semibold text-spruce-800">Air leakage</h2>
      <ol className="space-y-3">
        {tests.map((t, i) => (
          <li key={t.id} className="rounded-lg border border-line p-3" data-testid={`leakage-${i}`}>
            <p className="mb-2 text-sm text-ink-muted">Blower-door reading, {day.format(t.testedAt)}{Number.isFinite(t.cfm50) && v > 0 ? ` · ACH50 ${((t.cfm50 * 60) / v).toFixed(1)}` : ""}</p>
            <div className="grid gap-3 sm:grid-cols-2 lg:grid-cols-5">
              <ChoiceField path={`leakage.tests.${i}.phase`} label="Phase" value={t.phase} options={[{ value: "test-in", label: "Test-in" }, { value: "test-out", label: "Test-out" }]} onValue={(x) => update((d) => setAt(d, ["leakage", "tests", i, "phase"], x))} />
              <NumField path={`leakage.tests.${i}.cfm50`} label="CFM50" value={t.cfm50} onValue={(n) => update((d) => setAt(d, ["leakage", "tests", i, "cfm50"], n ?? Number.NaN))} />
              <NumField path={`leakage.tests.${i}.outdoorTempF`} label="Outdoor temperature (°F)" value={t.outdoorTempF ?? null} onValue={(n) => update((d) => setAt(d, ["leakage", "tests", i, "outdoorTempF"], n))} />
              <NumField path={`leakage.tests.${i}.windMph`} label="Wind (mph)" value={t.windMph ?? null} onValue={(n) => update((d) => setAt(d, ["leakage", "tests", i, "windMph"], n))} />
              <TextField path={`leakage.tests.${i}.notes`} label="Notes" value={t.notes ?? ""} onValue={(x) => update((d) => setAt(d, ["leakage", "tests", i, "notes"], x))} />
            </div>
            {!readOnly ? <button type="button" className="btn-ghost mt-2 text-danger" onClick={() => update((d) => setAt(d, ["leakage", "tests"], d.leakage.tests.filter((_, j) => j !== i)))}>Delete this reading</button> : null}
          </li>
        ))}
      </ol>
      {!readOnly ? (
        <button type="button" className="btn-ghost" onClick={() => update((d) => setAt(d, ["leakage", "tests"], [...d.leakage.tests, { id: crypto.randomUUID(), phase: d.leakage.tests.some((x) => x.phase === "test-in") ? "test-out" : "test-in", cfm50: Number.NaN, testedAt: Date.now() }]))}>Add a blower-door reading</button>
      ) : null}
      <NumField path="leakage.targetCfm50" label="Target CFM50 for air sealing" hint="Used when an air-sealing upgrade has no target of its own." value={doc.leakage.targetCfm50 ?? null} onValue={(n) => update((d) => setAt(d, ["leakage", "targetCfm50"], n))} />
      <p className="text-sm text-ink-muted">After air sealing, test combustion appliances for draft and spillage (ANSI/BPI-1200) before the crew leaves; follow local codes and licensed practice.</p>
    </section>
  );
}
