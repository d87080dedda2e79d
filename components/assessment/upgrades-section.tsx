"use client";

import { memo, useMemo } from "react";
import { MEASURE_LIFE_YEARS } from "@/calc";
import type { AssessmentDoc, AssessmentUpgrade } from "@/lib/assessment/doc";
import { setAt, useAssessmentCtx } from "./context";
import { NumField, TextField } from "./fields";
import { PricingSummary, UpgradePricingPanel } from "./upgrade-pricing";

const labels: Record<AssessmentUpgrade["type"], string> = { "dense-pack-walls": "Dense-pack walls", "attic-insulation": "Attic insulation", "air-sealing": "Air sealing", windows: "Windows" };

function fresh(type: AssessmentUpgrade["type"], targetCfm50?: number | null): AssessmentUpgrade {
  const base = { id: crypto.randomUUID(), name: labels[type], costUSD: 0, lifeYears: MEASURE_LIFE_YEARS[type] };
  switch (type) {
    case "dense-pack-walls": return { ...base, type, surfaceIds: "all-walls" };
    case "attic-insulation": return { ...base, type, surfaceIds: "all-ceilings", targetRIP: 49 };
    case "air-sealing": return { ...base, type, targetCfm50: targetCfm50 ?? 2000 };
    case "windows": return { ...base, type, surfaceIds: "all", uFactorIP: 0.3 };
  }
}

export function UpgradesSection() {
  // Priced by the workspace, in the same pass as the results (lib/assessment/pricing.ts).
  const { doc, update, readOnly, pricesVisible, pricing = null } = useAssessmentCtx();
  const move = (i: number, by: -1 | 1) => update((d) => {
    const list = [...d.upgrades];
    const [u] = list.splice(i, 1);
    list.splice(i + by, 0, u!);
    return { ...d, upgrades: list };
  });
  // The walls' ids and names as one string, so the list (and its checkboxes) stays the same
  // object while a keystroke changes a wall's area.
  const wallsKey = doc.surfaces.filter((s) => s.kind === "wall").map((s) => `${s.id}\u0000${s.name}`).join("\u0001");
  const walls = useMemo(() => (wallsKey ? wallsKey.split("\u0001").map((w) => { const [id, name] = w.split("\u0000"); return { id: id!, name: name! }; }) : []), [wallsKey]);
  return (
    <section aria-labelledby="upg-h" className="card isolate space-y-4">
      <h2 id="upg-h" className="text-xl font-semibold text-spruce-800">Upgrades, in the order they are applied</h2>
      <p className="text-sm text-ink-muted">Each saving is worked out on the house with the upgrades above it already done, so the package is not counted twice.{pricesVisible ? " Each cost is priced from your price book; change a line for this job where the house needs it." : ""}</p>
      <ol className="space-y-3">
        {doc.upgrades.map((u, i) => (
          <li key={u.id} className="rounded-lg border border-line p-3" data-testid={`upgrade-${i}`}>
            <p className="mb-2 font-semibold">{i + 1}. {labels[u.type]}</p>
            <div className="grid gap-3 sm:grid-cols-2 lg:grid-cols-4">
              <TextField path={`upgrades.${i}.name`} label="Name on the proposal" value={u.name ?? ""} onValue={(v) => update((d) => setAt(d, ["upgrades", i, "name"], v))} />
              {u.type === "attic-insulation" ? <NumField path={`upgrades.${i}.targetRIP`} label="Target R (IP)" value={u.targetRIP} onValue={(n) => update((d) => setAt(d, ["upgrades", i, "targetRIP"], n ?? Number.NaN))} /> : null}
              {u.type === "air-sealing" ? <NumField path={`upgrades.${i}.targetCfm50`} label="Target CFM50" value={u.targetCfm50} onValue={(n) => update((d) => setAt(d, ["upgrades", i, "targetCfm50"], n ?? Number.NaN))} /> : null}
              {u.type === "windows" ? <NumField path={`upgrades.${i}.uFactorIP`} label="New window U-factor" value={u.uFactorIP} onValue={(n) => update((d) => setAt(d, ["upgrades", i, "uFactorIP"], n ?? Number.NaN))} /> : null}
              <NumField path={`upgrades.${i}.lifeYears`} label="Measure life (years)" value={u.lifeYears ?? null} onValue={(n) => update((d) => setAt(d, ["upgrades", i, "lifeYears"], n ?? undefined))} />
            </div>
            {u.type === "dense-pack-walls" ? <DensePackWalls i={i} surfaceIds={u.surfaceIds} walls={walls} readOnly={readOnly} update={update} /> : null}
            {pricesVisible ? <UpgradePricingPanel i={i} price={pricing?.upgrades[i] ?? null} /> : null}
            {!readOnly ? (
              <div className="mt-2 flex flex-wrap gap-2">
                <button type="button" className="btn-ghost" disabled={i === 0} onClick={() => move(i, -1)} aria-label={`Move ${u.name ?? labels[u.type]} earlier`}>Earlier</button>
                <button type="button" className="btn-ghost" disabled={i === doc.upgrades.length - 1} onClick={() => move(i, 1)} aria-label={`Move ${u.name ?? labels[u.type]} later`}>Later</button>
                <button type="button" className="btn-ghost text-danger" onClick={() => update((d) => ({ ...d, upgrades: d.upgrades.filter((_, j) => j !== i) }))}>Remove</button>
              </div>
            ) : null}
          </li>
        ))}
      </ol>
      {pricesVisible ? <PricingSummary pricing={pricing} /> : null}
      {!readOnly ? (
        <div className="flex flex-wrap gap-2">
          {(Object.keys(labels) as AssessmentUpgrade["type"][]).map((t) => (
            <button key={t} type="button" className="btn-ghost" onClick={() => update((d) => ({ ...d, upgrades: [...d.upgrades, fresh(t, d.leakage.targetCfm50)] }))}>Add {labels[t].toLowerCase()}</button>
          ))}
        </div>
      ) : null}
    </section>
  );
}

type Wall = { id: string; name: string };
type DensePackWallsProps = {
  i: number;
  surfaceIds: Extract<AssessmentUpgrade, { type: "dense-pack-walls" }>["surfaceIds"];
  walls: Wall[];
  readOnly: boolean;
  update: (change: (d: AssessmentDoc) => AssessmentDoc) => void;
};

/** The walls a dense-pack upgrade covers: one checkbox per wall, re-rendered only when the walls or the choice change. */
const DensePackWalls = memo(function DensePackWalls({ i, surfaceIds, walls, readOnly, update }: DensePackWallsProps) {
  return (
    <fieldset className="mt-3">
      <legend className="text-sm font-semibold">Walls to dense-pack</legend>
      <div className="mt-1 flex flex-wrap gap-x-5 gap-y-2">
        {walls.map((w) => {
          const on = surfaceIds === "all-walls" || (Array.isArray(surfaceIds) && surfaceIds.includes(w.id));
          return (
            <label key={w.id} className="flex min-h-11 items-center gap-2">
              <input type="checkbox" className="h-5 w-5" checked={on} disabled={readOnly} onChange={(e) => update((d) => {
                const current = surfaceIds === "all-walls" ? walls.map((x) => x.id) : [...(surfaceIds as string[])];
                const next = e.target.checked ? [...current, w.id] : current.filter((x) => x !== w.id);
                return setAt(d, ["upgrades", i, "surfaceIds"], next.length === walls.length ? "all-walls" : next);
              })} />
              {w.name}
            </label>
          );
        })}
      </div>
    </fieldset>
  );
});
