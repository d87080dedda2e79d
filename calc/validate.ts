// Input checks: the zod schema (shapes and bounds) plus the cross-field checks a
// schema cannot express (keys that must exist, openings within their surface…).
import { computeAssembly, type AssemblyDef } from "./assemblies";
import { builtInAssemblies } from "./built-in-assemblies";
import { CalcInputError, type InputIssue } from "./errors";
import { findStation } from "./climate/stations";
import { getWindowOrDoor } from "./materials";
import { fastParseSurfaces } from "./fast-surfaces";
import { houseInputSchema, houseInputShellSchema, type HouseInputParsed } from "./schema";

const LABELS: Record<string, string> = {
  grossAreaFt2: "gross area (ft²)", areaFt2: "area (ft²)", volumeFt3: "house volume (ft³)", floorAreaFt2: "conditioned floor area (ft²)",
  framingFraction: "framing fraction", fillFraction: "filled share of the cavity", cfm50TestIn: "test-in CFM50", cfm50TestOut: "test-out CFM50",
  targetCfm50: "target CFM50", targetRIP: "target R-value", uFactorIP: "U-factor", rValueIP: "R-value", thicknessIn: "thickness (in.)",
  depthIn: "framing depth (in.)", spacingIn: "framing spacing (in.)", hdd65: "heating degree days (65 °F)", costUSD: "cost (USD)",
  pricePerUnitUSD: "fuel price", value: "efficiency", yearBuilt: "year built", bedrooms: "bedrooms", stories: "stories",
  materialKey: "material", assemblyKey: "assembly", productKey: "window or door product", surfaceIds: "surfaces", wmo: "WMO station number",
  heatingDesignTempF: "heating design temperature (°F)", heightFt: "wall height (ft)", count: "number of openings",
  bufferFactor: "buffer factor", blockedBayFraction: "share of blocked bays", indoorRH: "indoor relative humidity", indoorTempF: "indoor temperature (°F)", bagsActual: "bags blown", discountRate: "discount rate", wsf: "weather and shielding factor",
};

const BUILT_IN_KEYS = new Set(builtInAssemblies.map((a) => a.key));

export function pathString(path: readonly PropertyKey[]): string {
  return path.map(String).join(".");
}

/** Plain English naming the field, e.g. "Gross area (ft²) at surfaces.3.grossAreaFt2 must be greater than 0". */
export function plainMessage(path: string, message: string): string {
  const last = path.split(".").filter((p) => !/^\d+$/.test(p)).pop() ?? "input";
  const label = LABELS[last] ?? last;
  return `${label[0].toUpperCase()}${label.slice(1)} at ${path || "(input)"} ${message}`;
}

export interface Prepared { input: HouseInputParsed; assemblies: Map<string, AssemblyDef> }

const BUILT_IN_MAP = new Map<string, AssemblyDef>(builtInAssemblies.map((a) => [a.key, a]));

function semanticIssues(h: HouseInputParsed): { issues: InputIssue[]; assemblies: Map<string, AssemblyDef> } {
  const issues: InputIssue[] = [];
  const add = (path: string, message: string) => issues.push({ path, message });
  const assemblies = new Map<string, AssemblyDef>(BUILT_IN_MAP);
  h.assemblies.forEach((a, i) => {
    if (assemblies.has(a.key)) return add(`assemblies.${i}.key`, `"${a.key}" is already the key of ${BUILT_IN_KEYS.has(a.key) ? "a built-in assembly" : "another assembly"}`);
    try { computeAssembly(a, `assemblies.${i}`); assemblies.set(a.key, a); } catch (e) { if (e instanceof CalcInputError) issues.push(...e.issues); else throw e; }
  });
  // Surfaces and openings are most of a house: plain loops, and a path string only for an issue.
  const ids = new Set<string>();
  const surfaces = h.surfaces;
  for (let i = 0; i < surfaces.length; i++) {
    const s = surfaces[i];
    if (ids.has(s.id)) add(`surfaces.${i}.id`, `"${s.id}" is used by another surface`);
    ids.add(s.id);
    const a = assemblies.get(s.assemblyKey);
    if (!a) add(`surfaces.${i}.assemblyKey`, `no assembly "${s.assemblyKey}"`);
    else if (a.kind !== s.kind) add(`surfaces.${i}.assemblyKey`, `"${s.assemblyKey}" is a ${a.kind} assembly, not a ${s.kind}`);
    let openArea = 0;
    const openings = s.openings;
    for (let j = 0; j < openings.length; j++) {
      const o = openings[j];
      openArea += o.areaFt2 * (o.count ?? 1);
      if ((o.productKey === undefined) === (o.uFactorIP === undefined)) { add(`surfaces.${i}.openings.${j}`, "give either productKey or uFactorIP, not both or neither"); continue; }
      if (o.productKey !== undefined) {
        const w = getWindowOrDoor(o.productKey);
        if (!w) add(`surfaces.${i}.openings.${j}.productKey`, `unknown window or door "${o.productKey}"`);
        else if (w.kind !== o.kind) add(`surfaces.${i}.openings.${j}.productKey`, `"${o.productKey}" is a ${w.kind}, not a ${o.kind}`);
      }
    }
    if (openArea > s.grossAreaFt2) add(`surfaces.${i}.openings`, `openings total ${openArea} ft², more than the gross area of ${s.grossAreaFt2} ft²`);
  }
  h.upgrades.forEach((u, i) => {
    if (u.type === "air-sealing" && u.targetCfm50 >= h.blowerDoor.cfm50TestIn) add(`upgrades.${i}.targetCfm50`, `must be below the test-in ${h.blowerDoor.cfm50TestIn} CFM50`);
    if ("surfaceIds" in u && Array.isArray(u.surfaceIds)) u.surfaceIds.forEach((id, j) => { if (!ids.has(id)) add(`upgrades.${i}.surfaceIds.${j}`, `no surface with id "${id}"`); });
  });
  if (h.blowerDoor.cfm50TestOut !== undefined && h.blowerDoor.cfm50TestOut >= h.blowerDoor.cfm50TestIn && h.upgrades.some((u) => u.type === "air-sealing"))
    add("blowerDoor.cfm50TestOut", "is not below the test-in reading, so it cannot stand for the air sealing achieved");
  if (h.climate.source === "station" && !findStation(h.climate.wmo)) add("climate.wmo", `station ${h.climate.wmo} is not in the station table: import its EPW file or type its HDD and design temperature`);
  h.crewLog.forEach((c, i) => { if (!ids.has(c.surfaceId)) add(`crewLog.${i}.surfaceId`, `no surface with id "${c.surfaceId}"`); });
  return { issues, assemblies };
}

export type ValidationResult = { ok: true; value: HouseInputParsed } | { ok: false; issues: InputIssue[] };

/** zod's parse of the input: the shell by zod and the surfaces by the fast path, or all by zod when either is unsure. */
function parse(input: unknown): { success: true; data: HouseInputParsed } | { success: false; issues: readonly { path: PropertyKey[]; message: string }[] } {
  const shell = houseInputShellSchema.safeParse(input);
  if (shell.success) {
    const surfaces = fastParseSurfaces(shell.data.surfaces);
    if (surfaces) {
      // zod's output object is this call's own: the parsed surfaces go in place (same key order as a copy)
      const data = shell.data as unknown as HouseInputParsed;
      data.surfaces = surfaces;
      return { success: true, data };
    }
  }
  const r = houseInputSchema.safeParse(input);
  return r.success ? { success: true, data: r.data } : { success: false, issues: r.error.issues };
}

function check(input: unknown): { ok: true; prepared: Prepared } | { ok: false; issues: InputIssue[] } {
  const r = parse(input);
  if (!r.success) {
    return { ok: false, issues: r.issues.map((i) => { const path = pathString(i.path); return { path, message: plainMessage(path, i.message) }; }) };
  }
  const { issues, assemblies } = semanticIssues(r.data);
  if (issues.length) return { ok: false, issues: issues.map((i) => ({ path: i.path, message: plainMessage(i.path, i.message) })) };
  return { ok: true, prepared: { input: r.data, assemblies } };
}

/** Validate without throwing; messages name the field in plain English. */
export function validateHouseInput(input: unknown): ValidationResult {
  const c = check(input);
  return c.ok ? { ok: true, value: c.prepared.input } : c;
}

/** Validate or throw a CalcInputError naming every bad field. */
export function prepareHouseInput(input: unknown): Prepared {
  const c = check(input);
  if (!c.ok) throw new CalcInputError(c.issues);
  return c.prepared;
}
