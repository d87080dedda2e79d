"use client";
import { DEFAULT_METHOD, type AssemblyDef, type Construction, type SurfaceKind, type UMethod } from "@/calc/assemblies";
import { ChoiceField } from "./choice-field";
import { withLabel, type FieldIssues } from "./model";
import { METHOD_LABELS } from "./results-panel";

const KINDS: { value: SurfaceKind; label: string }[] = [{ value: "wall", label: "Wall" }, { value: "ceiling", label: "Ceiling" }, { value: "floor", label: "Floor" }];
const CONSTRUCTIONS: { value: Construction; label: string }[] = [{ value: "wood-frame", label: "Wood frame" }, { value: "steel-frame", label: "Steel frame" }, { value: "masonry", label: "Masonry" }];

/** Name, kind, construction and U method of the assembly. */
export function HeaderFields({ id, value, issues, onChange, readOnly }: { id: string; value: AssemblyDef; issues: FieldIssues; onChange: (d: AssemblyDef) => void; readOnly?: boolean }) {
  const dflt = DEFAULT_METHOD[value.construction] as UMethod | undefined;
  const nameErr = issues.name ?? [];
  return (
    <div className="grid gap-x-4 gap-y-2 sm:grid-cols-2 lg:grid-cols-4">
      <div className="min-w-0 sm:col-span-2 lg:col-span-4">
        <label htmlFor={`${id}-name`} className="field-label">Assembly name</label>
        <input id={`${id}-name`} className="field-input" value={value.name ?? ""} readOnly={readOnly} aria-invalid={nameErr.length > 0 || undefined}
          aria-describedby={`${id}-name-error`} onChange={(e) => onChange({ ...value, name: e.target.value })} />
        <p id={`${id}-name-error`} aria-live="polite" className="field-error">{nameErr.map((m) => withLabel("Name", m)).join(" ")}</p>
      </div>
      <ChoiceField id={`${id}-kind`} label="Surface kind" value={value.kind} options={KINDS} disabled={readOnly} errors={issues.kind}
        onChange={(v) => onChange({ ...value, kind: v as SurfaceKind })} />
      <ChoiceField id={`${id}-con`} label="Construction" value={value.construction} options={CONSTRUCTIONS} disabled={readOnly} errors={issues.construction}
        onChange={(v) => onChange({ ...value, construction: v as Construction })} />
      <div className="sm:col-span-2">
        <ChoiceField id={`${id}-method`} label="U method used in results" value={value.method ?? ""} disabled={readOnly} errors={issues.method}
          options={[{ value: "", label: `Default for the construction${dflt ? ` (${METHOD_LABELS[dflt].toLowerCase()})` : ""}` }, { value: "parallel-path", label: METHOD_LABELS["parallel-path"] }, { value: "isothermal-planes", label: METHOD_LABELS["isothermal-planes"] }]}
          onChange={(v) => {
            const { method: _drop, ...rest } = value;
            void _drop;
            onChange(v === "" ? rest : { ...rest, method: v as UMethod });
          }} />
      </div>
    </div>
  );
}
