"use client";
import { useId, useState } from "react";
import type { AssemblyDef, AssemblyLayer } from "@/calc/assemblies";
import { evaluateAssembly, issueLines } from "./evaluate";
import type { Units } from "./format";
import { HeaderFields } from "./header-fields";
import { LayerRow } from "./layer-row";
import { LayerSection } from "./layer-section";
import { MaterialPicker } from "./material-picker";
import { initialKeys, insertionIndex, insertItem, isFramed, moveItem, newFramedLayer, newLayer, removeItem, replaceItem, syncKeys } from "./model";
import { ResultsPanel } from "./results-panel";

export type LayerStackEditorProps = {
  value: AssemblyDef;
  onChange: (next: AssemblyDef) => void;
  readOnly?: boolean;
  units?: Units;
};

/** The layer-stack builder: a controlled editor of one assembly with its section and live R and U. */
export function LayerStackEditor({ value, onChange, readOnly = false, units = "ip" }: LayerStackEditorProps) {
  const id = `lse${useId().replace(/[^a-zA-Z0-9]/g, "")}`;
  // The definition itself when well formed, so calc's per-object memo holds between renders.
  const def: AssemblyDef = Array.isArray(value?.layers) ? value : { ...value, layers: [] };
  const layers = def.layers;
  const [keyState, setKeyState] = useState(() => initialKeys(layers.length));
  const synced = syncKeys(keyState, layers.length);
  if (synced !== keyState) setKeyState(synced);
  const keys = synced.keys;

  const ev = evaluateAssembly(def);
  const problems = [...issueLines(ev.issues), ...(ev.failure ? [ev.failure] : [])];
  const hasFramed = layers.some(isFramed);
  const setLayers = (next: AssemblyLayer[]) => onChange({ ...def, layers: next });

  const move = (i: number, dir: -1 | 1) => {
    if (i + dir < 0 || i + dir >= layers.length) return;
    setKeyState((s) => ({ ...s, keys: moveItem(syncKeys(s, layers.length).keys, i, dir) }));
    setLayers(moveItem(layers, i, dir));
  };
  const remove = (i: number) => {
    setKeyState((s) => ({ ...s, keys: removeItem(syncKeys(s, layers.length).keys, i) }));
    setLayers(removeItem(layers, i));
  };
  const add = (layer: AssemblyLayer) => {
    const at = insertionIndex(layers);
    setKeyState((s) => {
      const t = syncKeys(s, layers.length);
      return { keys: insertItem(t.keys, at, `k${t.next}`), next: t.next + 1 };
    });
    setLayers(insertItem(layers, at, layer));
  };

  return (
    <div className="space-y-5" data-testid="layer-stack-editor">
      <HeaderFields id={id} value={def} issues={ev.issues} onChange={onChange} readOnly={readOnly} />
      <div className="grid gap-5 lg:grid-cols-[minmax(0,1fr)_minmax(0,27rem)]">
        <div className="min-w-0 space-y-4 lg:col-start-2 lg:row-start-1">
          <figure className="card p-3 sm:p-4">
            <LayerSection value={def} />
            <figcaption className="mt-2 text-sm text-ink-muted">Section drawn outside (left) to inside (right); numbers match the layer list. Widths follow thickness; films are drawn at a minimum width.</figcaption>
          </figure>
          <div className="lg:sticky lg:top-4">
            <ResultsPanel result={ev.result} problems={problems} units={units} construction={def.construction} />
          </div>
        </div>
        <section className="min-w-0 space-y-3 lg:col-start-1 lg:row-start-1" aria-labelledby={`${id}-layers`}>
          <div>
            <h3 id={`${id}-layers`} className="text-lg font-semibold">Layers, outside to inside</h3>
            <p className="text-sm text-ink-muted">Layer 1 is the outside (cold side); the last is the inside (heated side). Include the air films.</p>
          </div>
          {layers.length === 0 ? <p className="rounded-md bg-warn-bg px-3 py-2 text-sm font-medium text-warn">No layers yet: add the outside air film first.</p> : null}
          <ol className="space-y-3">
            {layers.map((l, i) => (
              <LayerRow key={keys[i] ?? i} id={`${id}-l${keys[i] ?? i}`} index={i} count={layers.length} layer={l} kind={def.kind} construction={def.construction}
                issues={ev.issues} units={units} readOnly={readOnly}
                onChange={(next) => setLayers(replaceItem(layers, i, next))} onMove={(dir) => move(i, dir)} onRemove={() => remove(i)} />
            ))}
          </ol>
          {readOnly ? null : <MaterialPicker onAdd={(m) => add(newLayer(m))} canAddFramed={!hasFramed} onAddFramed={() => add(newFramedLayer())} />}
        </section>
      </div>
    </div>
  );
}
