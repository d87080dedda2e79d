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

function openingU(o: OpeningDef, path: string): { u: number; src: string; label: string } {
  if (o.uFactorIP !== undefined) return { u: o.uFactorIP, src: "entered by the auditor", label: o.label ?? o.kind };
  if (o.productKey === undefined) throw CalcInputError.at(path, "give either productKey or uFactorIP");
  const p = getWindowOrDoor(o.productKey);
  if (!p) throw CalcInputError.at(`${path}.productKey`, `unknown window or door "${o.productKey}"`);
  return { u: p.uFactorIP, src: p.source, label: o.label ?? p.name };
}

export function computeSurface(s: SurfaceDef, a: AssemblyResult, path: string): SurfaceResult {
  const bf = s.bufferFactor ?? 1;
  const openings: OpeningResult[] = (s.openings ?? []).map((o, j) => {
    const { u, src, label } = openingU(o, `${path}.openings.${j}`);
    const area = o.areaFt2 * (o.count ?? 1);
    return { kind: o.kind, label, areaFt2: area, uFactorIP: u, uFactorSource: src, ua: u * area * bf };
  });
  let openingsArea = 0;
  let openingsUA = 0;
  for (const o of openings) { openingsArea += o.areaFt2; openingsUA += o.ua; }
  const net = s.grossAreaFt2 - openingsArea;
  if (net < 0) throw CalcInputError.at(`${path}.openings`, `openings (${openingsArea.toFixed(1)} ft²) exceed the gross area of ${s.grossAreaFt2} ft²`);
  const opaqueUA = a.uFactorIP * net * bf;
  return {
    id: s.id, name: s.name, kind: s.kind, orientation: s.orientation, assemblyKey: s.assemblyKey,
    grossAreaFt2: s.grossAreaFt2, openingsAreaFt2: openingsArea, netAreaFt2: net, bufferFactor: bf,
    uFactorIP: a.uFactorIP, rValueIP: a.rValueIP, method: a.method, opaqueUA, openings, totalUA: opaqueUA + openingsUA,
  };
}

export function computeEnvelope(surfaces: SurfaceDef[], assembly: (key: string, path: string) => AssemblyResult, path = "surfaces"): EnvelopeResult {
  const ua: UAByComponent = { walls: 0, ceilings: 0, floors: 0, windows: 0, doors: 0 };
  const results = surfaces.map((s, i) => {
    const r = computeSurface(s, assembly(s.assemblyKey, `${path}.${i}.assemblyKey`), `${path}.${i}`);
    ua[s.kind === "wall" ? "walls" : s.kind === "ceiling" ? "ceilings" : "floors"] += r.opaqueUA;
    for (const o of r.openings) ua[o.kind === "window" ? "windows" : "doors"] += o.ua;
    return r;
  });
  return { surfaces: results, ua, totalUA: ua.walls + ua.ceilings + ua.floors + ua.windows + ua.doors };
}

export interface DesignLoad {
  indoorF: number; outdoorF: number; deltaTF: number;
  envelopeUA: number; infiltrationCfm: number; infiltrationUA: number;
  envelopeBtuh: number; infiltrationBtuh: number; totalBtuh: number;
  share: UAByComponent & { infiltration: number };
  formula: string;
}

/** q = (UA + 1.08·CFM_nat)·(t_in − t_design). */
export function designHeatLoad(env: EnvelopeResult, infiltrationCfm: number, indoorF: number, outdoorF: number): DesignLoad {
  const dT = indoorF - outdoorF;
  const infUA = AIR_BTUH_PER_CFM_F * infiltrationCfm;
  const total = env.totalUA + infUA;
  const s = (x: number) => (total > 0 ? x / total : 0);
  return {
    indoorF, outdoorF, deltaTF: dT, envelopeUA: env.totalUA, infiltrationCfm, infiltrationUA: infUA,
    envelopeBtuh: env.totalUA * dT, infiltrationBtuh: infUA * dT, totalBtuh: total * dT,
    share: { walls: s(env.ua.walls), ceilings: s(env.ua.ceilings), floors: s(env.ua.floors), windows: s(env.ua.windows), doors: s(env.ua.doors), infiltration: s(infUA) },
    formula: "q = (UA + 1.08 × CFM_nat) × (t_in − t_design)",
  };
}
