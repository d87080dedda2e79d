// Pure geometry and words of the section drawing: band widths, patterns, names.
import { memberDepthIn, type AssemblyDef, type AssemblyLayer } from "@/calc/assemblies";
import { getMaterial, type MaterialCategory } from "@/calc/materials";
import { MEMBER_LABELS } from "./catalog";
import { isFramed } from "./model";

export type BandKind = "film" | "air" | "board" | "siding" | "masonry" | "insulation" | "membrane" | "wood" | "framed";
const KIND_OF: Record<MaterialCategory, BandKind> = {
  "air-film": "film", "air-space": "air", "interior-finish": "board", sheathing: "board", siding: "siding",
  masonry: "masonry", insulation: "insulation", membrane: "membrane", framing: "wood",
};

const pct = (f: number) => `${Math.round(f * 100)} %`;

/** Plain words for a layer, e.g. "2×4 wood framing at 16 in. o.c., Cellulose dense-pack…". */
export function layerName(l: AssemblyLayer, construction?: AssemblyDef["construction"]): string {
  if (!isFramed(l)) return getMaterial(l.materialKey)?.name ?? `Unknown material "${l.materialKey}"`;
  const f = l.framed;
  const mat = f.framingMaterial ?? (construction === "steel-frame" ? "steel" : "wood");
  const fill = f.cavityFill === null ? "empty cavity" : (getMaterial(f.cavityFill)?.name ?? `unknown fill "${f.cavityFill}"`);
  const part = f.cavityFill !== null && f.fillFraction !== undefined && f.fillFraction < 1 ? `, filling ${pct(f.fillFraction)} of the cavity` : "";
  return `${MEMBER_LABELS[f.member] ?? f.member} ${mat} framing at ${f.spacingIn ?? 16} in. o.c., ${fill}${part}`;
}

export function bandKind(l: AssemblyLayer): BandKind {
  if (isFramed(l)) return "framed";
  const m = getMaterial(l.materialKey);
  return m ? KIND_OF[m.category] : "board";
}

/** Thickness drawn for a layer, in.; films and membranes have none and get the minimum width. */
export function drawnThicknessIn(l: AssemblyLayer): number {
  const ok = (x: number | undefined) => (x !== undefined && Number.isFinite(x) && x > 0 ? x : undefined);
  if (isFramed(l)) return ok(l.framed.depthIn) ?? ok(memberDepthIn({ ...l.framed, depthIn: undefined })) ?? 3.5;
  const m = getMaterial(l.materialKey);
  if (m && (m.category === "air-film" || m.category === "membrane")) return 0;
  return ok(l.thicknessIn) ?? ok(m?.thicknessIn) ?? 0.5;
}

export interface Band { x: number; w: number }

/** Widths proportional to thickness over `total`, each at least `min` (for films and thin boards). */
export function layoutBands(thicknesses: readonly number[], total: number, min: number): Band[] {
  const n = thicknesses.length;
  if (n === 0) return [];
  const t = thicknesses.map((x) => (Number.isFinite(x) && x > 0 ? x : 0));
  const clamped = new Set<number>();
  let widths: number[] = [];
  for (let pass = 0; pass <= n; pass++) {
    const room = Math.max(0, total - clamped.size * min);
    const sum = t.reduce((s, x, i) => (clamped.has(i) ? s : s + x), 0);
    widths = t.map((x, i) => (clamped.has(i) ? min : sum > 0 ? (x / sum) * room : room / (n - clamped.size)));
    const more = widths.findIndex((w, i) => !clamped.has(i) && w < min);
    if (more < 0) break;
    widths.forEach((w, i) => { if (w < min) clamped.add(i); });
  }
  if (n * min > total) widths = t.map(() => total / n);
  let x = 0;
  return widths.map((w) => { const b = { x, w }; x += w; return b; });
}

/** What a screen reader hears for the drawing. */
export function describeSection(def: AssemblyDef): string {
  if (def.layers.length === 0) return `Section of ${def.name || "an assembly"}: no layers yet.`;
  const list = def.layers.map((l, i) => `${i + 1}, ${layerName(l, def.construction)}`).join("; ");
  return `Section of ${def.name || "the assembly"}, ${def.layers.length} layers from outside (left) to inside (right): ${list}.`;
}

/** Row of each band's number: narrow neighbours alternate between a high (0) and a low (1) row. */
export function numberRows(bands: readonly Band[], narrow: number): (0 | 1)[] {
  const rows: (0 | 1)[] = [];
  bands.forEach((b, i) => rows.push(b.w < narrow && i > 0 && bands[i - 1].w < narrow && rows[i - 1] === 1 ? 0 : 1));
  return rows;
}
