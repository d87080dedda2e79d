// Envelope: UA per surface (net of openings, openings at their own whole-unit U),
// totals by component, and the design heat load (METHODS.md §2).
import type { AssemblyResult, SurfaceKind } from "./assemblies";
import { CalcInputError } from "./errors";
import { getWindowOrDoor } from "./materials";

export type Orientation = "N" | "NE" | "E" | "SE" | "S" | "SW" | "W" | "NW" | "horizontal";
export interface OpeningDef { kind: "window" | "door"; areaFt2: number; count?: number; productKey?: string; uFactorIP?: number; label?: string }
export interface SurfaceDef {
  id: string; name: string; kind: SurfaceKind; orientation: Orientation;
  grossAreaFt2: number; assemblyKey: string;
  heightFt?: number; openings?: OpeningDef[];
  /** Share of the indoor–outdoor ΔT across this surface: 1 to outdoors or a vented attic;
   * less over an unheated buffer space such as a basement (common practice). */
  bufferFactor?: number;
  blockedBayFraction?: number;
}

// Sensible heat of standard air, Btu/h per cfm·°F: 60 min/h × 0.075 lb/ft³ × 0.24 Btu/lb·°F (ASHRAE standard air, METHODS.md §2)
export const AIR_BTUH_PER_CFM_F = 60 * 0.075 * 0.24;

export interface OpeningResult { kind: "window" | "door"; label: string; areaFt2: number; uFactorIP: number; uFactorSource: string; ua: number }
export interface SurfaceResult {
  id: string; name: string; kind: SurfaceKind; orientation: Orientation; assemblyKey: string;
  grossAreaFt2: number; openingsAreaFt2: number; netAreaFt2: number; bufferFactor: number;
  uFactorIP: number; rValueIP: number; method: AssemblyResult["method"];
  opaqueUA: number; openings: OpeningResult[]; totalUA: number;
}
export interface UAByComponent { walls: number; ceilings: number; floors: number; windows: number; doors: number }
export interface EnvelopeResult { surfaces: SurfaceResult[]; ua: UAByComponent; totalUA: number }

/** `prefix.i`, or `prefix` alone when i < 0: built only for an error message. */
const at = (prefix: string, i: number) => (i < 0 ? prefix : `${prefix}.${i}`);

function openingResult(o: OpeningDef, bf: number, prefix: string, i: number, j: number): OpeningResult {
  const area = o.areaFt2 * (o.count ?? 1);
  if (o.uFactorIP !== undefined) return { kind: o.kind, label: o.label ?? o.kind, areaFt2: area, uFactorIP: o.uFactorIP, uFactorSource: "entered by the auditor", ua: o.uFactorIP * area * bf };
  if (o.productKey === undefined) throw CalcInputError.at(`${at(prefix, i)}.openings.${j}`, "give either productKey or uFactorIP");
  const p = getWindowOrDoor(o.productKey);
  if (!p) throw CalcInputError.at(`${at(prefix, i)}.openings.${j}.productKey`, `unknown window or door "${o.productKey}"`);
  return { kind: o.kind, label: o.label ?? p.name, areaFt2: area, uFactorIP: p.uFactorIP, uFactorSource: p.source, ua: p.uFactorIP * area * bf };
}

export function computeSurface(s: SurfaceDef, a: AssemblyResult, path: string): SurfaceResult {
  return surfaceResult(s, a, path, -1);
}

/** computeSurface for the surface at `prefix.i`, the path built only for an error (a string per surface costs). */
export function surfaceResult(s: SurfaceDef, a: AssemblyResult, prefix: string, i: number): SurfaceResult {
  const bf = s.bufferFactor ?? 1;
  const defs = s.openings ?? [];
  const openings: OpeningResult[] = new Array(defs.length);
  for (let j = 0; j < defs.length; j++) openings[j] = openingResult(defs[j], bf, prefix, i, j);
  let openingsArea = 0;
  let openingsUA = 0;
  for (const o of openings) { openingsArea += o.areaFt2; openingsUA += o.ua; }
  const net = s.grossAreaFt2 - openingsArea;
  if (net < 0) throw CalcInputError.at(`${at(prefix, i)}.openings`, `openings (${openingsArea.toFixed(1)} ft²) exceed the gross area of ${s.grossAreaFt2} ft²`);
  const opaqueUA = a.uFactorIP * net * bf;
  return {
    id: s.id, name: s.name, kind: s.kind, orientation: s.orientation, assemblyKey: s.assemblyKey,
    grossAreaFt2: s.grossAreaFt2, openingsAreaFt2: openingsArea, netAreaFt2: net, bufferFactor: bf,
    uFactorIP: a.uFactorIP, rValueIP: a.rValueIP, method: a.method, opaqueUA, openings, totalUA: opaqueUA + openingsUA,
  };
}

export type AssemblyLookup = (key: string, path: string) => AssemblyResult;

export function computeEnvelope(surfaces: SurfaceDef[], assembly: AssemblyLookup, path = "surfaces"): EnvelopeResult {
  const results: SurfaceResult[] = new Array(surfaces.length);
  for (let i = 0; i < surfaces.length; i++) {
    const s = surfaces[i];
    results[i] = surfaceResult(s, assembly(s.assemblyKey, path), path, i);
  }
  const ua = sumByComponent(results);
  return { surfaces: results, ua, totalUA: ua.walls + ua.ceilings + ua.floors + ua.windows + ua.doors };
}

/** UA by component over per-surface results, summed in surface order. */
export function sumByComponent(results: SurfaceResult[]): UAByComponent {
  let walls = 0, ceilings = 0, floors = 0, windows = 0, doors = 0;
  for (const r of results) {
    if (r.kind === "wall") walls += r.opaqueUA; else if (r.kind === "ceiling") ceilings += r.opaqueUA; else floors += r.opaqueUA;
    for (const o of r.openings) if (o.kind === "window") windows += o.ua; else doors += o.ua;
  }
  return { walls, ceilings, floors, windows, doors };
}

export interface DesignLoad {
  indoorF: number; outdoorF: number; deltaTF: number;
  envelopeUA: number; infiltrationCfm: number; infiltrationUA: number;
  envelopeBtuh: number; infiltrationBtuh: number; totalBtuh: number;
  share: UAByComponent & { infiltration: number };
  formula: string;
}

/** q = (UA + 1.08·CFM_nat)·(t_in − t_design). */
export function designHeatLoad(env: Pick<EnvelopeResult, "ua" | "totalUA">, infiltrationCfm: number, indoorF: number, outdoorF: number): DesignLoad {
  const dT = indoorF - outdoorF;
  const infUA = AIR_BTUH_PER_CFM_F * infiltrationCfm;
  const total = env.totalUA + infUA;
  const k = total > 0 ? 1 / total : 0;
  return {
    indoorF, outdoorF, deltaTF: dT, envelopeUA: env.totalUA, infiltrationCfm, infiltrationUA: infUA,
    envelopeBtuh: env.totalUA * dT, infiltrationBtuh: infUA * dT, totalBtuh: total * dT,
    share: { walls: env.ua.walls * k, ceilings: env.ua.ceilings * k, floors: env.ua.floors * k, windows: env.ua.windows * k, doors: env.ua.doors * k, infiltration: infUA * k },
    formula: "q = (UA + 1.08 × CFM_nat) × (t_in − t_design)",
  };
}
