"use client";

import { useState } from "react";
import { builtInAssemblies, type AssemblyDef } from "@/calc";
import { AssemblyLibrary, LayerSection, LayerStackEditor } from "./layer-stack";
import { useAssessmentCtx } from "./context";

/** The job's own layer stacks (copies it can edit), and the library to copy them from. */
export function StacksSection({ companyLibrary }: { companyLibrary: AssemblyDef[] }) {
  const { doc, update, readOnly, units } = useAssessmentCtx();
  const [editing, setEditing] = useState<string | null>(doc.assemblies[0]?.key ?? null);
  const own = doc.assemblies as AssemblyDef[];
  const current = own.find((a) => a.key === editing);
  const add = (def: AssemblyDef) => {
    const key = own.some((a) => a.key === def.key) || builtInAssemblies.some((b) => b.key === def.key) ? `${def.key}-${own.length + 1}` : def.key;
    update((d) => ({ ...d, assemblies: [...d.assemblies, { ...structuredClone(def), key }] }));
    setEditing(key);
  };
  return (
    <section aria-labelledby="stacks-h" className="card isolate space-y-4">
      <h2 id="stacks-h" className="text-xl font-semibold text-spruce-800">Layer stacks</h2>
      <p className="text-sm text-ink-muted">Built-in stacks are used as they are. Clone one to change it for this house; surfaces then pick it by name.</p>
      {own.length ? (
        <div>
          <label htmlFor="stack-pick" className="field-label">This job’s layer stacks</label>
          <select id="stack-pick" className="field-input" value={editing ?? ""} onChange={(e) => setEditing(e.target.value)}>
            {own.map((a) => <option key={a.key} value={a.key}>{a.name}</option>)}
          </select>
        </div>
      ) : null}
      {current ? (
        <div className="grid gap-4 lg:grid-cols-[1fr_16rem]">
          <LayerStackEditor value={current} readOnly={readOnly} units={units} onChange={(next) => update((d) => ({ ...d, assemblies: d.assemblies.map((a) => (a.key === current.key ? { ...next, key: current.key } : a)) }))} />
          <LayerSection value={current} />
        </div>
      ) : null}
      {!readOnly ? <AssemblyLibrary builtIns={[...builtInAssemblies]} company={companyLibrary} units={units} onPick={(def) => add(def)} onClone={(copy) => add(copy)} /> : null}
    </section>
  );
}
