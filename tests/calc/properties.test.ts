// Property tests (fast-check): invariants the methods must keep for any valid input.
import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { analyzeHouse, CalcInputError, computeAssembly, demoHouseInput, type AssemblyDef, type HouseInput } from "@/calc";

const demo = (): HouseInput => structuredClone(demoHouseInput) as HouseInput;

const houseArb = fc.record({
  scale: fc.double({ min: 0.2, max: 5, noNaN: true }),
  cfm50: fc.double({ min: 200, max: 12_000, noNaN: true }),
  tighten: fc.double({ min: 0.1, max: 0.95, noNaN: true }),
  afue: fc.double({ min: 0.5, max: 0.98, noNaN: true }),
  price: fc.double({ min: 0, max: 10, noNaN: true }),
  attic: fc.double({ min: 1, max: 90, noNaN: true }),
  zone: fc.constantFrom(1, 2, 3, 4) as fc.Arbitrary<1 | 2 | 3 | 4>,
  method: fc.constantFrom("n-factor", "ashrae-basic") as fc.Arbitrary<"n-factor" | "ashrae-basic">,
  stories: fc.constantFrom(1, 1.5, 2, 3),
  wmo: fc.constantFrom("725020", "723860", "722020", "725300", "724699"),
  fill: fc.double({ min: 0, max: 1, noNaN: true }),
});

type P = typeof houseArb extends fc.Arbitrary<infer T> ? T : never;

function house(p: P): HouseInput {
  const h = demo();
  h.volumeFt3 = 14_025 * p.scale;
  h.floorAreaFt2 = 1650 * p.scale;
  h.stories = p.stories;
  h.surfaces = h.surfaces!.map((s) => ({ ...s, grossAreaFt2: s.grossAreaFt2 * p.scale, openings: (s.openings ?? []).map((o) => ({ ...o, areaFt2: o.areaFt2 * p.scale })) }));
  h.blowerDoor = { cfm50TestIn: p.cfm50 };
  h.heating = { fuel: "natural-gas", efficiency: { kind: "afue", value: p.afue }, pricePerUnitUSD: p.price };
  h.infiltration = { method: p.method, nFactorZone: p.zone };
  h.climate = { source: "station", wmo: p.wmo };
  h.upgrades = [
    { type: "air-sealing", targetCfm50: p.cfm50 * p.tighten, costUSD: 1000 },
    { type: "attic-insulation", targetRIP: p.attic, costUSD: 1000 },
    { type: "dense-pack-walls", surfaceIds: "all-walls", costUSD: 1000 },
    { type: "windows", uFactorIP: 0.3, costUSD: 1000 },
  ];
  return h;
}

const finite = (x: unknown): boolean =>
  typeof x === "number" ? Number.isFinite(x) : x && typeof x === "object" ? Object.values(x).every(finite) : true;

describe("properties (fast-check)", () => {
  it("any valid input → every number in the result is finite", () => {
    fc.assert(fc.property(houseArb, (p) => finite(analyzeHouse(house(p)))), { numRuns: 150 });
  });

  it("savings never exceed the baseline, and no upgrade here raises use", () => {
    fc.assert(fc.property(houseArb, (p) => {
      const r = analyzeHouse(house(p));
      expect(r.package.savings.fuelUnits).toBeLessThanOrEqual(r.baseline.energy.fuelUnits + 1e-9);
      expect(r.final.energy.fuelUnits).toBeGreaterThanOrEqual(0);
      for (const u of r.upgrades) expect(u.savings.fuelUnits).toBeGreaterThanOrEqual(-1e-9);
    }), { numRuns: 150 });
  });

  it("a tighter house never uses more energy", () => {
    fc.assert(fc.property(houseArb, fc.double({ min: 0.05, max: 1, noNaN: true }), (p, k) => {
      const loose = house(p);
      loose.upgrades = [];
      const tight = structuredClone(loose);
      tight.blowerDoor = { cfm50TestIn: p.cfm50 * k };
      expect(analyzeHouse(tight).baseline.energy.fuelUnits).toBeLessThanOrEqual(analyzeHouse(loose).baseline.energy.fuelUnits + 1e-9);
    }), { numRuns: 100 });
  });

  it("more insulation never raises U (cavity fill share, fill R, added continuous layer; both methods)", () => {
    const wall = (fillFraction: number, fillR: number, extraIn: number): AssemblyDef => ({
      key: "p", name: "p", kind: "wall", construction: "wood-frame",
      layers: [{ materialKey: "film-outside" }, { materialKey: "wood-bevel-siding-0.5x8" }, ...(extraIn > 0 ? [{ materialKey: "eps-per-inch", thicknessIn: extraIn }] : []),
        { framed: { member: "2x4", cavityFill: "batt-r13-3.5in", fillFraction, fillRValueIP: fillR } }, { materialKey: "gypsum-board-0.5in" }, { materialKey: "film-inside-wall" }],
    });
    const arb = fc.tuple(fc.double({ min: 0, max: 1, noNaN: true }), fc.double({ min: 0.1, max: 30, noNaN: true }), fc.double({ min: 0, max: 4, noNaN: true }));
    fc.assert(fc.property(arb, arb, ([f1, r1, e1], [f2, r2, e2]) => {
      const lo = computeAssembly(wall(Math.min(f1, f2), Math.min(r1, r2), Math.min(e1, e2)));
      const hi = computeAssembly(wall(Math.max(f1, f2), Math.max(r1, r2), Math.max(e1, e2)));
      // more fill only helps when the fill beats the empty air space it replaces (F04, R 0.85)
      if (Math.min(r1, r2) < 0.86) return;
      expect(hi.parallelPath.uFactorIP).toBeLessThanOrEqual(lo.parallelPath.uFactorIP + 1e-12);
      expect(hi.isothermalPlanes.uFactorIP).toBeLessThanOrEqual(lo.isothermalPlanes.uFactorIP + 1e-12);
    }), { numRuns: 300 });
  });

  it("invalid numbers are refused with an error naming the field path", () => {
    const bad = fc.oneof(fc.constant(NaN), fc.constant(Infinity), fc.constant(-Infinity), fc.double({ max: -1e-6, noNaN: true }), fc.constant(0), fc.double({ min: 1e9, max: 1e300, noNaN: true }));
    const fields: [string, (h: HouseInput, v: number) => void][] = [
      ["volumeFt3", (h, v) => { h.volumeFt3 = v; }],
      ["floorAreaFt2", (h, v) => { h.floorAreaFt2 = v; }],
      ["blowerDoor.cfm50TestIn", (h, v) => { h.blowerDoor.cfm50TestIn = v; }],
      ["surfaces.0.grossAreaFt2", (h, v) => { h.surfaces![0].grossAreaFt2 = v; }],
      ["surfaces.3.openings.0.areaFt2", (h, v) => { h.surfaces![3].openings![0].areaFt2 = v; }],
    ];
    fc.assert(fc.property(bad, fc.constantFrom(...fields), (v, [path, set]) => {
      const h = demo();
      set(h, v);
      try { analyzeHouse(h); return false; } catch (e) {
        return e instanceof CalcInputError && e.issues.some((i) => i.path === path);
      }
    }), { numRuns: 200 });
  });

  it("framing fraction outside 0–1 is refused with its path", () => {
    fc.assert(fc.property(fc.oneof(fc.double({ max: -1e-9, noNaN: true }), fc.double({ min: 1.000001, max: 1e6, noNaN: true })), (ff) => {
      const h = demo();
      h.assemblies = [{ key: "mine", name: "mine", kind: "wall", construction: "wood-frame", layers: [{ framed: { member: "2x4", cavityFill: null, framingFraction: ff } }] }];
      try { analyzeHouse(h); return false; } catch (e) {
        return e instanceof CalcInputError && e.issues.some((i) => i.path === "assemblies.0.layers.0.framed.framingFraction");
      }
    }), { numRuns: 100 });
  });
});
