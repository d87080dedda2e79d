// Upgrades applied in sequence: each one acts on the house as the earlier ones left it,
// so package savings are not double-counted (METHODS.md §4).
import { memberDepthIn, type AssemblyDef, type FramedLayerSpec } from "./assemblies";
import type { OpeningDef, SurfaceDef } from "./envelope";
import { CalcInputError } from "./errors";
import { getMaterial } from "./materials";
import type { UpgradeInput } from "./schema";

export interface HouseState { assemblies: Map<string, AssemblyDef>; surfaces: SurfaceDef[]; cfm50: number }
export interface AppliedUpgrade { state: HouseState; details: Record<string, unknown>; description: string }

const ATTIC_FILL = "cellulose-loose-fill";
const DENSE_PACK = "cellulose-dense-pack";

function framedOf(def: AssemblyDef): FramedLayerSpec | undefined {
  const l = def.layers.find((x) => "framed" in x);
  return l && "framed" in l ? l.framed : undefined;
}

// A pure function of the definition (treated as immutable, like computeAssembly's results): memoised.
const nominalR = new WeakMap<AssemblyDef, number>();

/** Nominal insulation R of an assembly: insulation layers plus the cavity fill (by its filled share). */
export function nominalInsulationR(def: AssemblyDef): number {
  let r = nominalR.get(def);
  if (r === undefined) { r = nominalInsulationRUncached(def); nominalR.set(def, r); }
  return r;
}

function nominalInsulationRUncached(def: AssemblyDef): number {
  let r = 0;
  for (const l of def.layers) {
    if ("framed" in l) {
      const f = l.framed;
      if (f.cavityFill === null) continue;
      const m = getMaterial(f.cavityFill);
      if (!m || m.category !== "insulation") continue;
      const depth = memberDepthIn(f) ?? 0;
      const fillR = f.fillRValueIP ?? (m.rPerInchIP !== undefined ? m.rPerInchIP * depth : m.rValueIP ?? 0);
      r += fillR * (f.fillFraction ?? 1);
    } else {
      const m = getMaterial(l.materialKey);
      if (m?.category === "insulation") r += l.rValueIP ?? (l.thicknessIn !== undefined && m.rPerInchIP !== undefined ? m.rPerInchIP * l.thicknessIn : m.rValueIP ?? 0);
    }
  }
  return r;
}

/** Indices of the chosen surfaces, each once, in the order first named (a list is checked id by id). */
function chosen(state: HouseState, ids: "all-walls" | "all-ceilings" | "all" | string[], kind: SurfaceDef["kind"] | null, path: string, ix?: SurfaceIndex): number[] {
  const surfaces = state.surfaces;
  const out: number[] = [];
  if (typeof ids === "string") {
    for (let i = 0; i < surfaces.length; i++) if (kind === null || surfaces[i].kind === kind) out.push(i);
    return out;
  }
  const index = ix !== undefined && ix.surfaces.length === surfaces.length ? ix.index() : surfaceIndex(surfaces);
  const taken = new Uint8Array(surfaces.length);
  for (let j = 0; j < ids.length; j++) {
    const id = ids[j];
    let i = index.get(id) ?? -1;
    if (i >= 0 && surfaces[i].id !== id) i = surfaceIndex(surfaces).get(id) ?? -1; // a shared index that does not fit: the state's own
    if (i < 0) throw CalcInputError.at(`${path}.${j}`, `no surface with id "${id}"`);
    if (kind !== null && surfaces[i].kind !== kind) throw CalcInputError.at(`${path}.${j}`, `surface "${id}" is a ${surfaces[i].kind}, not a ${kind}`);
    if (taken[i] === 0) { taken[i] = 1; out.push(i); }
  }
  return out;
}

// Upgraded variants are memoised per (source definition, variant name): the same input
// gives the same derived object, so its U-factor is computed once (see computeAssembly).
const derived = new WeakMap<AssemblyDef, Map<string, AssemblyDef>>();

function variant(def: AssemblyDef, suffix: string, derive: (def: AssemblyDef) => AssemblyDef): AssemblyDef {
  let m = derived.get(def);
  if (!m) { m = new Map(); derived.set(def, m); }
  let d = m.get(suffix);
  if (!d) { d = { ...derive(def), key: `${def.key}${suffix}` }; m.set(suffix, d); }
  return d;
}

/** A copy of a surface with another assembly or openings (explicit fields: faster than a spread). */
function surfaceWith(s: SurfaceDef, assemblyKey: string, openings: OpeningDef[] | undefined): SurfaceDef {
  return {
    id: s.id, name: s.name, kind: s.kind, orientation: s.orientation, grossAreaFt2: s.grossAreaFt2, assemblyKey,
    heightFt: s.heightFt, openings, bufferFactor: s.bufferFactor, blockedBayFraction: s.blockedBayFraction,
  };
}

/** Re-point chosen surfaces to a derived assembly made by `derive` (one per source assembly). */
function reassign(state: HouseState, idx: number[], suffix: string, derive: (def: AssemblyDef) => AssemblyDef): HouseState {
  const assemblies = new Map(state.assemblies);
  const surfaces = state.surfaces.slice();
  let lastKey: string | undefined;
  let d: AssemblyDef | undefined;
  for (const i of idx) {
    const s = surfaces[i];
    if (s.assemblyKey !== lastKey || d === undefined) {
      // surfaces side by side mostly share an assembly: one lookup per run of the same key
      lastKey = s.assemblyKey;
      d = variant(state.assemblies.get(s.assemblyKey)!, suffix, derive);
      assemblies.set(d.key, d);
    }
    surfaces[i] = surfaceWith(s, d.key, s.openings);
  }
  return { assemblies, surfaces, cfm50: state.cfm50 };
}

/** id → index of a list of surfaces, built on first use. */
function surfaceIndex(surfaces: SurfaceDef[]): Map<string, number> {
  const index = new Map<string, number>();
  for (let i = 0; i < surfaces.length; i++) index.set(surfaces[i].id, i);
  return index;
}

/**
 * One id → index lookup for a sequence of upgrades: they never add, remove or reorder surfaces,
 * so the index of the first house serves every later one (each hit is still checked by id).
 */
export class SurfaceIndex {
  private map: Map<string, number> | undefined;
  constructor(readonly surfaces: SurfaceDef[]) {}
  index(): Map<string, number> { return (this.map ??= surfaceIndex(this.surfaces)); }
}

export function applyUpgrade(state: HouseState, u: UpgradeInput, path: string, testOutCfm50?: number): AppliedUpgrade {
  return applyUpgradeWith(state, u, path, testOutCfm50);
}

/** applyUpgrade with an id index shared across a sequence of upgrades (analyzeHouse). */
export function applyUpgradeWith(state: HouseState, u: UpgradeInput, path: string, testOutCfm50: number | undefined, ix?: SurfaceIndex): AppliedUpgrade {
  if (u.type === "dense-pack-walls") {
    const idx = chosen(state, u.surfaceIds, "wall", `${path}.surfaceIds`, ix);
    let lastKey: string | undefined;
    for (const i of idx) {
      const key = state.surfaces[i].assemblyKey;
      if (key === lastKey) continue; // the same assembly as the surface before: already checked
      if (!framedOf(state.assemblies.get(key)!)) throw CalcInputError.at(`${path}.surfaceIds`, `surface "${state.surfaces[i].id}" has no framed cavity to dense-pack`);
      lastKey = key;
    }
    const next = reassign(state, idx, `+dense-pack${u.rPerInchIP !== undefined ? `-R${u.rPerInchIP}/in` : ""}`, (def) => ({
      ...def, name: `${def.name}, dense-packed`,
      layers: def.layers.map((l) => ("framed" in l ? { framed: { ...l.framed, cavityFill: DENSE_PACK, fillFraction: 1, fillRValueIP: u.rPerInchIP !== undefined ? u.rPerInchIP * (memberDepthIn(l.framed) ?? 0) : undefined } } : l)),
    }));
    return { state: next, details: { surfaceIds: idx.map((i) => state.surfaces[i].id) }, description: `Dense-pack cellulose in ${idx.length} wall surface(s)` };
  }
  if (u.type === "attic-insulation") {
    const idx = chosen(state, u.surfaceIds, "ceiling", `${path}.surfaceIds`, ix);
    const rPerIn = getMaterial(ATTIC_FILL)!.rPerInchIP!;
    const added = idx.map((i) => {
      const existing = nominalInsulationR(state.assemblies.get(state.surfaces[i].assemblyKey)!);
      const add = Math.max(0, u.targetRIP - existing);
      return { surfaceId: state.surfaces[i].id, existingRIP: existing, addedRIP: add, addedInches: add / rPerIn };
    });
    const next = reassign(state, idx, `+attic-R${u.targetRIP}`, (def) => {
      const add = Math.max(0, u.targetRIP - nominalInsulationR(def));
      if (add === 0) return def;
      return { ...def, name: `${def.name}, insulated to R-${u.targetRIP}`, layers: [def.layers[0], { materialKey: ATTIC_FILL, thicknessIn: add / rPerIn }, ...def.layers.slice(1)] };
    });
    return { state: next, details: { added }, description: `Attic insulation to R-${u.targetRIP} (loose-fill cellulose)` };
  }
  if (u.type === "air-sealing") {
    const after = testOutCfm50 ?? u.targetCfm50;
    if (after >= state.cfm50) throw CalcInputError.at(`${path}.targetCfm50`, `must be below the ${Math.round(state.cfm50)} CFM50 the house has at this step`);
    return { state: { assemblies: state.assemblies, surfaces: state.surfaces, cfm50: after }, details: { fromCfm50: state.cfm50, toCfm50: after, basis: testOutCfm50 !== undefined ? "measured at test-out" : "target" }, description: `Air sealing from ${Math.round(state.cfm50)} to ${Math.round(after)} CFM50` };
  }
  const idx = chosen(state, u.surfaceIds, null, `${path}.surfaceIds`, ix);
  let count = 0;
  const surfaces = state.surfaces.slice();
  for (const i of idx) {
    const s = surfaces[i];
    if (!s.openings?.some((o) => o.kind === "window")) continue;
    const openings: OpeningDef[] = s.openings.map((o) => {
      if (o.kind !== "window") return o;
      count += o.count ?? 1;
      return { kind: o.kind, areaFt2: o.areaFt2, count: o.count, uFactorIP: u.uFactorIP, label: o.label };
    });
    surfaces[i] = surfaceWith(s, s.assemblyKey, openings);
  }
  return { state: { assemblies: state.assemblies, surfaces, cfm50: state.cfm50 }, details: { windowsReplaced: count, uFactorIP: u.uFactorIP }, description: `Replace ${count} window(s) with U-${u.uFactorIP} units` };
}
