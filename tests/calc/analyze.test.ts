import { describe, expect, it } from "vitest";
import { analyzeHouse, CalcInputError, demoHouseInput, houseInputSchema, softWarnings, validateHouseInput, type HouseInput } from "@/calc";

const demo = (): HouseInput => structuredClone(demoHouseInput) as HouseInput;

describe("analyzeHouse on the demo house (PRODUCT.md demo scenario; figures invented)", () => {
  const r = analyzeHouse(demoHouseInput);

  it("uses Newark 725020 from the station table, 99 % design temperature", () => {
    expect(r.climate.station!.wmo).toBe("725020");
    expect(r.climate.heatingDesignTempF).toBeCloseTo(15.62, 9);
    expect(r.climate.hdd65).toBeCloseTo(4710.6, 9);
  });

  it("baseline energy equals the degree-day formula on its own intermediate values", () => {
    const b = r.baseline;
    const q = 24 * (b.envelope.totalUA + 1.08 * b.infiltration.seasonal.cfm) * r.climate.hdd65 / 0.78 / 100_000;
    expect(b.energy.fuelUnits).toBeCloseTo(q, 8);
    expect(b.infiltration.ach50).toBeCloseTo((3900 * 60) / 14_025, 10);
    expect(b.designLoad.totalBtuh).toBeCloseTo((b.envelope.totalUA + 1.08 * b.infiltration.design.cfm) * (70 - 15.62), 6);
  });

  it("upgrades in sequence: each saving on the house the earlier ones left; they sum to the package", () => {
    expect(r.upgrades.map((u) => u.type)).toEqual(["air-sealing", "attic-insulation", "dense-pack-walls"]);
    for (let i = 1; i < r.upgrades.length; i++) expect(r.upgrades[i].before.annualCostUSD).toBeCloseTo(r.upgrades[i - 1].after.annualCostUSD, 9);
    const sum = r.upgrades.reduce((a, u) => a + u.savings.usd, 0);
    expect(sum).toBeCloseTo(r.package.savings.usd, 9);
    expect(r.upgrades[0].after.cfm50).toBe(2400);
    for (const u of r.upgrades) {
      expect(u.savings.usd).toBeGreaterThan(0);
      expect(u.simplePaybackYears).toBeCloseTo(u.costUSD / u.savings.usd, 9);
      expect(u.lifeYears).toBeGreaterThan(0);
    }
    expect(r.final.envelope.totalUA).toBeLessThan(r.baseline.envelope.totalUA);
  });

  it("attic insulation to R-49 adds the missing R as loose-fill cellulose (3.4/in, common practice)", () => {
    const d = r.upgrades[1].details as { added: { existingRIP: number; addedRIP: number; addedInches: number }[] };
    expect(d.added[0].existingRIP + d.added[0].addedRIP).toBeCloseTo(49, 9);
    expect(d.added[0].addedInches).toBeCloseTo(d.added[0].addedRIP / 3.4, 9);
  });

  it("dense-pack estimates for all four walls, moisture screens, ventilation, cautions and methods", () => {
    expect(r.densePack.map((d) => d.surfaceId)).toEqual(["wall-n", "wall-s", "wall-e", "wall-w"]);
    expect(r.densePack.every((d) => d.bags > 0 && d.holes >= d.bays)).toBe(true);
    expect(r.moisture.after.length).toBeGreaterThan(0);
    expect(r.ventilation.after.qInfCfm).toBeLessThan(r.ventilation.before.qInfCfm);
    expect(r.cautions.map((c) => c.id)).toContain("combustion-safety");
    expect(r.cautions.map((c) => c.id)).toContain("lead-paint");
    expect(r.methods.length).toBeGreaterThan(5);
    expect(r.warnings.some((w) => w.path === "blowerDoor.cfm50TestIn")).toBe(true); // ACH50 16.7
  });

  it("a test-out reading replaces the air-sealing target (report re-issued with measured leakage)", () => {
    const h = demo();
    h.blowerDoor = { cfm50TestIn: 3900, cfm50TestOut: 2100 };
    const t = analyzeHouse(h);
    expect(t.upgrades[0].after.cfm50).toBe(2100);
    expect((t.upgrades[0].details as { basis: string }).basis).toMatch(/test-out/);
  });

  it("crew log: bags against the estimate", () => {
    const h = demo();
    const expected = r.densePack[0].bags;
    h.crewLog = [{ surfaceId: "wall-n", bagsActual: Math.round(expected * 1.6) }, { surfaceId: "wall-s", bagsActual: r.densePack[1].bags }];
    const c = analyzeHouse(h).crewCheck;
    expect(c[0].status).toBe("possible-bypass");
    expect(c[1].status).toBe("as-expected");
  });

  it("returns only finite numbers (no NaN anywhere in the result)", () => {
    const walk = (x: unknown, p: string): void => {
      if (typeof x === "number") expect(Number.isFinite(x), p).toBe(true);
      else if (x && typeof x === "object") for (const [k, v] of Object.entries(x)) walk(v, `${p}.${k}`);
    };
    walk(r, "result");
  });
});

describe("invalid input is refused naming the field path (never NaN, never a silent clamp)", () => {
  const cases: [string, (h: HouseInput) => void, string][] = [
    ["negative area", (h) => { h.surfaces[0].grossAreaFt2 = -5; }, "surfaces.0.grossAreaFt2"],
    ["zero volume", (h) => { h.volumeFt3 = 0; }, "volumeFt3"],
    ["NaN", (h) => { h.floorAreaFt2 = NaN; }, "floorAreaFt2"],
    ["absurd magnitude", (h) => { h.blowerDoor.cfm50TestIn = 1e9; }, "blowerDoor.cfm50TestIn"],
    ["framing fraction above 1", (h) => { h.assemblies = [{ key: "mine", name: "mine", kind: "wall", construction: "wood-frame", layers: [{ framed: { member: "2x4", cavityFill: null, framingFraction: 1.2 } }] }]; }, "assemblies.0.layers.0.framed.framingFraction"],
    ["unknown assembly", (h) => { h.surfaces[1].assemblyKey = "nope"; }, "surfaces.1.assemblyKey"],
    ["openings bigger than the wall", (h) => { h.surfaces[2].openings = [{ kind: "window", areaFt2: 900, uFactorIP: 0.5 }]; }, "surfaces.2.openings"],
    ["air-sealing target above test-in", (h) => { h.upgrades = [{ type: "air-sealing", targetCfm50: 5000, costUSD: 1 }]; }, "upgrades.0.targetCfm50"],
    ["AFUE as a percentage", (h) => { h.heating.efficiency = { kind: "afue", value: 78 }; }, "heating.efficiency.value"],
    ["unknown station", (h) => { h.climate = { source: "station", wmo: "999999" }; }, "climate.wmo"],
  ];
  for (const [name, mutate, path] of cases) {
    it(`${name} → ${path}`, () => {
      const h = demo();
      mutate(h);
      const v = validateHouseInput(h);
      expect(v.ok).toBe(false);
      if (!v.ok) {
        expect(v.issues.map((i) => i.path)).toContain(path);
        expect(v.issues.find((i) => i.path === path)!.message).toContain(path);
      }
      try { analyzeHouse(h); expect.unreachable(); } catch (e) {
        expect(e).toBeInstanceOf(CalcInputError);
        expect((e as CalcInputError).issues.map((i) => i.path)).toContain(path);
      }
    });
  }
  it("valid demo input validates", () => {
    expect(validateHouseInput(demoHouseInput).ok).toBe(true);
    expect(houseInputSchema.safeParse(demoHouseInput).success).toBe(true);
  });
  it("soft warnings for legal but unusual values", () => {
    const h = demo();
    h.assemblies = [{ key: "mine", name: "mine", kind: "wall", construction: "wood-frame", layers: [{ materialKey: "film-outside" }, { framed: { member: "2x4", cavityFill: null, framingFraction: 0.45 } }, { materialKey: "film-inside-wall" }] }];
    h.surfaces[0].assemblyKey = "mine";
    expect(analyzeHouse(h).warnings.map((w) => w.path)).toContain("assemblies.0.layers.1.framed.framingFraction");
    expect(softWarnings({ nonsense: true })).toEqual([]);
  });
});
