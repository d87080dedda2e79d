// Edits on the surfaces of an assessment, shared by the desktop table and the phone cards.
// Pure functions of the document: the "proposed" layer stack of a surface is which upgrade
// (dense-pack walls, attic insulation) covers it, so setting it edits that upgrade's surface list.
import { builtInAssemblies } from "@/calc";
import type { AssessmentDoc, AssessmentSurface, AssessmentUpgrade } from "@/lib/assessment/doc";

export type SurfaceKind = AssessmentSurface["kind"];

export function newSurface(kind: SurfaceKind = "wall"): AssessmentSurface {
  const stack = builtInAssemblies.find((a) => a.kind === kind)!;
  return { id: crypto.randomUUID(), name: kind === "wall" ? "New wall" : kind === "ceiling" ? "New ceiling" : "New floor", kind, orientation: kind === "wall" ? "N" : "horizontal", grossAreaFt2: 100, assemblyKey: stack.key, openings: [] };
}

/** The layer stacks a surface can use: the job's own, then the built-ins it has not replaced. */
export function stacksOf(doc: Pick<AssessmentDoc, "assemblies">) {
  return [...doc.assemblies, ...builtInAssemblies.filter((b) => !doc.assemblies.some((a) => a.key === b.key))];
}

type Envelope = Extract<AssessmentUpgrade, { type: "dense-pack-walls" | "attic-insulation" }>;
const envelopeKind = { "dense-pack-walls": "wall", "attic-insulation": "ceiling" } as const;
const allOfKind = { "dense-pack-walls": "all-walls", "attic-insulation": "all-ceilings" } as const;

const isEnvelope = (u: AssessmentUpgrade): u is Envelope => u.type === "dense-pack-walls" || u.type === "attic-insulation";

/** The surface ids an envelope upgrade covers, with "all-walls"/"all-ceilings" spelled out. */
function covered(doc: AssessmentDoc, u: Envelope): string[] {
  const kind = envelopeKind[u.type];
  const ids = u.surfaceIds;
  if (ids === undefined || typeof ids === "string") return doc.surfaces.filter((s) => s.kind === kind).map((s) => s.id);
  return ids;
}

export const upgradeLabel = (u: AssessmentUpgrade) => u.name?.trim() || { "dense-pack-walls": "Dense-pack walls", "attic-insulation": "Attic insulation", "air-sealing": "Air sealing", windows: "Windows" }[u.type];

/** Upgrades that can be a surface's proposed layer stack (by kind). */
export function proposalOptions(doc: AssessmentDoc, kind: SurfaceKind): { value: string; label: string }[] {
  return doc.upgrades.filter(isEnvelope).filter((u) => envelopeKind[u.type] === kind).map((u) => ({ value: u.id, label: upgradeLabel(u) }));
}

/** The id of the first envelope upgrade covering this surface, or "" for none. */
export function proposedUpgradeId(doc: AssessmentDoc, s: AssessmentSurface): string {
  const hit = doc.upgrades.filter(isEnvelope).find((u) => envelopeKind[u.type] === s.kind && covered(doc, u).includes(s.id));
  return hit?.id ?? "";
}

/** A windows upgrade that replaces this surface's windows, if any (shown beside the proposed stack). */
export function windowsUpgradeFor(doc: AssessmentDoc, s: AssessmentSurface) {
  if (!s.openings.some((o) => o.kind === "window")) return undefined;
  return doc.upgrades.find((u) => u.type === "windows" && (u.surfaceIds === undefined || u.surfaceIds === "all" || (Array.isArray(u.surfaceIds) && u.surfaceIds.includes(s.id))));
}

/**
 * Make `upgradeId` (or no upgrade, for null) the proposal for the given surfaces: each is added to
 * that upgrade's list and taken out of the other upgrades of its kind; surfaces of another kind are
 * left alone. With null, every given surface leaves every upgrade list. A list that covers every surface of its kind is written as "all-walls"/"all-ceilings".
 */
export function setProposed(doc: AssessmentDoc, surfaceIds: string[], upgradeId: string | null): AssessmentDoc {
  const chosen = new Set(surfaceIds);
  const target = upgradeId === null ? null : doc.upgrades.find((u) => u.id === upgradeId);
  if (target !== null && (!target || !isEnvelope(target))) return doc;
  // Choosing an upgrade touches only the surfaces of its kind; "no change" touches every kind.
  const onlyKind = target ? envelopeKind[target.type] : null;
  const upgrades = doc.upgrades.map((u) => {
    if (!isEnvelope(u)) return u;
    const kind = envelopeKind[u.type];
    if (onlyKind && kind !== onlyKind) return u;
    const targets = doc.surfaces.filter((s) => s.kind === kind && chosen.has(s.id)).map((s) => s.id);
    if (targets.length === 0) return u;
    const current = covered(doc, u);
    const next = u.id === upgradeId ? [...current, ...targets.filter((id) => !current.includes(id))] : current.filter((id) => !targets.includes(id));
    const all = doc.surfaces.filter((s) => s.kind === kind).map((s) => s.id);
    const list = next.length > 0 && all.every((id) => next.includes(id)) ? allOfKind[u.type] : next;
    return { ...u, surfaceIds: list } as AssessmentUpgrade;
  });
  return { ...doc, upgrades };
}

/** Envelope and windows upgrades whose own list names no surface any more (they need one to mean anything). */
export function upgradesCoveringNothing(doc: AssessmentDoc): AssessmentUpgrade[] {
  return doc.upgrades.filter((u) => u.type !== "air-sealing" && Array.isArray(u.surfaceIds) && u.surfaceIds.length === 0);
}

export type Deleted = { surface: AssessmentSurface; index: number; upgradeIds: string[] };

/** Remove a surface, and its id from every upgrade that named it, keeping what undo needs. */
export function removeSurfaceAt(doc: AssessmentDoc, index: number): { doc: AssessmentDoc; deleted: Deleted } {
  const surface = doc.surfaces[index]!;
  const upgradeIds: string[] = [];
  const upgrades = doc.upgrades.map((u) => {
    if (u.type === "air-sealing" || !Array.isArray(u.surfaceIds) || !u.surfaceIds.includes(surface.id)) return u;
    upgradeIds.push(u.id);
    return { ...u, surfaceIds: u.surfaceIds.filter((id) => id !== surface.id) } as AssessmentUpgrade;
  });
  return { doc: { ...doc, surfaces: doc.surfaces.filter((_, j) => j !== index), upgrades }, deleted: { surface, index, upgradeIds } };
}

/** Undo a delete: the surface goes back where it was, and into the upgrades that named it. */
export function restoreSurface(doc: AssessmentDoc, d: Deleted): AssessmentDoc {
  const at = Math.min(d.index, doc.surfaces.length);
  const upgrades = doc.upgrades.map((u) => {
    if (!d.upgradeIds.includes(u.id) || u.type === "air-sealing" || !Array.isArray(u.surfaceIds) || u.surfaceIds.includes(d.surface.id)) return u;
    return { ...u, surfaceIds: [...u.surfaceIds, d.surface.id] } as AssessmentUpgrade;
  });
  return { ...doc, surfaces: [...doc.surfaces.slice(0, at), d.surface, ...doc.surfaces.slice(at)], upgrades };
}

/** A copy right below the original, with new ids for it and its openings; it joins no upgrade list. */
export function duplicateSurfaceAt(doc: AssessmentDoc, index: number): { doc: AssessmentDoc; id: string } {
  const src = doc.surfaces[index]!;
  const copy: AssessmentSurface = { ...structuredClone(src), id: crypto.randomUUID(), name: `${src.name} (copy)`, openings: src.openings.map((o) => ({ ...o, id: crypto.randomUUID() })) };
  return { doc: { ...doc, surfaces: [...doc.surfaces.slice(0, index + 1), copy, ...doc.surfaces.slice(index + 1)] }, id: copy.id };
}

/**
 * Change a surface's kind; its layer stack follows when the old one was for another kind, and a
 * ceiling or floor faces "horizontal". It leaves upgrade lists of the old kind.
 */
export function setKindAt(doc: AssessmentDoc, index: number, kind: SurfaceKind): AssessmentDoc {
  const s = doc.surfaces[index]!;
  if (s.kind === kind) return doc;
  const stacks = stacksOf(doc);
  const fits = stacks.find((a) => a.key === s.assemblyKey)?.kind === kind;
  const next: AssessmentSurface = {
    ...s,
    kind,
    assemblyKey: fits ? s.assemblyKey : (stacks.find((a) => a.kind === kind)?.key ?? s.assemblyKey),
    orientation: kind === "wall" ? (s.orientation === "horizontal" ? "N" : s.orientation) : "horizontal",
  };
  const cleared = setProposed(doc, [s.id], null);
  return { ...cleared, surfaces: cleared.surfaces.map((x, j) => (j === index ? next : x)) };
}

/** Put a layer stack on the selected surfaces of its kind; the others are counted as skipped. */
export function bulkSetAssembly(doc: AssessmentDoc, ids: string[], key: string): { doc: AssessmentDoc; applied: number; skipped: number } {
  const stack = stacksOf(doc).find((a) => a.key === key);
  if (!stack) return { doc, applied: 0, skipped: ids.length };
  const chosen = new Set(ids);
  let applied = 0;
  let skipped = 0;
  const surfaces = doc.surfaces.map((s) => {
    if (!chosen.has(s.id)) return s;
    if (s.kind !== stack.kind) {
      skipped++;
      return s;
    }
    applied++;
    return { ...s, assemblyKey: key };
  });
  return { doc: { ...doc, surfaces }, applied, skipped };
}

export type SurfaceFigures = { uBefore: number; uAfter: number; uaBefore: number; uaAfter: number };
type EnvelopeLike = { surfaces: { id: string; uFactorIP: number; totalUA: number }[] };

/** U and UA per surface id, before and after the upgrades, from the live analysis. */
export function figuresById(baseline: EnvelopeLike, final: EnvelopeLike): Map<string, SurfaceFigures> {
  const after = new Map(final.surfaces.map((s) => [s.id, s]));
  const m = new Map<string, SurfaceFigures>();
  for (const b of baseline.surfaces) {
    const a = after.get(b.id) ?? b;
    m.set(b.id, { uBefore: b.uFactorIP, uAfter: a.uFactorIP, uaBefore: b.totalUA, uaAfter: a.totalUA });
  }
  return m;
}

export function openingsOf(s: AssessmentSurface): { count: number; areaFt2: number } {
  let count = 0;
  let areaFt2 = 0;
  for (const o of s.openings) {
    const n = o.count ?? 1;
    count += Number.isFinite(n) ? n : 0;
    areaFt2 += Number.isFinite(o.areaFt2 * n) ? o.areaFt2 * n : 0;
  }
  return { count, areaFt2 };
}

/** Totals for the footer: gross and opening area from the document, UA from the analysis when there is one. */
export function surfaceTotals(doc: AssessmentDoc, figures: Map<string, SurfaceFigures> | null) {
  let gross = 0;
  let openings = 0;
  let uaBefore = 0;
  let uaAfter = 0;
  for (const s of doc.surfaces) {
    if (Number.isFinite(s.grossAreaFt2)) gross += s.grossAreaFt2;
    openings += openingsOf(s).areaFt2;
    const f = figures?.get(s.id);
    if (f) {
      uaBefore += f.uaBefore;
      uaAfter += f.uaAfter;
    }
  }
  return { count: doc.surfaces.length, gross, openings, net: gross - openings, ua: figures ? { before: uaBefore, after: uaAfter } : null };
}
