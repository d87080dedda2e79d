"use client";

import type { RowSelectionState } from "@tanstack/react-table";
import { useCallback, useEffect, useMemo, useState } from "react";
import { useAssessmentCtx } from "./context";
import { ChoiceField } from "./fields";
import {
  bulkSetAssembly,
  duplicateSurfaceAt,
  figuresById,
  newSurface,
  proposalOptions,
  removeSurfaceAt,
  restoreSurface,
  setProposed,
  stacksOf,
  surfaceTotals,
  upgradeLabel,
  upgradesCoveringNothing,
  type Deleted,
  type SurfaceKind,
} from "./surface-edits";
import { AreaField, ExistingStackField, KindField, kinds, LabelField, OpeningsEditor, OrientationField, ProposedField, SurfaceFiguresText } from "./surface-fields";
import { SurfacesTable, type RowActions } from "./surfaces-table";
import * as f from "./results/format";
import { useMediaQuery } from "./use-media-query";

export { newSurface } from "./surface-edits";

/**
 * Walls, ceilings and floors: an editable table from 640 px up, a list of cards on a phone.
 * Both draw the same field components, so every reason lands beside its field either way.
 */
export function SurfacesSection() {
  const { doc, update, readOnly, analysis, units } = useAssessmentCtx();
  const wide = useMediaQuery("(min-width: 640px)");
  const [selection, setSelection] = useState<RowSelectionState>({});
  const [deleted, setDeleted] = useState<Deleted | null>(null);
  const [focusPath, setFocusPath] = useState<string | null>(null);

  // Move focus where the keyboard user expects it once the document has re-rendered.
  useEffect(() => {
    if (!focusPath) return;
    const el = document.querySelector<HTMLElement>(focusPath === "undo" ? "[data-undo-surface]" : `[data-path="${focusPath}"]`);
    el?.focus();
    // eslint-disable-next-line react-hooks/set-state-in-effect -- a one-shot request, cleared once served
    setFocusPath(null);
  }, [focusPath, doc.surfaces.length]);

  const figures = useMemo(() => (analysis ? figuresById(analysis.baseline.envelope, analysis.final.envelope) : null), [analysis]);
  const totals = surfaceTotals(doc, figures);
  const ids = new Set(doc.surfaces.map((s) => s.id));
  const selectedIds = Object.keys(selection).filter((id) => selection[id] && ids.has(id));

  const actions = useMemo<RowActions>(
    () => ({
      duplicate: (i) => {
        update((d) => duplicateSurfaceAt(d, i).doc);
        setFocusPath(`surfaces.${i + 1}.name`);
      },
      remove: (i) => {
        update((d) => {
          const r = removeSurfaceAt(d, i);
          setDeleted(r.deleted);
          return r.doc;
        });
        setFocusPath("undo");
      },
    }),
    [update],
  );
  const undo = useCallback(() => {
    if (!deleted) return;
    update((d) => restoreSurface(d, deleted));
    setFocusPath(`surfaces.${deleted.index}.name`);
    setDeleted(null);
  }, [deleted, update]);
  const add = (kind: SurfaceKind) => {
    update((d) => ({ ...d, surfaces: [...d.surfaces, newSurface(kind)] }));
    setFocusPath(`surfaces.${doc.surfaces.length}.name`);
  };
  const empty = upgradesCoveringNothing(doc);

  return (
    <section aria-labelledby="surfaces-h" className="card space-y-4">
      <div className="flex flex-wrap items-center justify-between gap-3">
        <h2 id="surfaces-h" className="text-xl font-semibold text-spruce-800">Surfaces</h2>
        {!readOnly ? (
          <div className="flex flex-wrap gap-2">
            {kinds.map((k) => (
              <button key={k.value} type="button" className="btn-ghost" onClick={() => add(k.value)}>Add {k.label.toLowerCase()}</button>
            ))}
          </div>
        ) : null}
      </div>
      {!readOnly && selectedIds.length > 0 ? <BulkBar ids={selectedIds} onDone={() => setSelection({})} /> : null}
      {empty.length ? (
        <p role="status" className="rounded-md bg-warn-bg px-3 py-2 text-sm text-warn" data-testid="upgrades-covering-nothing">
          {empty.map((u) => `“${upgradeLabel(u)}”`).join(", ")} now cover{empty.length === 1 ? "s" : ""} no surface: choose it as a surface’s proposed layer stack, or remove it under Upgrades.
        </p>
      ) : null}

      {wide ? (
        <SurfacesTable selection={selection} onSelection={setSelection} figures={figures} totals={totals} actions={actions} />
      ) : (
        <>
          <ol className="space-y-3" data-testid="surface-list">
            {doc.surfaces.map((s, i) => (
              <li key={s.id} className={`rounded-lg border p-3 ${selection[s.id] ? "border-spruce-600 bg-spruce-50" : "border-line"}`} data-testid={`surface-${i}`} data-surface-id={s.id}>
                <div className="grid gap-3">
                  {!readOnly ? (
                    <label className="flex min-h-11 items-center gap-2 text-sm">
                      <input type="checkbox" className="h-5 w-5" checked={Boolean(selection[s.id])} onChange={(e) => setSelection((sel) => ({ ...sel, [s.id]: e.target.checked }))} />
                      Select “{s.name}” for bulk edit
                    </label>
                  ) : null}
                  <LabelField i={i} />
                  <div className="grid grid-cols-2 gap-3">
                    <KindField i={i} />
                    <OrientationField i={i} />
                  </div>
                  <AreaField i={i} />
                  <ExistingStackField i={i} />
                  <ProposedField i={i} />
                  <SurfaceFiguresText figures={figures?.get(s.id)} />
                </div>
                <div className="mt-3 border-t border-line pt-3">
                  <OpeningsEditor index={i} />
                </div>
                {!readOnly ? (
                  <div className="mt-3 flex flex-wrap gap-2">
                    <button type="button" className="btn-ghost" onClick={() => actions.duplicate(i)}>Duplicate “{s.name}”</button>
                    <button type="button" className="btn-ghost text-danger" onClick={() => actions.remove(i)}>Delete “{s.name}”</button>
                  </div>
                ) : null}
              </li>
            ))}
          </ol>
          <p className="rounded-md bg-paper-deep px-3 py-2 font-semibold" data-testid="surface-totals">
            {totals.count} surfaces · gross {f.num(totals.gross)} ft² · windows and doors {f.num(totals.openings)} ft² · net {f.num(totals.net)} ft²
            {totals.ua ? <span className="block font-normal" data-testid="surface-totals-ua">UA {f.ua(totals.ua.before, units)} before, {f.ua(totals.ua.after, units)} after the upgrades</span> : null}
          </p>
        </>
      )}

      {deleted ? (
        <div role="status" className="fixed inset-x-3 bottom-4 z-40 mx-auto flex max-w-lg flex-wrap items-center gap-3 rounded-lg bg-charcoal px-4 py-3 text-white shadow-lg" data-testid="surface-undo">
          <span className="min-w-0 flex-1">Deleted “{deleted.surface.name}”.</span>
          <button type="button" data-undo-surface className="btn min-h-11 bg-white px-4 text-charcoal hover:bg-paper-deep" onClick={undo}>Undo</button>
          <button type="button" className="btn min-h-11 px-3 text-white underline" onClick={() => setDeleted(null)}>Dismiss</button>
        </div>
      ) : null}
    </section>
  );
}

/** Set the existing layer stack, or the proposed one, on every selected surface of the matching kind. */
function BulkBar({ ids, onDone }: { ids: string[]; onDone: () => void }) {
  const { doc, update } = useAssessmentCtx();
  const [stackKey, setStackKey] = useState("");
  const [proposal, setProposal] = useState("");
  const [said, setSaid] = useState<string | null>(null);
  const stacks = stacksOf(doc);
  const chosen = doc.surfaces.filter((s) => ids.includes(s.id));
  const kindsChosen = [...new Set(chosen.map((s) => s.kind))];
  const proposals = kindsChosen.flatMap((k) => proposalOptions(doc, k));
  const plural = (n: number, word: string) => `${n} ${word}${n === 1 ? "" : "s"}`;
  return (
    <div className="space-y-2 rounded-md bg-spruce-50 p-3" data-testid="surface-bulk">
      <p className="text-sm font-semibold">{plural(ids.length, "surface")} selected</p>
      <div className="flex flex-wrap items-end gap-2">
        <div className="min-w-56 flex-1">
          <label htmlFor="bulk-stack" className="field-label">Existing layer stack for the selected</label>
          <select id="bulk-stack" className="field-input" value={stackKey} onChange={(e) => setStackKey(e.target.value)}>
            <option value="">Choose…</option>
            {kinds.filter((k) => kindsChosen.includes(k.value)).map((k) => (
              <optgroup key={k.value} label={`${k.label}s`}>
                {stacks.filter((a) => a.kind === k.value).map((a) => <option key={a.key} value={a.key}>{a.name}</option>)}
              </optgroup>
            ))}
          </select>
        </div>
        <button
          type="button"
          className="btn-primary"
          disabled={!stackKey}
          onClick={() => {
            // From the newest document (the one drawn here can trail a keystroke behind).
            let r = bulkSetAssembly(doc, ids, stackKey);
            update((d) => (r = bulkSetAssembly(d, ids, stackKey)).doc);
            setSaid(`Existing layer stack set on ${plural(r.applied, "surface")}${r.skipped ? `; ${plural(r.skipped, "surface")} of another kind left as they were` : ""}.`);
            setStackKey("");
          }}
        >
          Set existing
        </button>
      </div>
      <div className="flex flex-wrap items-end gap-2">
        <ChoiceField
          path="bulk.proposed"
          label="Proposed for the selected"
          className="min-w-56 flex-1"
          value={proposal}
          options={[{ value: "none", label: "No change" }, ...proposals]}
          onValue={(v) => setProposal(v)}
        />
        <button
          type="button"
          className="btn-primary mb-1"
          disabled={!proposal}
          onClick={() => {
            update((d) => setProposed(d, ids, proposal === "none" ? null : proposal));
            setSaid(proposal === "none" ? `No upgrade proposed for ${plural(ids.length, "surface")}.` : `Proposed on the selected surfaces it applies to.`);
            setProposal("");
          }}
        >
          Set proposed
        </button>
      </div>
      <div className="flex flex-wrap items-center gap-3">
        <button type="button" className="btn-ghost" onClick={onDone}>Clear selection</button>
        <p aria-live="polite" className="text-sm">{said}</p>
      </div>
    </div>
  );
}
