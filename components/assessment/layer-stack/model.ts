// Pure helpers of the layer-stack builder: list edits, clones, draft numbers, field issues.
import type { AssemblyDef, AssemblyLayer, FramedLayerSpec } from "@/calc/assemblies";
import { getMaterial, type Material } from "@/calc/materials";

export type FramedLayer = { framed: FramedLayerSpec };
export const isFramed = (l: AssemblyLayer): l is FramedLayer => "framed" in l;

/** Move item `i` one place up (-1, toward the outside) or down (+1); out-of-range moves return the same list. */
export function moveItem<T>(list: readonly T[], i: number, dir: -1 | 1): T[] {
  const j = i + dir;
  if (i < 0 || i >= list.length || j < 0 || j >= list.length) return [...list];
  const next = [...list];
  [next[i], next[j]] = [next[j], next[i]];
  return next;
}

export function removeItem<T>(list: readonly T[], i: number): T[] {
  return list.filter((_, k) => k !== i);
}

export function insertItem<T>(list: readonly T[], i: number, item: T): T[] {
  const at = Math.max(0, Math.min(i, list.length));
  return [...list.slice(0, at), item, ...list.slice(at)];
}

export function replaceItem<T>(list: readonly T[], i: number, item: T): T[] {
  return list.map((x, k) => (k === i ? item : x));
}

/** Where a new layer goes: just outside the inside air film if the stack ends with one, else at the inside end. */
export function insertionIndex(layers: readonly AssemblyLayer[]): number {
  const last = layers[layers.length - 1];
  return last && !isFramed(last) && getMaterial(last.materialKey)?.category === "air-film" && layers.length > 1 ? layers.length - 1 : layers.length;
}

/** A material is sized by the auditor when it is rated per inch. */
export const isPerInch = (m: Material | undefined) => Boolean(m && m.rPerInchIP !== undefined);

/** A new continuous layer of a material, with its typical thickness when it is rated per inch. */
export function newLayer(m: Material): AssemblyLayer {
  if (m.rPerInchIP !== undefined) return { materialKey: m.key, thicknessIn: m.thicknessIn ?? 1 };
  return { materialKey: m.key };
}

export const newFramedLayer = (): AssemblyLayer => ({ framed: { member: "2x4", spacingIn: 16, cavityFill: null } });

/** A deep copy of a built-in with a key not in `taken` and a "(copy)" name. */
export function cloneAssembly(def: AssemblyDef, taken: Iterable<string> = []): AssemblyDef {
  const used = new Set(taken);
  const base = `${def.key}-copy`;
  let key = base;
  for (let n = 2; used.has(key) || key === def.key; n++) key = `${base}-${n}`;
  const layers: AssemblyLayer[] = def.layers.map((l) => (isFramed(l) ? { framed: { ...l.framed } } : { ...l }));
  return { ...def, key, name: `${def.name} (copy)`, layers };
}

export type Draft = { kind: "empty" } | { kind: "number"; value: number } | { kind: "invalid"; message: string };

/** Read what was typed: decimals ("3.5", ".5", "3,5"), inch fractions ("3 1/2", "3-1/2", "1/2") and, if allowed, "45 %". */
export function parseDraft(text: string, opts: { percent?: boolean } = {}): Draft {
  let s = text.trim();
  if (s === "") return { kind: "empty" };
  let scale = 1;
  if (opts.percent && s.endsWith("%")) { s = s.slice(0, -1).trim(); scale = 0.01; }
  s = s.replace(/^(\d+),(\d+)$/, "$1.$2");
  const mixed = /^(\d+)(?:\s+|-)(\d+)\/(\d+)$/.exec(s) ?? /^()(\d+)\/(\d+)$/.exec(s);
  let v: number;
  if (mixed) {
    const den = Number(mixed[3]);
    if (den === 0) return { kind: "invalid", message: "has a fraction over zero" };
    v = Number(mixed[1] || 0) + Number(mixed[2]) / den;
  } else if (/^[-+]?(\d+\.?\d*|\.\d+)(e[-+]?\d+)?$/i.test(s)) v = Number(s);
  else return { kind: "invalid", message: opts.percent ? "must be a number (e.g. 0.5 or 50 %)" : "must be a number (e.g. 3.5 or 3 1/2)" };
  v *= scale;
  return Number.isFinite(v) ? { kind: "number", value: v } : { kind: "invalid", message: "must be a finite number" };
}

/** Field issues keyed by dotted path ("layers.3.framed.framingFraction"). */
export type FieldIssues = Record<string, string[]>;

export function addIssue(into: FieldIssues, path: string, message: string) {
  (into[path] ??= []).push(message);
}

/** Paths from zod (`["layers", 3, "thicknessIn"]`) or calc ("assembly.layers.3.thicknessIn") in one form. */
export function issuePath(path: readonly PropertyKey[] | string): string {
  const s = typeof path === "string" ? path : path.map(String).join(".");
  return s.replace(/^assembly\.?/, "");
}

// Same threshold as calc's soft warnings (warnings.ts) above; the low end flags a slip such as 2.5 for 0.25 (common practice)
export const FRAMING_FRACTION_WARN = { above: 0.4, below: 0.05 } as const;

/** A soft warning for a legal but unusual framing fraction the auditor entered (wood framing only). */
export function framingFractionWarning(ff: number | undefined, material: "wood" | "steel"): string | undefined {
  if (ff === undefined || material === "steel" || ff < 0 || ff > 1) return undefined;
  if (ff > FRAMING_FRACTION_WARN.above) return `${ff} is above ${FRAMING_FRACTION_WARN.above}: field studies rarely find more framing; check the entry.`;
  if (ff < FRAMING_FRACTION_WARN.below) return `${ff} is below ${FRAMING_FRACTION_WARN.below}: unusually little framing for wood; check the entry.`;
  return undefined;
}

/** "must be …" reads after the field's name; any other message stands as a sentence. */
export function withLabel(label: string, message: string): string {
  return /^(must|is|has|should|needs)\b/.test(message) ? `${label} ${message}` : message.replace(/^./, (c) => c.toUpperCase());
}

/** Stable React keys for the layers, kept beside the controlled value. */
export interface KeyState { keys: string[]; next: number }

export const initialKeys = (n: number): KeyState => ({ keys: Array.from({ length: n }, (_, i) => `k${i}`), next: n });

/** Keys for `n` layers: the same state when it fits, else trimmed or topped up with fresh keys. */
export function syncKeys(s: KeyState, n: number): KeyState {
  if (s.keys.length === n) return s;
  if (s.keys.length > n) return { keys: s.keys.slice(0, n), next: s.next };
  const extra = Array.from({ length: n - s.keys.length }, (_, i) => `k${s.next + i}`);
  return { keys: [...s.keys, ...extra], next: s.next + extra.length };
}
