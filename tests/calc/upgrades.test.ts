import { describe, expect, it } from "vitest";
import { analyzeHouse, applyUpgrade, builtInAssemblies, CalcInputError, demoHouseInput, nominalInsulationR, type HouseInput, type HouseState } from "@/calc";

const demo = (): HouseInput => structuredClone(demoHouseInput) as HouseInput;
const state = (): HouseState => ({ assemblies: new Map(builtInAssemblies.map((a) => [a.key, a])), surfaces: structuredClone(demoHouseInput.surfaces) as HouseState["surfaces"], cfm50: 3900 });

describe("upgrades applied in sequence (METHODS.md §4)", () => {
  it("dense-pack on chosen surfaces only; other walls keep their assembly", () => {
    const r = applyUpgrade(state(), { type: "dense-pack-walls", surfaceIds: ["wall-e"], costUSD: 1 }, "upgrades.0");
    expect(r.state.surfaces.find((s) => s.id === "wall-e")!.assemblyKey).toBe("wall-1920s-2x4-empty+dense-pack");
    expect(r.state.surfaces.find((s) => s.id === "wall-w")!.assemblyKey).toBe("wall-1920s-2x4-empty");
  });
  it("dense-pack refuses a ceiling, naming the path", () => {
    expect(() => applyUpgrade(state(), { type: "dense-pack-walls", surfaceIds: ["attic"], costUSD: 1 }, "upgrades.2")).toThrow(CalcInputError);
    expect(() => applyUpgrade(state(), { type: "dense-pack-walls", surfaceIds: ["attic"], costUSD: 1 }, "upgrades.2")).toThrow(/upgrades\.2\.surfaceIds\.0/);
  });
  it("attic insulation adds nothing where the ceiling already meets the target", () => {
    const r38 = builtInAssemblies.find((a) => a.key === "ceiling-attic-2x6-r38")!;
    // R-19 batts (dataset R_SI 3.32) + R-38 (6.77): nominal ≈ 57.3, above R-49
    expect(nominalInsulationR(r38)).toBeGreaterThan(49);
    const s = state();
    s.surfaces = s.surfaces.map((x) => (x.id === "attic" ? { ...x, assemblyKey: "ceiling-attic-2x6-r38" } : x));
    const r = applyUpgrade(s, { type: "attic-insulation", surfaceIds: "all-ceilings", targetRIP: 49, costUSD: 1 }, "upgrades.0");
    expect((r.details.added as { addedRIP: number }[])[0].addedRIP).toBe(0);
  });
  it("windows: every window on the chosen surfaces gets the new whole-unit U", () => {
    const r = applyUpgrade(state(), { type: "windows", surfaceIds: "all", uFactorIP: 0.3, costUSD: 1 }, "upgrades.0");
    expect(r.details.windowsReplaced).toBe(17); // 3 + 6 + 4 + 4 demo windows
    for (const s of r.state.surfaces) for (const o of s.openings ?? []) if (o.kind === "window") expect(o.uFactorIP).toBe(0.3);
  });
  it("the package never double counts: reordering keeps the package total (linear degree-day model: measures on different terms are independent)", () => {
    const a = demo();
    const b = demo();
    b.upgrades = [...b.upgrades!].reverse();
    const ra = analyzeHouse(a);
    const rb = analyzeHouse(b);
    expect(rb.package.savings.usd).toBeCloseTo(ra.package.savings.usd, 8);
  });
  it("overlapping measures are sequenced: R-49 after R-30 saves only the step from R-30", () => {
    const h = demo();
    h.upgrades = [{ type: "attic-insulation", targetRIP: 30, costUSD: 1 }, { type: "attic-insulation", targetRIP: 49, costUSD: 1 }];
    const seq = analyzeHouse(h);
    const only49 = demo();
    only49.upgrades = [{ type: "attic-insulation", targetRIP: 49, costUSD: 1 }];
    const one = analyzeHouse(only49);
    expect(seq.upgrades[0].savings.usd + seq.upgrades[1].savings.usd).toBeCloseTo(one.upgrades[0].savings.usd, 8);
    expect(seq.upgrades[1].savings.usd).toBeLessThan(one.upgrades[0].savings.usd);
    const d = seq.upgrades[1].details as { added: { existingRIP: number }[] };
    expect(d.added[0].existingRIP).toBeCloseTo(30, 9);
  });
  it("air sealing below the current leakage is required at its step", () => {
    const h = demo();
    h.upgrades = [{ type: "air-sealing", targetCfm50: 2400, costUSD: 1 }, { type: "air-sealing", targetCfm50: 3000, costUSD: 1 }];
    expect(() => analyzeHouse(h)).toThrow(/upgrades\.1\.targetCfm50/);
  });
});
