// The demo house of PRODUCT.md (invented): a 1928 two-storey wood-frame house,
// 1,650 ft², 25 × 33 ft footprint, 9 ft per storey outside (8.5 ft ceilings).
// Areas, windows, doors, prices and costs are invented for the demo.
import type { HouseInput } from "./schema";

const win = (count: number) => ({ kind: "window" as const, areaFt2: 12, count, productKey: "window-single-nonmetal" });
const door = { kind: "door" as const, areaFt2: 20, productKey: "door-wood" };

export const demoHouseInput = {
  name: "Demo house, 1928 two-storey",
  yearBuilt: 1928,
  stories: 2,
  floorAreaFt2: 1650,
  volumeFt3: 14_025,
  bedrooms: 3,
  storeyHeightFt: 9,
  indoorTempF: 70,
  indoorRH: 0.4,
  climate: { source: "station", wmo: "725020" },
  designPercentile: "99",
  heating: { fuel: "natural-gas", efficiency: { kind: "afue", value: 0.78 }, pricePerUnitUSD: 1.6 },
  blowerDoor: { cfm50TestIn: 3900 },
  infiltration: { method: "n-factor", nFactorZone: 2, shielding: "normal", shelterClass: 4 },
  surfaces: [
    { id: "wall-n", name: "North wall", kind: "wall", orientation: "N", grossAreaFt2: 594, heightFt: 18, assemblyKey: "wall-1920s-2x4-half-filled", openings: [win(3), door] },
    { id: "wall-s", name: "South wall", kind: "wall", orientation: "S", grossAreaFt2: 594, heightFt: 18, assemblyKey: "wall-1920s-2x4-empty", openings: [win(6), door] },
    { id: "wall-e", name: "East wall", kind: "wall", orientation: "E", grossAreaFt2: 450, heightFt: 18, assemblyKey: "wall-1920s-2x4-empty", openings: [win(4)], blockedBayFraction: 0.25 },
    { id: "wall-w", name: "West wall", kind: "wall", orientation: "W", grossAreaFt2: 450, heightFt: 18, assemblyKey: "wall-1920s-2x4-empty", openings: [win(4)], blockedBayFraction: 0.25 },
    { id: "attic", name: "Attic floor", kind: "ceiling", orientation: "horizontal", grossAreaFt2: 825, assemblyKey: "ceiling-attic-2x6-old-mineral-fibre" },
    { id: "floor", name: "Floor over basement", kind: "floor", orientation: "horizontal", grossAreaFt2: 825, assemblyKey: "floor-2x8-over-basement", bufferFactor: 0.5 },
  ],
  upgrades: [
    { type: "air-sealing", name: "Air-seal the attic floor", targetCfm50: 2400, costUSD: 1800 },
    { type: "attic-insulation", name: "Attic insulation to R-49", targetRIP: 49, costUSD: 2600 },
    { type: "dense-pack-walls", name: "Dense-pack all exterior walls", surfaceIds: "all-walls", costUSD: 5200 },
  ],
  facts: { knobAndTube: "unknown", vermiculite: "absent" },
} satisfies HouseInput;
