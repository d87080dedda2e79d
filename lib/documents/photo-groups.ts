// How photos are laid out wherever a document shows them (the picker before issuing, the report on
// screen, the PDF): before/after pairs side by side per surface first, then the rest by tag.
import { photoTagLabels, photoTagList, type PhotoTagName } from "@/lib/photos/tags";

type Arrangeable = { id: string; tag: PhotoTagName; surfaceId: string | null; surfaceLabel: string | null };

export type PhotoPair<P> = { key: string; label: string; before: P; after: P };
export type PhotoGroup<P> = { tag: PhotoTagName; label: string; photos: P[] };

/**
 * For each surface (and the job as a whole), befores and afters are paired in the order given
 * (first with first, and so on); what is left over, and every during and thermal photo, is grouped
 * by tag in the order before, during, after, thermal.
 */
export function arrangePhotos<P extends Arrangeable>(photos: P[]): { pairs: PhotoPair<P>[]; groups: PhotoGroup<P>[] } {
  const bySurface = new Map<string, { label: string; before: P[]; after: P[] }>();
  for (const p of photos) {
    if (p.tag !== "before" && p.tag !== "after") continue;
    const key = p.surfaceId ?? "job";
    const g = bySurface.get(key) ?? { label: p.surfaceLabel ?? "Whole house", before: [], after: [] };
    g[p.tag].push(p);
    bySurface.set(key, g);
  }
  const pairs: PhotoPair<P>[] = [];
  const paired = new Set<string>();
  for (const [key, g] of bySurface) {
    const n = Math.min(g.before.length, g.after.length);
    for (let i = 0; i < n; i++) {
      pairs.push({ key: `${key}-${i}`, label: g.label, before: g.before[i]!, after: g.after[i]! });
      paired.add(g.before[i]!.id).add(g.after[i]!.id);
    }
  }
  const groups = photoTagList
    .map((tag) => ({ tag, label: photoTagLabels[tag], photos: photos.filter((p) => p.tag === tag && !paired.has(p.id)) }))
    .filter((g) => g.photos.length > 0);
  return { pairs, groups };
}

/** The ids in the order the document shows them. */
export function arrangedIds(arranged: { pairs: PhotoPair<{ id: string }>[]; groups: PhotoGroup<{ id: string }>[] }): string[] {
  return [...arranged.pairs.flatMap((p) => [p.before.id, p.after.id]), ...arranged.groups.flatMap((g) => g.photos.map((p) => p.id))];
}
