// Assembly U-factors by the parallel-path and isothermal-planes methods
// (ASHRAE Handbook—Fundamentals, "Heat, Air and Moisture Control in Building
// Assemblies—Fundamentals", 2017/2021, from memory).
import { CalcInputError } from "./errors";
import { getMaterial, layerRValueIP } from "./materials";

export type SurfaceKind = "wall" | "ceiling" | "floor";
export type Construction = "wood-frame" | "steel-frame" | "masonry";
export type UMethod = "parallel-path" | "isothermal-planes";
export type FramingMember = "2x3" | "2x4" | "2x6" | "2x8" | "2x10" | "2x12" | "rough-2x4" | "1x2-furring" | "custom";

export interface ContinuousLayer { materialKey: string; thicknessIn?: number; rValueIP?: number }
export interface FramedLayerSpec {
  member: FramingMember;
  depthIn?: number;
  spacingIn?: number;
  framingFraction?: number;
  framingMaterial?: "wood" | "steel";
  /** Material key of the cavity fill; null for an empty cavity. */
  cavityFill: string | null;
  /** Share of the cavity area that holds the fill (the rest is empty), 0–1. */
  fillFraction?: number;
  /** Override of the fill's R across the cavity depth. */
  fillRValueIP?: number;
}
export type AssemblyLayer = ContinuousLayer | { framed: FramedLayerSpec };
export interface AssemblyDef {
  key: string;
  name: string;
  kind: SurfaceKind;
  construction: Construction;
  method?: UMethod;
  /** Outside → inside, air films included. */
  layers: AssemblyLayer[];
}

// Actual depths of dressed lumber, in. (common practice; rough-sawn old framing is a full 4 in., METHODS.md)
export const MEMBER_DEPTH_IN: Record<Exclude<FramingMember, "custom">, number> = {
  "2x3": 2.5, "2x4": 3.5, "2x6": 5.5, "2x8": 7.25, "2x10": 9.25, "2x12": 11.25, "rough-2x4": 4, "1x2-furring": 0.75,
};
// Typical framing fractions at 16 / 24 in. o.c. (ASHRAE Fundamentals typical values, from memory; METHODS.md §1)
export const FRAMING_FRACTION: Record<SurfaceKind, { oc16: number; oc24: number }> = {
  wall: { oc16: 0.25, oc24: 0.22 }, ceiling: { oc16: 0.14, oc24: 0.11 }, floor: { oc16: 0.1, oc24: 0.07 },
};
// Web of an 18-gauge (43 mil) steel stud, in.: the steel share of a framed layer is web / spacing (from memory)
export const STEEL_WEB_IN = 0.0428;

// Default method by construction: wood → parallel path; steel and masonry → isothermal planes (METHODS.md §1, ASHRAE Fundamentals, from memory)
export const DEFAULT_METHOD: Record<Construction, UMethod> = {
  "wood-frame": "parallel-path", "steel-frame": "isothermal-planes", masonry: "isothermal-planes",
};

export interface PathResult { label: string; areaFraction: number; framedLayerRIP: number; totalRIP: number }
export interface LayerResult { label: string; materialKey: string; rValueIP: number; source: string }
export interface AssemblyResult {
  key: string; name: string; kind: SurfaceKind; construction: Construction;
  method: UMethod; methodReason: string;
  uFactorIP: number; rValueIP: number;
  parallelPath: { uFactorIP: number; rValueIP: number };
  isothermalPlanes: { uFactorIP: number; rValueIP: number };
  continuousRIP: number;
  framing?: { member: FramingMember; depthIn: number; spacingIn: number; framingFraction: number; framingFractionSource: string; framingMaterial: "wood" | "steel"; paths: PathResult[] };
  /** Layers along the main cavity path, outside → inside (for the moisture screen). */
  cavityPath: LayerResult[];
}

/** Depth of a framed layer, in.: the auditor's, or the member's actual depth. */
export function memberDepthIn(spec: FramedLayerSpec): number | undefined {
  return spec.depthIn ?? (spec.member === "custom" ? undefined : MEMBER_DEPTH_IN[spec.member]);
}

export function defaultFramingFraction(kind: SurfaceKind, spacingIn: number, material: "wood" | "steel"): { value: number; source: string } {
  if (material === "steel") return { value: STEEL_WEB_IN / spacingIn, source: "steel web thickness / spacing (from memory); isothermal planes gives a lower bound" };
  const t = FRAMING_FRACTION[kind];
  const v = Math.abs(spacingIn - 16) <= Math.abs(spacingIn - 24) ? t.oc16 : t.oc24;
  return { value: v, source: "ASHRAE typical framing fraction (from memory)" };
}

function continuousR(l: ContinuousLayer, path: string): LayerResult {
  const m = getMaterial(l.materialKey);
  if (!m) throw CalcInputError.at(`${path}.materialKey`, `unknown material "${l.materialKey}"`);
  if (l.rValueIP !== undefined) return { label: m.name, materialKey: m.key, rValueIP: l.rValueIP, source: "entered by the auditor" };
  if (m.rValueIP === undefined && l.thicknessIn === undefined && m.thicknessIn === undefined)
    throw CalcInputError.at(`${path}.thicknessIn`, `${m.name} is rated per inch: give its thickness in inches`);
  return { label: m.name, materialKey: m.key, rValueIP: layerRValueIP(m, l.thicknessIn), source: m.source };
}

// Results are memoised per definition object (a pure function of it); the built-in
// assemblies and their upgraded variants are module-level objects, so they hit this.
const memo = new WeakMap<AssemblyDef, AssemblyResult>();

/** U-factor of an assembly by both methods; `path` names the input for errors. */
export function computeAssembly(def: AssemblyDef, path = "assembly"): AssemblyResult {
  let r = memo.get(def);
  if (!r) { r = computeAssemblyUncached(def, path); memo.set(def, r); }
  return r;
}

function computeAssemblyUncached(def: AssemblyDef, path: string): AssemblyResult {
  const framedIdx = def.layers.findIndex((l) => "framed" in l);
  if (def.layers.filter((l) => "framed" in l).length > 1) throw CalcInputError.at(`${path}.layers`, "an assembly may have only one framed layer");
  const outside: LayerResult[] = [];
  const inside: LayerResult[] = [];
  def.layers.forEach((l, i) => {
    if ("framed" in l) return;
    const r = continuousR(l, `${path}.layers.${i}`);
    (framedIdx >= 0 && i > framedIdx ? inside : outside).push(r);
  });
  let cont = 0;
  for (const r of outside) cont += r.rValueIP;
  for (const r of inside) cont += r.rValueIP;
  const method = def.method ?? DEFAULT_METHOD[def.construction];
  const methodReason = def.method ? "chosen by the auditor" : `default for ${def.construction} construction`;
  if (framedIdx < 0) {
    const u = 1 / cont;
    const both = { uFactorIP: u, rValueIP: cont };
    return { key: def.key, name: def.name, kind: def.kind, construction: def.construction, method, methodReason, uFactorIP: u, rValueIP: cont, parallelPath: both, isothermalPlanes: both, continuousRIP: cont, cavityPath: [...outside, ...inside] };
  }
  const fp = `${path}.layers.${framedIdx}.framed`;
  const spec = (def.layers[framedIdx] as { framed: FramedLayerSpec }).framed;
  const depthIn = memberDepthIn(spec);
  if (depthIn === undefined) throw CalcInputError.at(`${fp}.depthIn`, "a custom framing member needs its depth in inches");
  const spacingIn = spec.spacingIn ?? 16;
  const framingMaterial = spec.framingMaterial ?? (def.construction === "steel-frame" ? "steel" : "wood");
  const dflt = defaultFramingFraction(def.kind, spacingIn, framingMaterial);
  const f = spec.framingFraction ?? dflt.value;
  const ffSource = spec.framingFraction !== undefined ? "entered by the auditor" : dflt.source;
  const frameMat = getMaterial(framingMaterial === "steel" ? "steel-framing" : "softwood-framing")!;
  const framingR = frameMat.rPerInchIP! * depthIn;
  const airMat = getMaterial(def.kind === "wall" ? "air-space-wall" : "air-space-ceiling")!;
  const phi = spec.cavityFill === null ? 0 : (spec.fillFraction ?? 1);
  const paths: { label: string; a: number; r: number; layer: LayerResult }[] = [
    { label: `framing (${framingMaterial})`, a: f, r: framingR, layer: { label: `${spec.member} ${framingMaterial} framing`, materialKey: frameMat.key, rValueIP: framingR, source: frameMat.source } },
  ];
  if (spec.cavityFill !== null && phi > 0) {
    const m = getMaterial(spec.cavityFill);
    if (!m) throw CalcInputError.at(`${fp}.cavityFill`, `unknown material "${spec.cavityFill}"`);
    const r = spec.fillRValueIP ?? (m.rPerInchIP !== undefined ? m.rPerInchIP * depthIn : m.rValueIP!);
    paths.push({ label: `cavity: ${m.name}`, a: (1 - f) * phi, r, layer: { label: m.name, materialKey: m.key, rValueIP: r, source: spec.fillRValueIP !== undefined ? "entered by the auditor" : m.source } });
  }
  if (phi < 1) paths.push({ label: "cavity: empty", a: (1 - f) * (1 - phi), r: airMat.rValueIP!, layer: { label: airMat.name, materialKey: airMat.key, rValueIP: airMat.rValueIP!, source: airMat.source } });
  let uPP = 0;
  let invIso = 0;
  for (const p of paths) {
    uPP += p.a / (cont + p.r);
    invIso += p.a / p.r;
  }
  const rIso = cont + 1 / invIso;
  const pp = { uFactorIP: uPP, rValueIP: 1 / uPP };
  const iso = { uFactorIP: 1 / rIso, rValueIP: rIso };
  const chosen = method === "parallel-path" ? pp : iso;
  const main = paths.length > 1 ? paths.slice(1).reduce((a, b) => (b.a > a.a ? b : a)) : paths[0];
  return {
    key: def.key, name: def.name, kind: def.kind, construction: def.construction, method, methodReason,
    uFactorIP: chosen.uFactorIP, rValueIP: chosen.rValueIP, parallelPath: pp, isothermalPlanes: iso, continuousRIP: cont,
    framing: { member: spec.member, depthIn, spacingIn, framingFraction: f, framingFractionSource: ffSource, framingMaterial, paths: paths.map((p) => ({ label: p.label, areaFraction: p.a, framedLayerRIP: p.r, totalRIP: cont + p.r })) },
    cavityPath: [...outside, main.layer, ...inside],
  };
}
