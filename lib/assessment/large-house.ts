// A large invented house for speed checks: a 60-surface assessment (three storeys of wall
// bays on every side, attic and floor sections) with windows, doors, a blower-door reading and
// four upgrades. Deterministic, so the browser test and `npm run bench` measure the same house.
// The figures are made up; they are plausible, not taken from any real house.
import type { AssessmentDoc, AssessmentSurface, AssessmentUpgrade } from "./doc";

const sides = ["N", "E", "S", "W"] as const;

/** The job's document with its house replaced by the large one (ids stable per index). */
export function largeHouseDoc(base: AssessmentDoc, surfaceCount = 60): AssessmentDoc {
  const walls = Math.round(surfaceCount * (2 / 3));
  const ceilings = Math.ceil((surfaceCount - walls) / 2);
  const floors = surfaceCount - walls - ceilings;
  const surfaces: AssessmentSurface[] = [];
  for (let i = 0; i < walls; i++) {
    const side = sides[i % 4]!;
    const storey = 1 + (Math.floor(i / 4) % 3);
    const bay = 1 + Math.floor(i / 12);
    const openings: AssessmentSurface["openings"] = [];
    if (i % 3 !== 2) openings.push({ id: `large-w${i}-win`, kind: "window", areaFt2: 12 + (i % 4) * 2, count: 1 + (i % 2), productKey: i % 5 === 0 ? "window-single-nonmetal" : "window-double-nonmetal" });
    if (storey === 1 && bay === 1) openings.push({ id: `large-w${i}-door`, kind: "door", areaFt2: 20, count: 1, productKey: "door-wood" });
    surfaces.push({
      id: `large-wall-${i}`, name: `Storey ${storey} ${side} wall, bay ${bay}`, kind: "wall", orientation: side,
      grossAreaFt2: 110 + ((i * 37) % 60), assemblyKey: i % 7 === 3 ? "wall-1920s-2x4-half-filled" : "wall-1920s-2x4-empty", openings,
    });
  }
  for (let i = 0; i < ceilings; i++) {
    surfaces.push({ id: `large-ceiling-${i}`, name: `Attic floor, section ${i + 1}`, kind: "ceiling", orientation: "horizontal", grossAreaFt2: 150 + ((i * 23) % 40), assemblyKey: i % 4 === 0 ? "ceiling-attic-2x6-old-mineral-fibre" : "ceiling-attic-2x6-empty", openings: [] });
  }
  for (let i = 0; i < floors; i++) {
    surfaces.push({ id: `large-floor-${i}`, name: `Floor over basement, section ${i + 1}`, kind: "floor", orientation: "horizontal", grossAreaFt2: 150 + ((i * 19) % 40), assemblyKey: "floor-2x8-over-basement", openings: [], bufferFactor: 0.5 });
  }
  const floorAreaFt2 = 3 * surfaces.filter((s) => s.kind === "ceiling").reduce((a, s) => a + s.grossAreaFt2, 0);
  const upgrades: AssessmentUpgrade[] = [
    { id: "large-upg-walls", type: "dense-pack-walls", name: "Dense-pack the wall bays", surfaceIds: "all-walls", costUSD: 14_500, lifeYears: 30 },
    { id: "large-upg-attic", type: "attic-insulation", name: "Attic to R-49", surfaceIds: "all-ceilings", targetRIP: 49, costUSD: 4_200, lifeYears: 30 },
    { id: "large-upg-air", type: "air-sealing", name: "Air sealing", targetCfm50: 3_600, costUSD: 2_400, lifeYears: 15 },
    { id: "large-upg-windows", type: "windows", name: "Replace the windows", surfaceIds: "all", uFactorIP: 0.28, costUSD: 38_000, lifeYears: 30 },
  ];
  return {
    ...base,
    house: {
      ...base.house,
      yearBuilt: 1912, stories: 3, floorAreaFt2, volumeFt3: floorAreaFt2 * 8.5, ceilingHeightFt: 8.5, bedrooms: 5,
      foundation: "basement", shielding: "normal", indoorTempF: 68, indoorRH: 0.35,
      climate: { source: "station", wmo: "725020" },
      hazards: { knobAndTube: "unknown", vermiculite: "absent", leadPaint: "unknown", combustionAppliances: ["gas boiler", "gas water heater"] },
    },
    heating: { fuel: "natural-gas", efficiency: { kind: "afue", value: 0.8 }, pricePerUnitUSD: 1.55 },
    leakage: { tests: [{ id: "large-test-in", phase: "test-in", cfm50: 6_400, testedAt: Date.UTC(2026, 10, 3, 15), outdoorTempF: 41, windMph: 6, notes: "Invented reading for the speed check." }], targetCfm50: 3_600 },
    surfaces,
    assemblies: [],
    upgrades,
  };
}
