"use client";
import { useId, useState } from "react";
import { getMaterial, type Material } from "@/calc/materials";
import { groupMaterials } from "./catalog";

/** Search the library, pick a material from the list grouped by category, add it as a layer. */
export function MaterialPicker({ onAdd, canAddFramed, onAddFramed }: { onAdd: (m: Material) => void; canAddFramed: boolean; onAddFramed: () => void }) {
  const id = useId();
  const [query, setQuery] = useState("");
  const [picked, setPicked] = useState("");
  const groups = groupMaterials(query);
  const count = groups.reduce((n, g) => n + g.items.length, 0);
  const visible = groups.some((g) => g.items.some((m) => m.key === picked));
  const chosen = visible ? getMaterial(picked) : undefined;
  return (
    <fieldset className="rounded-lg border border-dashed border-line bg-paper p-4">
      <legend className="px-1 text-sm font-semibold text-charcoal">Add a layer</legend>
      <div className="grid gap-3 sm:grid-cols-[1fr_1.4fr_auto] sm:items-end">
        <div>
          <label htmlFor={`${id}-q`} className="field-label">Search materials</label>
          <input id={`${id}-q`} type="search" className="field-input" value={query} placeholder="e.g. plywood, R-13, brick"
            aria-describedby={`${id}-count`} onChange={(e) => setQuery(e.target.value)} />
          <p id={`${id}-count`} aria-live="polite" className="mt-1 text-sm text-ink-muted">{count} of the library match</p>
        </div>
        <div>
          <label htmlFor={`${id}-m`} className="field-label">Material</label>
          <select id={`${id}-m`} className="field-input" value={visible ? picked : ""} onChange={(e) => setPicked(e.target.value)}>
            <option value="">{count ? "Choose a material…" : "No material matches"}</option>
            {groups.map((g) => (
              <optgroup key={g.category} label={g.label}>
                {g.items.map((m) => <option key={m.key} value={m.key}>{m.name}</option>)}
              </optgroup>
            ))}
          </select>
        </div>
        <button type="button" className="btn-primary" disabled={!chosen} onClick={() => { if (chosen) { onAdd(chosen); setPicked(""); } }}>
          Add layer
        </button>
      </div>
      {canAddFramed ? (
        <button type="button" className="btn-ghost mt-3" onClick={onAddFramed}>Add framed layer (studs or joists with cavity)</button>
      ) : null}
    </fieldset>
  );
}
