import { describe, expect, it } from "vitest";
import { AIR_BTUH_PER_CFM_F, builtInAssemblies, CalcInputError, computeAssembly, computeEnvelope, designHeatLoad, type SurfaceDef } from "@/calc";

const lookup = (k: string) => computeAssembly(builtInAssemblies.find((a) => a.key === k)!);

describe("envelope UA and design load (METHODS.md §2)", () => {
  const surfaces: SurfaceDef[] = [
    { id: "w", name: "Wall", kind: "wall", orientation: "S", grossAreaFt2: 400, assemblyKey: "wall-2x4-r13", openings: [{ kind: "window", areaFt2: 15, count: 2, uFactorIP: 0.3 }, { kind: "door", areaFt2: 20, productKey: "door-wood" }] },
    { id: "c", name: "Ceiling", kind: "ceiling", orientation: "horizontal", grossAreaFt2: 500, assemblyKey: "ceiling-attic-2x6-r38" },
  ];
  const env = computeEnvelope(surfaces, (k) => lookup(k));

  it("net area and UA per surface: UA = U·A_net + Σ U_opening·A_opening", () => {
    const uw = lookup("wall-2x4-r13").uFactorIP;
    // net = 400 − 2·15 − 20 = 350 ft²; door U 0.50 (IECC default opaque door table, from memory)
    expect(env.surfaces[0].netAreaFt2).toBe(350);
    expect(env.surfaces[0].totalUA).toBeCloseTo(uw * 350 + 0.3 * 30 + 0.5 * 20, 10);
    expect(env.ua.windows).toBeCloseTo(9, 10);
    expect(env.ua.doors).toBeCloseTo(10, 10);
    expect(env.totalUA).toBeCloseTo(env.surfaces[0].totalUA + env.surfaces[1].totalUA, 10);
  });

  it("1.08 = 60 min/h × 0.075 lb/ft³ × 0.24 Btu/lb·°F (standard air, METHODS.md §2)", () => {
    expect(AIR_BTUH_PER_CFM_F).toBeCloseTo(1.08, 12);
  });

  it("design load q = (UA + 1.08·CFM)·ΔT, with shares summing to 1", () => {
    const q = designHeatLoad(env, 100, 70, 10);
    expect(q.totalBtuh).toBeCloseTo((env.totalUA + 108) * 60, 8);
    const s = q.share;
    expect(s.walls + s.ceilings + s.floors + s.windows + s.doors + s.infiltration).toBeCloseTo(1, 12);
  });

  it("a buffer factor scales the surface's UA (common practice for unheated basements)", () => {
    const half = computeEnvelope([{ ...surfaces[1], bufferFactor: 0.5 }], (k) => lookup(k));
    expect(half.totalUA).toBeCloseTo(env.surfaces[1].totalUA / 2, 10);
  });

  it("openings larger than the surface are refused with the path", () => {
    const bad: SurfaceDef[] = [{ ...surfaces[0], openings: [{ kind: "window", areaFt2: 500, uFactorIP: 0.5 }] }];
    expect(() => computeEnvelope(bad, (k) => lookup(k))).toThrow(CalcInputError);
    expect(() => computeEnvelope(bad, (k) => lookup(k))).toThrow(/surfaces\.0\.openings/);
  });
});
