// docIssues checks the document part by part, remembering the reasons of parts it has seen; it
// must say exactly what one whole-document parse with the API's schema says, in the same order.
import { describe, expect, it } from "vitest";
import { removeSurfaceAt } from "@/components/assessment/surface-edits";
import { setAt } from "@/components/assessment/context";
import { assessmentDocSchema, type AssessmentDoc } from "@/lib/assessment/doc";
import { largeHouseDoc } from "@/lib/assessment/large-house";
import { docIssues } from "@/lib/hooks/use-assessment";

const base = largeHouseDoc({
  house: { yearBuilt: 1930, stories: 2, floorAreaFt2: 1500, volumeFt3: 12000, ceilingHeightFt: 8, bedrooms: 3, foundation: "basement", shielding: "normal", indoorTempF: 70, indoorRH: 0.4, climate: null, hazards: { knobAndTube: "unknown", vermiculite: "unknown", combustionAppliances: [] } },
  heating: { fuel: "natural-gas", efficiency: { kind: "afue", value: 0.8 }, pricePerUnitUSD: 1.5 },
  leakage: { tests: [] },
  surfaces: [],
  assemblies: [],
  upgrades: [],
});

function whole(doc: AssessmentDoc) {
  const r = assessmentDocSchema.safeParse(doc);
  return r.success ? [] : r.error.issues.map((i) => ({ path: i.path.join("."), message: i.message }));
}

describe("docIssues", () => {
  it("finds nothing in the 60-surface house, as the whole-document parse", () => {
    expect(whole(base)).toEqual([]);
    expect(docIssues(base)).toEqual([]);
  });

  it("names the same fields with the same messages, in the same order, as the whole parse", () => {
    let d = setAt(base, ["surfaces", 30, "grossAreaFt2"], -40);
    d = setAt(d, ["house", "yearBuilt"], Number.NaN);
    d = setAt(d, ["upgrades", 0, "pricing"], { totalOverride: { cents: 5000, reason: " " } });
    d = setAt(d, ["surfaces", 2, "openings", 0, "areaFt2"], "12");
    const expected = whole(d);
    expect(expected.map((i) => i.path)).toEqual(expect.arrayContaining(["house.yearBuilt", "surfaces.30.grossAreaFt2", "upgrades.0.pricing.totalOverride.reason"]));
    expect(docIssues(d)).toEqual(expected);
    // Asked again (every part remembered), the answer is the same.
    expect(docIssues(d)).toEqual(expected);
  });

  it("follows a remembered surface to its new index when one before it is deleted", () => {
    const bad = setAt(base, ["surfaces", 30, "grossAreaFt2"], 0);
    expect(docIssues(bad).map((i) => i.path)).toEqual(["surfaces.30.grossAreaFt2"]);
    const moved = removeSurfaceAt(bad, 3).doc;
    expect(docIssues(moved)).toEqual(whole(moved));
    expect(docIssues(moved).map((i) => i.path)).toEqual(["surfaces.29.grossAreaFt2"]);
    // Fixed, it is clean again.
    expect(docIssues(setAt(moved, ["surfaces", 29, "grossAreaFt2"], 120))).toEqual([]);
  });

  it("checks the list limits of the whole document", () => {
    const many = { ...base, upgrades: Array.from({ length: 31 }, (_, i) => ({ ...base.upgrades[2]!, id: `u${i}` })) };
    expect(docIssues(many)).toEqual(whole(many));
    expect(docIssues(many).length).toBeGreaterThan(0);
  });
});
