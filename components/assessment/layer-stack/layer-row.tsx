"use client";
import type { AssemblyLayer, Construction, FramedLayerSpec, SurfaceKind } from "@/calc/assemblies";
import { getMaterial, layerRValueIP } from "@/calc/materials";
import { CATEGORY_LABELS } from "./catalog";
import { FramedLayerFields } from "./framed-layer-fields";
import { formatR, type Units } from "./format";
import { isFramed, isPerInch, withLabel, type FieldIssues } from "./model";
import { NumberField } from "./number-field";
import { layerName } from "./section-geometry";

type Props = {
  id: string; index: number; count: number; layer: AssemblyLayer; kind: SurfaceKind; construction: Construction;
  issues: FieldIssues; units: Units; readOnly?: boolean;
  onChange: (l: AssemblyLayer) => void; onMove: (dir: -1 | 1) => void; onRemove: () => void;
};

function layerR(l: AssemblyLayer): number | undefined {
  if (isFramed(l)) return undefined;
  if (l.rValueIP !== undefined) return l.rValueIP;
  const m = getMaterial(l.materialKey);
  try { return m ? layerRValueIP(m, l.thicknessIn) : undefined; } catch { return undefined; }
}

const iconBtn = "btn-ghost min-w-11 px-3 aria-disabled:cursor-not-allowed aria-disabled:opacity-40";

/** One layer of the stack: what it is, its thickness when rated per inch, and its controls. */
export function LayerRow({ id, index, count, layer, kind, construction, issues, units, readOnly, onChange, onMove, onRemove }: Props) {
  const path = `layers.${index}`;
  const name = layerName(layer, construction);
  const m = isFramed(layer) ? undefined : getMaterial(layer.materialKey);
  const r = layerR(layer);
  const own = issues[path] ?? [];
  const materialErr = issues[`${path}.materialKey`] ?? [];
  const n = index + 1;
  return (
    <li className="rounded-lg border border-line bg-white p-3 sm:p-4" data-layer-row={index}>
      <div className="flex flex-wrap items-start gap-3">
        <span aria-hidden="true" className="mt-1 inline-flex size-8 shrink-0 items-center justify-center rounded-full bg-spruce-700 text-sm font-bold text-white">{n}</span>
        <div className="min-w-0 flex-1 basis-48">
          <p className="font-semibold text-charcoal"><span className="sr-only">Layer {n}: </span>{name}</p>
          <p className="text-sm text-ink-muted">
            {isFramed(layer) ? "Framed layer: framing and cavity side by side" : m ? CATEGORY_LABELS[m.category] : "Not in the library"}
            {r !== undefined ? <> · <span className="tabular-nums">{formatR(r, units)}</span></> : null}
          </p>
        </div>
        {readOnly ? null : (
          <div className="ml-auto flex shrink-0 gap-2">
            <button type="button" className={iconBtn} aria-label={`Move layer ${n} (${name}) toward the outside`} aria-disabled={index === 0 || undefined} onClick={() => onMove(-1)}>
              <span aria-hidden="true">↑</span>
            </button>
            <button type="button" className={iconBtn} aria-label={`Move layer ${n} (${name}) toward the inside`} aria-disabled={index === count - 1 || undefined} onClick={() => onMove(1)}>
              <span aria-hidden="true">↓</span>
            </button>
            <button type="button" className={`${iconBtn} text-danger`} aria-label={`Remove layer ${n} (${name})`} onClick={onRemove}>
              <span aria-hidden="true">✕</span>
            </button>
          </div>
        )}
      </div>
      {[...own, ...materialErr].length ? (
        <p className="field-error" aria-live="polite">{[...own, ...materialErr].map((e) => withLabel("Layer", e)).join(" ")}</p>
      ) : null}
      {isFramed(layer) ? (
        <div className="mt-3">
          <FramedLayerFields id={`${id}-fr`} path={`${path}.framed`} spec={layer.framed} kind={kind} construction={construction} issues={issues} readOnly={readOnly}
            onChange={(framed: FramedLayerSpec) => onChange({ framed })} />
        </div>
      ) : isPerInch(m) || layer.thicknessIn !== undefined || issues[`${path}.thicknessIn`] ? (
        <div className="mt-3 max-w-xs">
          <NumberField id={`${id}-t`} label="Thickness" unit="in." value={layer.thicknessIn} readOnly={readOnly} errors={issues[`${path}.thicknessIn`]}
            placeholder={m?.thicknessIn !== undefined ? String(+m.thicknessIn.toFixed(3)) : "required"}
            hint={m?.rPerInchIP !== undefined ? `${formatR(m.rPerInchIP, units)} per inch` : undefined}
            onCommit={(t) => onChange(t === undefined ? { materialKey: layer.materialKey, ...(layer.rValueIP !== undefined ? { rValueIP: layer.rValueIP } : {}) } : { ...layer, thicknessIn: t })} />
        </div>
      ) : null}
      {!isFramed(layer) && issues[`${path}.rValueIP`] ? <p className="field-error">{issues[`${path}.rValueIP`].map((e) => withLabel("R-value", e)).join(" ")}</p> : null}
    </li>
  );
}
