"use client";

import { useCallback, useDeferredValue, useEffect, useMemo } from "react";
import { analyzeHouse, CalcInputError, type AssemblyDef, type HouseAnalysis } from "@/calc";
import type { AssessmentDoc } from "@/lib/assessment/doc";
import { docPath, toHouseInput } from "@/lib/assessment/to-house-input";
import { useAssessment, type Issue } from "@/lib/hooks/use-assessment";
import { useUnitPreference } from "@/lib/hooks/use-preferences";
import { AssessmentProvider, groupIssues } from "./context";
import { HouseSection } from "./house-section";
import { LeakageSection } from "./leakage-section";
import { ResultsPanel } from "./results";
import { SaveStatusBadge } from "./save-status";
import { StacksSection } from "./stacks-section";
import { SurfacesSection } from "./surfaces-section";
import { noteEdit, noteResults } from "./timings";
import { UpgradesSection } from "./upgrades-section";

type Live = { analysis: HouseAnalysis | null; issues: Issue[]; warnings: Issue[] };

/** The same calc code the server runs, on every change, in the browser. */
function analyzeLive(doc: AssessmentDoc): Live {
  const input = toHouseInput(doc);
  try {
    const analysis = analyzeHouse(input);
    return { analysis, issues: [], warnings: analysis.warnings.map((w) => ({ path: docPath(w.path, doc), message: w.message })) };
  } catch (err) {
    if (err instanceof CalcInputError) return { analysis: null, issues: err.issues.map((i) => ({ path: docPath(i.path, doc), message: i.message })), warnings: [] };
    throw err;
  }
}

export function AssessmentWorkspace({ jobId, initialUnits = "ip" }: { jobId: string; initialUnits?: "ip" | "si" }) {
  const a = useAssessment(jobId);
  const { units, setUnits, error: unitsError } = useUnitPreference(initialUnits);
  const deferred = useDeferredValue(a.doc);
  const live = useMemo(() => (deferred ? analyzeLive(deferred) : null), [deferred]);

  const edit = a.update;
  // One function for the whole life of the page, so memoised rows can tell nothing else changed.
  const update = useCallback((change: (d: AssessmentDoc) => AssessmentDoc) => noteEdit(edit(change)), [edit]);

  // Keystroke → results painted (components/assessment/timings.ts), for the browser test and the bench.
  useEffect(() => {
    if (live && deferred) noteResults(deferred);
  }, [live, deferred]);

  if (a.loadError) return <p role="status" className="rounded-md bg-danger-bg px-3 py-2 text-danger">{a.loadError.message}</p>;
  if (!a.doc || !a.loaded || !live) return <p className="text-ink-muted">Loading the assessment…</p>;

  const issues = groupIssues([...a.blocking, ...live.issues]);
  const ctx = {
    doc: a.doc,
    update,
    readOnly: !a.loaded.canEdit,
    pricesVisible: a.loaded.pricesVisible,
    units,
    issues,
    warnings: groupIssues(live.warnings),
    analysis: live.analysis,
  };
  return (
    <AssessmentProvider value={ctx}>
      <div className="mb-4 flex flex-wrap items-center justify-between gap-3">
        {ctx.readOnly ? <p className="rounded-md bg-paper-deep px-3 py-2 text-sm font-semibold">Read-only: your role can view this assessment but not change it.</p> : <SaveStatusBadge status={a.status} message={a.message} onRetry={() => void a.retry()} onResolve={(k) => void a.resolveConflict(k)} />}
        <fieldset className="flex items-center gap-2 text-sm">
          <legend className="sr-only">Units</legend>
          {(["ip", "si"] as const).map((u) => (
            <label key={u} className="flex min-h-11 items-center gap-1">
              <input type="radio" name="units" checked={units === u} onChange={() => void setUnits(u)} />
              {u === "ip" ? "US units (IP)" : "Metric (SI)"}
            </label>
          ))}
          {unitsError ? <span role="alert" className="text-danger">{unitsError}</span> : null}
        </fieldset>
      </div>
      <div className="grid gap-6 lg:grid-cols-[minmax(0,1fr)_28rem]">
        <div className="min-w-0 space-y-6">
          <HouseSection />
          <SurfacesSection />
          <StacksSection companyLibrary={a.loaded.companyLibrary as AssemblyDef[]} />
          <LeakageSection />
          <UpgradesSection />
        </div>
        <aside aria-label="Results" className="min-w-0 lg:sticky lg:top-4 lg:max-h-[calc(100vh-2rem)] lg:self-start lg:overflow-y-auto" data-testid="results">
          <ResultsPanel analysis={live.analysis} units={units} error={live.issues.length ? live.issues : undefined} />
        </aside>
      </div>
    </AssessmentProvider>
  );
}
