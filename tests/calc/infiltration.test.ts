import { describe, expect, it } from "vitest";
import { ach50, basicCoefficients, basicModelCfm, computeInfiltration, csIP, cwIP, effectiveLeakageArea, nFactor, type InfiltrationOptions } from "@/calc";

// Hand unit factors (NIST SP 811): 1 ft = 0.3048 m, 1 in = 0.0254 m, 1 mph = 0.44704 m/s, 1 °F = 5/9 K
const CFM_M3S = 0.3048 ** 3 / 60;
const CFM_LPS = CFM_M3S * 1000;
const IN2_CM2 = 2.54 ** 2;

describe("blower door → ACH50 and ELA", () => {
  it("ACH50 = CFM50 × 60 / V (METHODS.md §3)", () => {
    expect(ach50(3900, 14_025)).toBeCloseTo((3900 * 60) / 14_025, 12); // 16.68
  });

  it("ELA at 4 Pa, n = 0.65, ρ = 1.2 kg/m³, Cd = 1 (ASHRAE Fundamentals ventilation chapter, from memory)", () => {
    // Q4 = 1000 × (4/50)^0.65 = 193.6 cfm = 0.09139 m³/s; ELA = Q4·√(1.2 / (2·4)) = 0.03539 m² = 353.9 cm² = 54.9 in²
    const q4 = 1000 * 0.08 ** 0.65;
    const m2 = q4 * CFM_M3S * Math.sqrt(1.2 / 8);
    const e = effectiveLeakageArea(1000, 0.65);
    expect(e.cfm4).toBeCloseTo(q4, 10);
    expect(e.cm2).toBeCloseTo(m2 * 1e4, 8);
    expect(e.in2).toBeCloseTo(m2 / 0.0254 ** 2, 8);
    expect(e.in2).toBeCloseTo(54.9, 1);
  });
});

describe("N-factor (Sherman 1987, Energy and Buildings 10:81–86; table from memory, METHODS.md)", () => {
  it("N = zone × height × shielding: zone 2, two storeys, normal = 18.5 × 0.8 × 1.0 = 14.8", () => {
    expect(nFactor(2, 2, "normal").n).toBeCloseTo(14.8, 12);
    expect(nFactor(1, 1, "well-shielded").n).toBeCloseTo(18.6, 12); // 15.5 × 1 × 1.2
    expect(nFactor(4, 3, "exposed").n).toBeCloseTo(24.5 * 0.7 * 0.9, 12);
  });
});

describe("ASHRAE basic model coefficients (EnergyPlus I/O Reference group-airflow.tex, citing ASHRAE HoF 2005/2001)", () => {
  it("SI → IP by hand: Cs_IP = Cs_SI·(5/9)/(A·Q)², Cw_IP = Cw_SI·0.44704²/(A·Q)²", () => {
    const k = (1 / IN2_CM2 * CFM_LPS) ** 2; // (cm²→in² × cfm→L/s)²
    expect(csIP(0.000145)).toBeCloseTo((0.000145 * 5 / 9) / k, 12);
    expect(cwIP(0.000319)).toBeCloseTo((0.000319 * 0.44704 ** 2) / k, 12);
  });

  it("agree within 1 % with the IP tables of ASHRAE Fundamentals (from memory: Cs 0.0150/0.0299/0.0449; Cw class 1 0.0119/0.0157/0.0184, class 4 0.0039/0.0051/0.0060; the SI table is itself rounded)", () => {
    const near = (a: number[], b: number[]) => a.forEach((x, i) => expect(Math.abs(x - b[i]) / b[i]).toBeLessThan(0.01));
    const s = [1, 2, 3].map((n) => basicCoefficients(n, 1));
    near(s.map((c) => c.csIP), [0.015, 0.0299, 0.0449]);
    near(s.map((c) => c.cwIP), [0.0119, 0.0157, 0.0184]);
    [1, 2, 3].map((n) => basicCoefficients(n, 4).cwIP).forEach((x, i) => expect(Math.abs(x - [0.0039, 0.0051, 0.006][i])).toBeLessThan(0.00006));
  });

  it("Q = A_L·√(Cs·ΔT + Cw·U²)", () => {
    const c = basicCoefficients(2, 3);
    expect(basicModelCfm(100, c.csIP, c.cwIP, 40, 10)).toBeCloseTo(100 * Math.sqrt(c.csIP * 40 + c.cwIP * 100), 10);
  });
});

describe("computeInfiltration: both methods side by side, before and after", () => {
  const o: InfiltrationOptions = { volumeFt3: 14_025, stories: 2, nFactorZone: 2, shielding: "normal", shelterClass: 4, flowExponent: 0.65, seasonalDeltaTF: 30, seasonalWindMph: 7, designDeltaTF: 54, designWindMph: 15, method: "n-factor" };
  it("reports N-factor and basic model, and uses the chosen one", () => {
    const r = computeInfiltration(3900, o);
    expect(r.nFactor.achNat).toBeCloseTo(ach50(3900, 14_025) / 14.8, 12);
    expect(r.nFactor.cfmNat).toBeCloseTo((r.nFactor.achNat * 14_025) / 60, 10);
    expect(r.seasonal.cfm).toBe(r.nFactor.cfmNat);
    const b = computeInfiltration(3900, { ...o, method: "ashrae-basic" });
    expect(b.seasonal.cfm).toBe(b.ashraeBasic.seasonal.cfm);
    expect(b.design.cfm).toBeGreaterThan(b.seasonal.cfm);
  });
  it("after air sealing both estimates fall in proportion to leakage", () => {
    const before = computeInfiltration(3900, o);
    const after = computeInfiltration(2400, o);
    expect(after.nFactor.cfmNat / before.nFactor.cfmNat).toBeCloseTo(2400 / 3900, 12);
    expect(after.ashraeBasic.seasonal.cfm / before.ashraeBasic.seasonal.cfm).toBeCloseTo(2400 / 3900, 12);
  });
  it("an N override is used and reported", () => {
    const r = computeInfiltration(3900, { ...o, nFactorOverride: 20 });
    expect(r.nFactor.n).toBe(20);
    expect(r.nFactor.overridden).toBe(true);
  });
});
