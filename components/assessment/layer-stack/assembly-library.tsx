"use client";
import { useId, useState } from "react";
import type { AssemblyDef } from "@/calc/assemblies";
import { evaluateAssembly } from "./evaluate";
import { formatR, formatU, U_UNIT, type Units } from "./format";
import { cloneAssembly } from "./model";

export type AssemblyLibraryProps = {
  builtIns: readonly AssemblyDef[];
  company: readonly AssemblyDef[];
  onPick: (def: AssemblyDef, source: "built-in" | "company") => void;
  /** Called with a copy under a fresh key and a "(copy)" name, ready to edit and save. */
  onClone: (copy: AssemblyDef, original: AssemblyDef) => void;
  selectedKey?: string;
  units?: Units;
};

const KIND_LABEL: Record<string, string> = { wall: "Wall", ceiling: "Ceiling", floor: "Floor" };

function Entry({ def, source, selected, units, onPick, onClone }: { def: AssemblyDef; source: "built-in" | "company"; selected: boolean; units: Units; onPick: () => void; onClone?: () => void }) {
  const ev = evaluateAssembly(def);
  return (
    <li className={`rounded-lg border p-3 ${selected ? "border-spruce-600 bg-spruce-50" : "border-line bg-white"}`} data-assembly={def.key}>
      <p className="font-semibold text-charcoal">{def.name || def.key}</p>
      <p className="mt-0.5 text-sm text-ink-muted">
        {KIND_LABEL[def.kind] ?? def.kind} · {def.construction}
        {ev.result ? <> · <span className="tabular-nums">U {formatU(ev.result.uFactorIP, units)}</span> {U_UNIT[units]} · <span className="tabular-nums">{formatR(ev.result.rValueIP, units)}</span></> : <> · <span className="text-danger">needs fixing</span></>}
      </p>
      <div className="mt-2 flex flex-wrap gap-2">
        <button type="button" className="btn-ghost" aria-pressed={selected} aria-label={`Use ${def.name || def.key}`} onClick={onPick}>{selected ? "In use" : "Use"}</button>
        {onClone ? <button type="button" className="btn-primary" aria-label={`Clone to edit: ${def.name || def.key}`} onClick={onClone}>Clone to edit</button> : null}
        {source === "company" ? <span className="self-center rounded bg-ember-100 px-2 py-0.5 text-xs font-semibold text-ember-700">Company</span> : null}
      </div>
    </li>
  );
}

/** Built-in layer stacks and the company's saved ones; built-ins are cloned before editing. */
export function AssemblyLibrary({ builtIns, company, onPick, onClone, selectedKey, units = "ip" }: AssemblyLibraryProps) {
  const id = useId();
  const [query, setQuery] = useState("");
  const words = query.toLowerCase().split(/\s+/).filter(Boolean);
  const hit = (d: AssemblyDef) => words.every((w) => `${d.name} ${d.key} ${d.kind} ${d.construction}`.toLowerCase().includes(w));
  const taken = [...builtIns, ...company].map((d) => d.key);
  const own = (company ?? []).filter(hit);
  const built = (builtIns ?? []).filter(hit);
  return (
    <section className="card space-y-4 p-4 sm:p-5" aria-labelledby={`${id}-h`}>
      <h3 id={`${id}-h`} className="text-lg font-semibold">Assembly library</h3>
      <div>
        <label htmlFor={`${id}-q`} className="field-label">Search assemblies</label>
        <input id={`${id}-q`} type="search" className="field-input" value={query} placeholder="e.g. 2x4, attic, brick" onChange={(e) => setQuery(e.target.value)} />
      </div>
      <div>
        <h4 className="font-sans text-sm font-semibold uppercase tracking-wide text-ink-muted">Company assemblies ({own.length})</h4>
        {own.length ? (
          <ul className="mt-2 space-y-2">
            {own.map((d) => <Entry key={d.key} def={d} source="company" selected={d.key === selectedKey} units={units} onPick={() => onPick(d, "company")} />)}
          </ul>
        ) : <p className="mt-1 text-sm text-ink-muted">{company.length ? "None match the search." : "None saved yet: clone a built-in to make one."}</p>}
      </div>
      <div>
        <h4 className="font-sans text-sm font-semibold uppercase tracking-wide text-ink-muted">Built-in ({built.length})</h4>
        {built.length ? (
          <ul className="mt-2 space-y-2">
            {built.map((d) => (
              <Entry key={d.key} def={d} source="built-in" selected={d.key === selectedKey} units={units}
                onPick={() => onPick(d, "built-in")} onClone={() => onClone(cloneAssembly(d, taken), d)} />
            ))}
          </ul>
        ) : <p className="mt-1 text-sm text-ink-muted">None match the search.</p>}
      </div>
    </section>
  );
}
