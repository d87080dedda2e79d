// The material library grouped by category for the pickers, with a plain search.
import type { FramingMember } from "@/calc/assemblies";
import { materials, type Material, type MaterialCategory } from "@/calc/materials";

export const CATEGORY_LABELS: Record<MaterialCategory, string> = {
  "air-film": "Air films", siding: "Siding and cladding", sheathing: "Sheathing", membrane: "Membranes",
  masonry: "Masonry", insulation: "Insulation", "air-space": "Air spaces", "interior-finish": "Interior finishes", framing: "Framing (solid)",
};
const ORDER = Object.keys(CATEGORY_LABELS) as MaterialCategory[];

export interface MaterialGroup { category: MaterialCategory; label: string; items: Material[] }

/** Materials whose name, key or category contains every word of the query, grouped in picker order. */
export function groupMaterials(query: string, keep: (m: Material) => boolean = () => true, list: readonly Material[] = materials): MaterialGroup[] {
  const words = query.toLowerCase().split(/\s+/).filter(Boolean);
  const hit = (m: Material) => {
    const hay = `${m.name} ${m.key} ${CATEGORY_LABELS[m.category]}`.toLowerCase();
    return words.every((w) => hay.includes(w));
  };
  return ORDER.map((category) => ({ category, label: CATEGORY_LABELS[category], items: list.filter((m) => m.category === category && keep(m) && hit(m)) })).filter((g) => g.items.length > 0);
}

/** What can fill a cavity: insulation (loose, batt or board). */
export const isCavityFill = (m: Material) => m.category === "insulation";

export const MEMBER_LABELS: Record<FramingMember, string> = {
  "2x3": "2×3", "2x4": "2×4", "2x6": "2×6", "2x8": "2×8", "2x10": "2×10", "2x12": "2×12",
  "rough-2x4": "Rough-sawn 2×4 (full 4 in.)", "1x2-furring": "1×2 furring", custom: "Custom depth",
};
