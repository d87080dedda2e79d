import type { HouseInput } from "@/calc/schema";
import { latestTest, type AssessmentDoc } from "./doc";

const nFactorZoneByDefault = 2 as const;

/**
 * The assessment as calc's house input: the same function runs in the browser (live results)
 * and on the server (recompute on save), so both show the same figures.
 */
export function toHouseInput(doc: AssessmentDoc): HouseInput {
  const h = doc.house;
  const testIn = latestTest(doc, "test-in");
  const testOut = latestTest(doc, "test-out");
  return {
    yearBuilt: h.yearBuilt,
    stories: h.stories,
    floorAreaFt2: h.floorAreaFt2,
    volumeFt3: h.volumeFt3,
    bedrooms: h.bedrooms,
    indoorTempF: h.indoorTempF,
    indoorRH: h.indoorRH,
    // A job without a climate yet: calc then reports "climate is required" against house.climate.
    climate: (h.climate ?? undefined) as HouseInput["climate"],
    heating: doc.heating,
    blowerDoor: { cfm50TestIn: testIn?.cfm50 ?? Number.NaN, ...(testOut ? { cfm50TestOut: testOut.cfm50 } : {}) },
    infiltration: { method: "n-factor", nFactorZone: nFactorZoneByDefault, shielding: h.shielding },
    surfaces: doc.surfaces.map((s) => ({ ...s, openings: s.openings.map(({ id: _id, ...o }) => (void _id, o)) })),
    assemblies: doc.assemblies,
    upgrades: doc.upgrades.map(({ id: _id, priceBookItemId: _p, pricing: _q, ...u }) => (void _id, void _p, void _q, u)) as HouseInput["upgrades"],
    facts: {
      knobAndTube: h.hazards.knobAndTube,
      vermiculite: h.hazards.vermiculite,
      combustionAppliances: h.hazards.combustionAppliances.length > 0 ? true : undefined,
    },
  };
}

const topLevelHouse = new Set(["yearBuilt", "stories", "floorAreaFt2", "volumeFt3", "bedrooms", "indoorTempF", "indoorRH", "climate"]);

/** calc's error path (e.g. "yearBuilt", "blowerDoor.cfm50TestIn") → the assessment field it came from. */
export function docPath(calcPath: string, doc: AssessmentDoc): string {
  const [head, ...rest] = calcPath.split(".");
  if (topLevelHouse.has(head!)) return ["house", head, ...rest].join(".");
  if (head === "blowerDoor") {
    const phase = rest[0] === "cfm50TestOut" ? "test-out" : "test-in";
    const t = latestTest(doc, phase);
    const i = t ? doc.leakage.tests.indexOf(t) : -1;
    return i >= 0 ? `leakage.tests.${i}.cfm50` : "leakage.tests";
  }
  if (head === "facts") return ["house", "hazards", ...rest].join(".");
  if (head === "infiltration" && rest[0] === "shielding") return "house.shielding";
  return calcPath;
}
