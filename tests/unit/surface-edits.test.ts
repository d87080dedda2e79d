import { describe, expect, it } from "vitest";
import { bulkSetAssembly, duplicateSurfaceAt, proposedUpgradeId, removeSurfaceAt, restoreSurface, setKindAt, setProposed, surfaceTotals, upgradesCoveringNothing } from "@/components/assessment/surface-edits";
import type { AssessmentDoc, AssessmentSurface } from "@/lib/assessment/doc";

const wall = (id: string, area = 100): AssessmentSurface => ({ id, name: id, kind: "wall", orientation: "N", grossAreaFt2: area, assemblyKey: "wall-1920s-2x4-empty", openings: [] });
const ceiling = (id: string): AssessmentSurface => ({ id, name: id, kind: "ceiling", orientation: "horizontal", grossAreaFt2: 500, assemblyKey: "ceiling-attic-2x6-empty", openings: [] });

function doc(upgrades: AssessmentDoc["upgrades"] = []): AssessmentDoc {
  return {
    house: { yearBuilt: 1930, stories: 2, floorAreaFt2: 1500, volumeFt3: 12000, ceilingHeightFt: 8, bedrooms: 3, foundation: "basement", shielding: "normal", indoorTempF: 70, indoorRH: 0.4, climate: null, hazards: { knobAndTube: "unknown", vermiculite: "unknown", combustionAppliances: [] } },
    heating: { fuel: "natural-gas", efficiency: { kind: "afue", value: 0.8 }, pricePerUnitUSD: 1.5 },
    leakage: { tests: [] },
    surfaces: [wall("a"), wall("b", 200), wall("c"), ceiling("top")],
    assemblies: [],
    upgrades,
  };
}
const dp = (surfaceIds: "all-walls" | string[]) => ({ id: "dp", type: "dense-pack-walls" as const, name: "Dense-pack", surfaceIds, costUSD: 1000 });
const attic = { id: "att", type: "attic-insulation" as const, surfaceIds: "all-ceilings" as const, targetRIP: 49, costUSD: 800 };

describe("proposed layer stack = the upgrade that covers the surface", () => {
  it("takes a wall out of an all-walls upgrade as an explicit list, and back in as all-walls", () => {
    const d0 = doc([dp("all-walls"), attic]);
    expect(proposedUpgradeId(d0, d0.surfaces[1]!)).toBe("dp");
    const d1 = setProposed(d0, ["b"], null);
    expect(d1.upgrades[0]!).toMatchObject({ surfaceIds: ["a", "c"] });
    expect(proposedUpgradeId(d1, d1.surfaces[1]!)).toBe("");
    const d2 = setProposed(d1, ["b", "top"], "dp");
    expect(d2.upgrades[0]!).toMatchObject({ surfaceIds: "all-walls" });
    // The ceiling is not a wall: the attic upgrade that covers it is untouched.
    expect(d2.upgrades[1]).toBe(d1.upgrades[1]);
  });

  it("says when an upgrade's own list is left empty", () => {
    const d = setProposed(doc([dp(["a"])]), ["a"], null);
    expect(upgradesCoveringNothing(d).map((u) => u.id)).toEqual(["dp"]);
  });
});

describe("delete and undo", () => {
  it("puts the surface back in place and back into the upgrade lists that named it", () => {
    const d0 = doc([dp(["a", "b"])]);
    const { doc: d1, deleted } = removeSurfaceAt(d0, 1);
    expect(d1.surfaces.map((s) => s.id)).toEqual(["a", "c", "top"]);
    expect(d1.upgrades[0]).toMatchObject({ surfaceIds: ["a"] });
    const d2 = restoreSurface(d1, deleted);
    expect(d2.surfaces.map((s) => s.id)).toEqual(["a", "b", "c", "top"]);
    expect(d2.upgrades[0]).toMatchObject({ surfaceIds: ["a", "b"] });
  });
});

describe("duplicate, kind and bulk edits", () => {
  it("duplicates below the original with fresh ids", () => {
    const src = { ...doc(), surfaces: [{ ...wall("a"), openings: [{ id: "w1", kind: "window" as const, areaFt2: 12, count: 2, productKey: "window-double-nonmetal" }] }] };
    const { doc: d, id } = duplicateSurfaceAt(src, 0);
    expect(d.surfaces).toHaveLength(2);
    expect(d.surfaces[1]!.id).toBe(id);
    expect(id).not.toBe("a");
    expect(d.surfaces[1]!.name).toBe("a (copy)");
    expect(d.surfaces[1]!.openings[0]!.id).not.toBe("w1");
    expect(d.surfaces[1]!.openings[0]!.areaFt2).toBe(12);
  });

  it("a wall turned ceiling gets a ceiling stack, faces horizontal and leaves the wall upgrade", () => {
    const d = setKindAt(doc([dp(["a", "b"])]), 0, "ceiling");
    expect(d.surfaces[0]).toMatchObject({ kind: "ceiling", orientation: "horizontal", assemblyKey: "ceiling-attic-2x6-empty" });
    expect(d.upgrades[0]).toMatchObject({ surfaceIds: ["b"] });
  });

  it("bulk-sets a stack only on surfaces of its kind and counts the others", () => {
    const r = bulkSetAssembly(doc(), ["a", "c", "top"], "wall-2x4-r13");
    expect(r.applied).toBe(2);
    expect(r.skipped).toBe(1);
    expect(r.doc.surfaces.map((s) => s.assemblyKey)).toEqual(["wall-2x4-r13", "wall-1920s-2x4-empty", "wall-2x4-r13", "ceiling-attic-2x6-empty"]);
  });

  it("totals gross and opening areas, skipping a box that is not a number yet", () => {
    const d = doc();
    d.surfaces[0] = { ...d.surfaces[0]!, openings: [{ kind: "window", areaFt2: 15, count: 2, productKey: "window-double-nonmetal" }] };
    d.surfaces[2] = { ...d.surfaces[2]!, grossAreaFt2: Number.NaN };
    const t = surfaceTotals(d, null);
    expect(t).toMatchObject({ count: 4, gross: 800, openings: 30, net: 770, ua: null });
  });
});
