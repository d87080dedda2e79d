"use client";

// The editing pieces of one surface, drawn as table cells on a desktop (compact: the column header
// names the field, the label is for screen readers) and as a card on a phone. Same code, same paths.
import { windowsAndDoors } from "@/calc";
import type { AssessmentSurface } from "@/lib/assessment/doc";
import { setAt, useAssessmentCtx } from "./context";
import { ChoiceField, NumField, TextField } from "./fields";
import { formatU, U_UNIT } from "./layer-stack/format";
import * as f from "./results/format";
import { openingsOf, proposalOptions, proposedUpgradeId, setKindAt, setProposed, stacksOf, upgradeLabel, windowsUpgradeFor, type SurfaceFigures } from "./surface-edits";

export const kinds = [{ value: "wall", label: "Wall" }, { value: "ceiling", label: "Ceiling" }, { value: "floor", label: "Floor" }] as const;
export const orientations = ["N", "NE", "E", "SE", "S", "SW", "W", "NW", "horizontal"].map((o) => ({ value: o as AssessmentSurface["orientation"], label: o === "horizontal" ? "Horizontal" : o }));

type P = { i: number; compact?: boolean; className?: string };

export function LabelField({ i, compact, className }: P) {
  const { doc, update } = useAssessmentCtx();
  return <TextField path={`surfaces.${i}.name`} label="Label" compact={compact} className={className} value={doc.surfaces[i]!.name} onValue={(v) => update((d) => setAt(d, ["surfaces", i, "name"], v))} />;
}

export function KindField({ i, compact, className }: P) {
  const { doc, update } = useAssessmentCtx();
  return <ChoiceField path={`surfaces.${i}.kind`} label="Kind" compact={compact} className={className} value={doc.surfaces[i]!.kind} options={kinds} onValue={(v) => update((d) => setKindAt(d, i, v))} />;
}

export function OrientationField({ i, compact, className }: P) {
  const { doc, update } = useAssessmentCtx();
  const s = doc.surfaces[i]!;
  // A ceiling or floor faces "horizontal"; walls pick a compass direction.
  const options = s.kind === "wall" ? orientations.filter((o) => o.value !== "horizontal" || s.orientation === "horizontal") : orientations.filter((o) => o.value === "horizontal" || o.value === s.orientation);
  return <ChoiceField path={`surfaces.${i}.orientation`} label="Orientation" compact={compact} className={className} value={s.orientation} options={options} onValue={(v) => update((d) => setAt(d, ["surfaces", i, "orientation"], v))} />;
}

export function AreaField({ i, compact, className }: P) {
  const { doc, update } = useAssessmentCtx();
  return <NumField path={`surfaces.${i}.grossAreaFt2`} label="Gross area (ft²)" compact={compact} className={className} value={doc.surfaces[i]!.grossAreaFt2} onValue={(n) => update((d) => setAt(d, ["surfaces", i, "grossAreaFt2"], n ?? Number.NaN))} />;
}

export function ExistingStackField({ i, compact, className }: P) {
  const { doc, update } = useAssessmentCtx();
  const s = doc.surfaces[i]!;
  const options = stacksOf(doc).filter((a) => a.kind === s.kind).map((a) => ({ value: a.key, label: a.name }));
  return <ChoiceField path={`surfaces.${i}.assemblyKey`} label="Existing layer stack" compact={compact} className={className} value={s.assemblyKey} options={options} onValue={(v) => update((d) => setAt(d, ["surfaces", i, "assemblyKey"], v))} />;
}

/** The proposed layer stack is the upgrade that covers the surface; choosing one edits that upgrade's list. */
export function ProposedField({ i, compact, className }: P) {
  const { doc, update } = useAssessmentCtx();
  const s = doc.surfaces[i]!;
  const options = proposalOptions(doc, s.kind);
  const windows = windowsUpgradeFor(doc, s);
  const note = windows ? <p className="mt-1 text-xs text-ink-muted">Windows: {upgradeLabel(windows)}{windows.type === "windows" ? ` (U ${windows.uFactorIP})` : ""}</p> : null;
  if (options.length === 0) {
    return (
      <div className={className}>
        {compact ? null : <p className="field-label">Proposed layer stack</p>}
        <p className="py-2 text-sm text-ink-muted">No change{s.kind === "floor" ? "" : ` (no ${s.kind === "wall" ? "dense-pack" : "attic"} upgrade yet)`}</p>
        {note}
      </div>
    );
  }
  return (
    <div className={className}>
      <ChoiceField
        path={`surfaces.${i}.proposed`}
        label="Proposed layer stack"
        compact={compact}
        value={proposedUpgradeId(doc, s) || "none"}
        options={[{ value: "none", label: "No change" }, ...options]}
        onValue={(v) => update((d) => setProposed(d, [d.surfaces[i]!.id], v === "none" ? null : v))}
      />
      {note}
    </div>
  );
}

/** U and UA before → after the upgrades, from the live analysis ("—" while it has errors). */
export function SurfaceFiguresText({ figures, compact }: { figures: SurfaceFigures | undefined; compact?: boolean }) {
  const { units } = useAssessmentCtx();
  if (!figures) return <span className="text-ink-muted">—</span>;
  const changed = Math.abs(figures.uaAfter - figures.uaBefore) > 1e-9;
  const u = `${formatU(figures.uBefore, units)}${changed ? ` → ${formatU(figures.uAfter, units)}` : ""}`;
  const ua = `${f.num(f.uaValue(figures.uaBefore, units), 1)}${changed ? ` → ${f.num(f.uaValue(figures.uaAfter, units), 1)}` : ""}`;
  if (compact) {
    return (
      <span className="block whitespace-nowrap tabular-nums" data-testid="surface-figures">
        <span className="block">U {u}</span>
        <span className="block text-ink-muted">UA {ua}</span>
      </span>
    );
  }
  return (
    <p className="text-sm tabular-nums" data-testid="surface-figures">
      U {u} {U_UNIT[units]} · UA {ua} {f.uaUnit(units)}
    </p>
  );
}

export function openingsSummary(s: AssessmentSurface) {
  const o = openingsOf(s);
  return o.count === 0 ? "none" : `${o.count} · ${f.num(o.areaFt2)} ft²`;
}

/** Windows and doors in one surface. */
export function OpeningsEditor({ index, compact }: { index: number; compact?: boolean }) {
  const { doc, update, readOnly } = useAssessmentCtx();
  const s = doc.surfaces[index]!;
  if (s.openings.length === 0 && readOnly) return <p className="text-sm text-ink-muted">No windows or doors.</p>;
  return (
    <div className="space-y-2">
      <h3 className="text-sm font-semibold">Windows and doors in “{s.name}”</h3>
      {s.openings.map((o, j) => (
        <div key={o.id ?? j} className={`grid gap-3 ${compact ? "grid-cols-[minmax(0,2fr)_minmax(0,1fr)_minmax(0,1fr)_auto]" : "sm:grid-cols-2 lg:grid-cols-5"}`}>
          <ChoiceField path={`surfaces.${index}.openings.${j}.productKey`} label="Type" className={compact ? undefined : "lg:col-span-2"} value={o.productKey ?? ""} options={windowsAndDoors.filter((w) => w.kind === o.kind).map((w) => ({ value: w.key, label: `${w.name} (U ${w.uFactorIP})` }))} onValue={(v) => update((d) => setAt(d, ["surfaces", index, "openings", j, "productKey"], v))} />
          <NumField path={`surfaces.${index}.openings.${j}.areaFt2`} label="Area each (ft²)" value={o.areaFt2} onValue={(n) => update((d) => setAt(d, ["surfaces", index, "openings", j, "areaFt2"], n ?? Number.NaN))} />
          <NumField path={`surfaces.${index}.openings.${j}.count`} label="How many" value={o.count ?? 1} onValue={(n) => update((d) => setAt(d, ["surfaces", index, "openings", j, "count"], n ?? Number.NaN))} />
          {!readOnly ? <button type="button" className="btn-ghost self-start sm:mt-6" aria-label={`Remove ${o.kind} ${j + 1} from “${s.name}”`} onClick={() => update((d) => setAt(d, ["surfaces", index, "openings"], d.surfaces[index]!.openings.filter((_, k) => k !== j)))}>Remove</button> : null}
        </div>
      ))}
      {s.openings.length === 0 ? <p className="text-sm text-ink-muted">No windows or doors yet.</p> : null}
      {!readOnly && s.kind === "wall" ? (
        <div className="flex flex-wrap gap-2">
          <button type="button" className="btn-ghost" onClick={() => update((d) => setAt(d, ["surfaces", index, "openings"], [...d.surfaces[index]!.openings, { id: crypto.randomUUID(), kind: "window", areaFt2: 12, count: 1, productKey: "window-double-nonmetal" }]))}>Add window</button>
          <button type="button" className="btn-ghost" onClick={() => update((d) => setAt(d, ["surfaces", index, "openings"], [...d.surfaces[index]!.openings, { id: crypto.randomUUID(), kind: "door", areaFt2: 20, count: 1, productKey: "door-wood" }]))}>Add door</button>
        </div>
      ) : null}
    </div>
  );
}
