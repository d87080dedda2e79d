"use client";

import { useMemo, useState } from "react";
import { builtInAssemblies, windowsAndDoors } from "@/calc";
import type { AssessmentSurface } from "@/lib/assessment/doc";
import { setAt, useAssessmentCtx } from "./context";
import { ChoiceField, NumField, TextField } from "./fields";

const kinds = [{ value: "wall", label: "Wall" }, { value: "ceiling", label: "Ceiling" }, { value: "floor", label: "Floor" }] as const;
const orientations = ["N", "NE", "E", "SE", "S", "SW", "W", "NW", "horizontal"].map((o) => ({ value: o as AssessmentSurface["orientation"], label: o === "horizontal" ? "Horizontal" : o }));

export function newSurface(kind: AssessmentSurface["kind"] = "wall"): AssessmentSurface {
  const stack = builtInAssemblies.find((a) => a.kind === kind)!;
  return { id: crypto.randomUUID(), name: kind === "wall" ? "New wall" : kind === "ceiling" ? "New ceiling" : "New floor", kind, orientation: kind === "wall" ? "N" : "horizontal", grossAreaFt2: 100, assemblyKey: stack.key, openings: [] };
}

export function SurfacesSection() {
  const { doc, update, readOnly } = useAssessmentCtx();
  const [selected, setSelected] = useState<Set<string>>(new Set());
  const [undo, setUndo] = useState<{ surface: AssessmentSurface; index: number } | null>(null);
  const stacks = useMemo(() => [...doc.assemblies, ...builtInAssemblies.filter((b) => !doc.assemblies.some((a) => a.key === b.key))], [doc.assemblies]);
  const [bulkKey, setBulkKey] = useState("");
  const totals = doc.surfaces.reduce(
    (t, s) => {
      const open = s.openings.reduce((a, o) => a + o.areaFt2 * (o.count ?? 1), 0);
      return { gross: t.gross + s.grossAreaFt2, openings: t.openings + open };
    },
    { gross: 0, openings: 0 },
  );

  const remove = (i: number) => {
    setUndo({ surface: doc.surfaces[i]!, index: i });
    update((d) => ({ ...d, surfaces: d.surfaces.filter((_, j) => j !== i), upgrades: d.upgrades }));
  };
  const duplicate = (i: number) => update((d) => {
    const src = d.surfaces[i]!;
    const copy = { ...structuredClone(src), id: crypto.randomUUID(), name: `${src.name} (copy)`, openings: src.openings.map((o) => ({ ...o, id: crypto.randomUUID() })) };
    return { ...d, surfaces: [...d.surfaces.slice(0, i + 1), copy, ...d.surfaces.slice(i + 1)] };
  });

  return (
    <section aria-labelledby="surfaces-h" className="card space-y-4">
      <div className="flex flex-wrap items-center justify-between gap-3">
        <h2 id="surfaces-h" className="text-xl font-semibold text-spruce-800">Surfaces</h2>
        {!readOnly ? (
          <div className="flex flex-wrap gap-2">
            {kinds.map((k) => (
              <button key={k.value} type="button" className="btn-ghost" onClick={() => update((d) => ({ ...d, surfaces: [...d.surfaces, newSurface(k.value)] }))}>Add {k.label.toLowerCase()}</button>
            ))}
          </div>
        ) : null}
      </div>
      {undo ? (
        <p role="status" className="flex flex-wrap items-center gap-3 rounded-md bg-paper-deep px-3 py-2">
          Deleted “{undo.surface.name}”.
          <button type="button" className="btn-ghost" onClick={() => { update((d) => ({ ...d, surfaces: [...d.surfaces.slice(0, undo.index), undo.surface, ...d.surfaces.slice(undo.index)] })); setUndo(null); }}>Undo</button>
        </p>
      ) : null}
      {!readOnly && selected.size > 0 ? (
        <div className="flex flex-wrap items-end gap-2 rounded-md bg-spruce-50 p-3">
          <div className="min-w-64 flex-1">
            <label htmlFor="bulk-stack" className="field-label">Layer stack for the {selected.size} selected</label>
            <select id="bulk-stack" className="field-input" value={bulkKey} onChange={(e) => setBulkKey(e.target.value)}>
              <option value="">Choose…</option>
              {stacks.map((a) => <option key={a.key} value={a.key}>{a.name}</option>)}
            </select>
          </div>
          <button type="button" className="btn-primary" disabled={!bulkKey} onClick={() => { update((d) => ({ ...d, surfaces: d.surfaces.map((s) => (selected.has(s.id) ? { ...s, assemblyKey: bulkKey } : s)) })); setSelected(new Set()); }}>Apply to selected</button>
        </div>
      ) : null}

      <ol className="space-y-3" data-testid="surface-list">
        {doc.surfaces.map((s, i) => (
          <li key={s.id} className="rounded-lg border border-line p-3" data-testid={`surface-${i}`}>
            <div className="grid gap-3 sm:grid-cols-2 lg:grid-cols-6">
              {!readOnly ? (
                <label className="flex items-center gap-2 self-end pb-3 text-sm lg:col-span-6">
                  <input type="checkbox" className="h-5 w-5" checked={selected.has(s.id)} onChange={(e) => { const next = new Set(selected); if (e.target.checked) next.add(s.id); else next.delete(s.id); setSelected(next); }} />
                  Select “{s.name}” for bulk edit
                </label>
              ) : null}
              <TextField path={`surfaces.${i}.name`} label="Label" className="lg:col-span-2" value={s.name} onValue={(v) => update((d) => setAt(d, ["surfaces", i, "name"], v))} />
              <ChoiceField path={`surfaces.${i}.kind`} label="Kind" value={s.kind} options={kinds} onValue={(v) => update((d) => setAt(d, ["surfaces", i, "kind"], v))} />
              <ChoiceField path={`surfaces.${i}.orientation`} label="Orientation" value={s.orientation} options={orientations} onValue={(v) => update((d) => setAt(d, ["surfaces", i, "orientation"], v))} />
              <NumField path={`surfaces.${i}.grossAreaFt2`} label="Gross area (ft²)" value={s.grossAreaFt2} onValue={(n) => update((d) => setAt(d, ["surfaces", i, "grossAreaFt2"], n ?? Number.NaN))} />
              <ChoiceField path={`surfaces.${i}.assemblyKey`} label="Existing layer stack" className="lg:col-span-3" value={s.assemblyKey} options={stacks.filter((a) => a.kind === s.kind).map((a) => ({ value: a.key, label: a.name }))} onValue={(v) => update((d) => setAt(d, ["surfaces", i, "assemblyKey"], v))} />
              <p className="text-sm text-ink-muted lg:col-span-3 lg:self-center">Proposed: {proposedFor(doc.upgrades, s)}</p>
            </div>
            <Openings index={i} />
            {!readOnly ? (
              <div className="mt-2 flex flex-wrap gap-2">
                <button type="button" className="btn-ghost" onClick={() => duplicate(i)}>Duplicate “{s.name}”</button>
                <button type="button" className="btn-ghost text-danger" onClick={() => remove(i)}>Delete “{s.name}”</button>
              </div>
            ) : null}
          </li>
        ))}
      </ol>
      <p className="rounded-md bg-paper-deep px-3 py-2 font-semibold" data-testid="surface-totals">
        {doc.surfaces.length} surfaces · gross {Math.round(totals.gross).toLocaleString("en-US")} ft² · windows and doors {Math.round(totals.openings).toLocaleString("en-US")} ft² · net {Math.round(totals.gross - totals.openings).toLocaleString("en-US")} ft²
      </p>
    </section>
  );
}

function proposedFor(upgrades: ReturnType<typeof useAssessmentCtx>["doc"]["upgrades"], s: AssessmentSurface) {
  const hits = upgrades.filter((u) =>
    u.type === "dense-pack-walls" ? s.kind === "wall" && (u.surfaceIds === "all-walls" || (Array.isArray(u.surfaceIds) && u.surfaceIds.includes(s.id)))
      : u.type === "attic-insulation" ? s.kind === "ceiling" && (u.surfaceIds === undefined || u.surfaceIds === "all-ceilings" || (Array.isArray(u.surfaceIds) && u.surfaceIds.includes(s.id)))
        : u.type === "windows" ? s.openings.some((o) => o.kind === "window") : false,
  );
  return hits.length ? hits.map((u) => u.name ?? u.type).join(", ") : "no change";
}

function Openings({ index }: { index: number }) {
  const { doc, update, readOnly } = useAssessmentCtx();
  const s = doc.surfaces[index]!;
  if (s.openings.length === 0 && readOnly) return null;
  return (
    <div className="mt-3 space-y-2 border-t border-line pt-3">
      <h3 className="text-sm font-semibold">Windows and doors in “{s.name}”</h3>
      {s.openings.map((o, j) => (
        <div key={o.id ?? j} className="grid gap-3 sm:grid-cols-2 lg:grid-cols-5">
          <ChoiceField path={`surfaces.${index}.openings.${j}.productKey`} label="Type" className="lg:col-span-2" value={o.productKey ?? ""} options={windowsAndDoors.filter((w) => w.kind === o.kind).map((w) => ({ value: w.key, label: `${w.name} (U ${w.uFactorIP})` }))} onValue={(v) => update((d) => setAt(d, ["surfaces", index, "openings", j, "productKey"], v))} />
          <NumField path={`surfaces.${index}.openings.${j}.areaFt2`} label="Area each (ft²)" value={o.areaFt2} onValue={(n) => update((d) => setAt(d, ["surfaces", index, "openings", j, "areaFt2"], n ?? Number.NaN))} />
          <NumField path={`surfaces.${index}.openings.${j}.count`} label="How many" value={o.count ?? 1} onValue={(n) => update((d) => setAt(d, ["surfaces", index, "openings", j, "count"], n ?? Number.NaN))} />
          {!readOnly ? <button type="button" className="btn-ghost self-end" onClick={() => update((d) => setAt(d, ["surfaces", index, "openings"], d.surfaces[index]!.openings.filter((_, k) => k !== j)))}>Remove</button> : null}
        </div>
      ))}
      {!readOnly && s.kind === "wall" ? (
        <div className="flex gap-2">
          <button type="button" className="btn-ghost" onClick={() => update((d) => setAt(d, ["surfaces", index, "openings"], [...s.openings, { id: crypto.randomUUID(), kind: "window", areaFt2: 12, count: 1, productKey: "window-double-nonmetal" }]))}>Add window</button>
          <button type="button" className="btn-ghost" onClick={() => update((d) => setAt(d, ["surfaces", index, "openings"], [...s.openings, { id: crypto.randomUUID(), kind: "door", areaFt2: 20, count: 1, productKey: "door-wood" }]))}>Add door</button>
        </div>
      ) : null}
    </div>
  );
}
