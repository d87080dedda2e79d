import psychrolib from "psychrolib";
import { describe, expect, it } from "vitest";
import { builtInAssemblies, cautionsFor, computeAssembly, indoorDewPointF, moistureScreen, ventilation62_2 } from "@/calc";

const a = (k: string) => computeAssembly(builtInAssemblies.find((x) => x.key === k)!);

describe("moisture screen (ASHRAE Fundamentals dew-point method, from memory; psychrolib as reference)", () => {
  it("indoor dew point equals psychrolib's (IP): 70 °F at 40 % ≈ 44.6 °F (METHODS.md §6)", () => {
    psychrolib.SetUnitSystem(psychrolib.IP);
    expect(indoorDewPointF(70, 0.4)).toBe(psychrolib.GetTDewPointFromRelHum(70, 0.4));
    expect(indoorDewPointF(70, 0.4)).toBeCloseTo(44.6, 1);
  });
  it("interface temperatures: T_x = T_in − ΔT·R_in→x/R_total, by hand for the first interface", () => {
    const asm = a("wall-1920s-2x4-dense-pack");
    const s = moistureScreen(asm, 70, 10, 0.4);
    const rTot = asm.cavityPath.reduce((x, l) => x + l.rValueIP, 0);
    const inner = asm.cavityPath[asm.cavityPath.length - 1].rValueIP; // inside film
    expect(s.interfaces[0].tempF).toBeCloseTo(70 - (60 * inner) / rTot, 10);
    // temperatures fall monotonically outward
    for (let i = 1; i < s.interfaces.length; i++) expect(s.interfaces[i].tempF).toBeLessThan(s.interfaces[i - 1].tempF);
  });
  it("flags the sheathing of a dense-packed wall at design conditions in plain words", () => {
    const s = moistureScreen(a("wall-1920s-2x4-dense-pack"), 70, 10, 0.4);
    expect(s.atRisk.some((x) => /sheathing/i.test(x.outerLayer))).toBe(true);
    expect(s.message).toMatch(/dew point/);
    expect(s.message).toMatch(/screening check/);
  });
  it("no flag on a warm day", () => {
    expect(moistureScreen(a("wall-2x4-r13"), 70, 60, 0.3).atRisk).toEqual([]);
  });
});

describe("ASHRAE 62.2-2016 whole-dwelling ventilation (§4.1; wsf default from memory)", () => {
  it("Qtot = 0.03·A + 7.5·(Nbr + 1): 1650 ft², 3 bedrooms → 49.5 + 30 = 79.5 cfm", () => {
    expect(ventilation62_2({ floorAreaFt2: 1650, bedrooms: 3, cfm50: 1000, wsf: 0.5, heightFt: 18, balanced: true }).qTotCfm).toBeCloseTo(79.5, 10);
  });
  it("infiltration credit 0.052·Q50·wsf·(H/8.2)^0.4 and fan rate, balanced and not", () => {
    const qInf = 0.052 * 1000 * 0.5 * (18 / 8.2) ** 0.4; // ≈ 35.8 cfm
    const bal = ventilation62_2({ floorAreaFt2: 1650, bedrooms: 3, cfm50: 1000, wsf: 0.5, heightFt: 18, balanced: true });
    expect(bal.qInfCfm).toBeCloseTo(qInf, 10);
    expect(bal.fanCfm).toBeCloseTo(79.5 - qInf, 10);
    const unb = ventilation62_2({ floorAreaFt2: 1650, bedrooms: 3, cfm50: 1000, wsf: 0.5, heightFt: 18, balanced: false });
    expect(unb.fanCfm).toBeCloseTo(79.5 - (qInf / 79.5) * qInf, 10);
  });
  it("after tightening the fan rate needed rises", () => {
    const v = (cfm50: number) => ventilation62_2({ floorAreaFt2: 1650, bedrooms: 3, cfm50, wsf: 0.5, heightFt: 18, balanced: false }).fanCfm;
    expect(v(800)).toBeGreaterThan(v(2000));
  });
});

describe("cautions (METHODS.md §7)", () => {
  const facts = { yearBuilt: 1928, knobAndTube: "unknown" as const, vermiculite: "present" as const, combustionAppliances: true, plannedAirSealing: true, plannedDensePack: true };
  it("lists each applicable hazard with its governing document and the closing words", () => {
    const c = cautionsFor(facts);
    expect(c.map((x) => x.id)).toEqual(["lead-paint", "knob-and-tube", "vermiculite", "combustion-safety", "cellulose-dust", "fire-blocking"]);
    expect(c.find((x) => x.id === "lead-paint")!.document).toMatch(/40 CFR 745/);
    expect(c.find((x) => x.id === "knob-and-tube")!.document).toMatch(/394\.12/);
    expect(c.find((x) => x.id === "combustion-safety")!.document).toMatch(/BPI-1200/);
    for (const x of c) expect(x.message).toMatch(/follow local codes and licensed practice/i);
  });
  it("a 1990 all-electric house with nothing planned has none", () => {
    expect(cautionsFor({ yearBuilt: 1990, knobAndTube: "absent", vermiculite: "absent", combustionAppliances: false, plannedAirSealing: false, plannedDensePack: false })).toEqual([]);
  });
});
