"use client";

import { memo, useCallback, useEffect, useMemo, useState } from "react";
import useSWR from "swr";
import { analyzeHouse, CalcInputError, type AssemblyDef, type HouseAnalysis } from "@/calc";
import type { AssessmentDoc } from "@/lib/assessment/doc";
import { priceDoc, twoPass } from "@/lib/assessment/pricing";
import { docPath, toHouseInput } from "@/lib/assessment/to-house-input";
import type { JobPricing } from "@/lib/documents/proposal-lines";
import { fetcher } from "@/lib/hooks/fetcher";
import { docIssues, useAssessment, type Issue } from "@/lib/hooks/use-assessment";
import { priceBookKey, type PriceBookResponse } from "@/lib/hooks/use-price-book";
import { useUnitPreference } from "@/lib/hooks/use-preferences";
import { AssessmentProvider, groupIssues, issueSignature, SectionGate, type AssessmentCtx } from "./context";
import { HouseSection } from "./house-section";
import { LeakageSection } from "./leakage-section";
import { ResultsPanel as Panel } from "./results";
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

// Each section re-renders only when its props change (the workspace re-renders on every keystroke).
const Results = memo(Panel);
const House = memo(HouseSection);
const Surfaces = memo(SurfacesSection);
const Stacks = memo(StacksSection);
const Leakage = memo(LeakageSection);
const Upgrades = memo(UpgradesSection);

/** The parts of the document, messages and figures each section shows: it re-renders when one of them changes. */
function sectionDeps(ctx: AssessmentCtx) {
  const d = ctx.doc;
  return {
    house: [d.house, d.heating, issueSignature(ctx, ["house", "heating"])],
    surfaces: [d.surfaces, d.assemblies, d.upgrades, ctx.analysis, issueSignature(ctx, ["surfaces"])],
    stacks: [d.assemblies, issueSignature(ctx, ["assemblies"])],
    leakage: [d.leakage, d.house.volumeFt3, issueSignature(ctx, ["leakage"])],
    // Of the surfaces, the upgrades list only the walls' names (to pick which to dense-pack).
    upgrades: [d.upgrades, d.surfaces.filter((s) => s.kind === "wall").map((s) => `${s.id}\u0000${s.name}`).join("\u0001"), ctx.pricing, issueSignature(ctx, ["upgrades"])],
  };
}

const EMPTY: Issue[] = [];
/** The last analysis that worked is of the same list of upgrades as the document. */
const sameUpgrades = (a: { upgrades: readonly { type?: string; upgradeId?: string }[] }, d: AssessmentDoc) =>
  a.upgrades.length === d.upgrades.length && a.upgrades.every((u, i) => (u.type === undefined || u.type === d.upgrades[i]!.type) && (u.upgradeId === undefined || u.upgradeId === d.upgrades[i]!.id));

export function AssessmentWorkspace({ jobId, initialUnits = "ip" }: { jobId: string; initialUnits?: "ip" | "si" }) {
  const a = useAssessment(jobId);
  const { units, setUnits, error: unitsError } = useUnitPreference(initialUnits);
  // The analysis, prices and reasons are worked out with each edit (a few ms), so the fields, the
  // per-surface figures and the results panel never trail the document.
  const pricesVisible = a.loaded?.pricesVisible ?? false;
  const { data: book } = useSWR<PriceBookResponse>(pricesVisible ? priceBookKey : null, fetcher, { keepPreviousData: true });
  const items = useMemo(() => book?.items.filter((i) => i.active) ?? null, [book]);
  // Both pricing passes (lib/assessment/pricing.ts) in one place: analyse, price, analyse again
  // with the costs when they differ; the results panel shows the second.
  const live = useMemo(() => {
    if (!a.doc) return null;
    if (!items) return { ...analyzeLive(a.doc), pricing: null as JobPricing | null };
    const r = twoPass(a.doc, items, analyzeLive);
    return { ...r.result, pricing: r.pricing };
  }, [a.doc, items]);
  // While the input has an error, the lines are priced from the last analysis that worked, so they stay on screen to be fixed.
  const [lastGood, setLastGood] = useState<HouseAnalysis | null>(null);
  if (live?.analysis && live.analysis !== lastGood) setLastGood(live.analysis);
  const pricing = useMemo(
    () => live?.pricing ?? (items && a.doc && lastGood && sameUpgrades(lastGood, a.doc) ? priceDoc(a.doc, lastGood, items) : null),
    [live, items, a.doc, lastGood],
  );
  const local = useMemo(() => (a.doc ? docIssues(a.doc) : EMPTY), [a.doc]);

  const edit = a.update;
  // One function for the whole life of the page, so memoised rows can tell nothing else changed.
  const update = useCallback((change: (d: AssessmentDoc) => AssessmentDoc) => noteEdit(edit(change)), [edit]);

  // The results panel renders in the same pass as the edited field: one render, one commit and
  // one frame a keystroke. (Drawn deferred, it took a second render and two more frames, one for
  // its text and one for the chart, which recharts updates from its effects.)
  const shown = useMemo(() => (live && a.doc ? { live, doc: a.doc } : null), [live, a.doc]);
  // Keystroke → results painted (components/assessment/timings.ts), for the browser test and the bench.
  useEffect(() => {
    if (shown) noteResults(shown.doc);
  }, [shown]);

  const readOnly = !a.loaded?.canEdit;
  const issues = useMemo(() => groupIssues([...local, ...a.blocking, ...(live?.issues ?? EMPTY)]), [local, a.blocking, live]);
  const warnings = useMemo(() => groupIssues(live?.warnings ?? EMPTY), [live]);
  const doc = a.doc;
  const ctx = useMemo<AssessmentCtx | null>(
    () => (doc ? { doc, update, readOnly, pricesVisible, units, issues, warnings, analysis: live?.analysis ?? null, pricing } : null),
    [doc, update, readOnly, pricesVisible, units, issues, warnings, live, pricing],
  );
  const deps = useMemo(() => (ctx ? sectionDeps(ctx) : null), [ctx]);
  const resultIssues = shown?.live.issues.length ? shown.live.issues : undefined;

  if (a.loadError) return <p role="status" className="rounded-md bg-danger-bg px-3 py-2 text-danger">{a.loadError.message}</p>;
  if (!a.doc || !a.loaded || !live || !shown || !ctx || !deps) return <p className="text-ink-muted">Loading the assessment…</p>;

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
        {/* The house, stacks, leakage and upgrades cards are each their own paint layer (`isolate`), so a
            keystroke repaints the card it changed, not the page around it. The surfaces card is not: its
            undo bar is fixed to the window and must stay above the cards after it. */}
        <div className="min-w-0 space-y-6">
          <SectionGate ctx={ctx} deps={deps.house}><House /></SectionGate>
          <SectionGate ctx={ctx} deps={deps.surfaces}><Surfaces /></SectionGate>
          <SectionGate ctx={ctx} deps={[...deps.stacks, a.loaded.companyLibrary]}><Stacks companyLibrary={a.loaded.companyLibrary as AssemblyDef[]} /></SectionGate>
          <SectionGate ctx={ctx} deps={deps.leakage}><Leakage /></SectionGate>
          <SectionGate ctx={ctx} deps={deps.upgrades}><Upgrades /></SectionGate>
        </div>
        <aside aria-label="Results" className="min-w-0 lg:sticky lg:top-4 lg:max-h-[calc(100vh-2rem)] lg:self-start lg:overflow-y-auto" data-testid="results">
          <Results analysis={shown.live.analysis} units={units} error={resultIssues} />
        </aside>
      </div>
    </AssessmentProvider>
  );
}
