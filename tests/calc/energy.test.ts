import { describe, expect, it } from "vitest";
import { annualHeating, FUELS, seasonalEfficiency, simplePayback, savingsToInvestment, upv, upvEscalated } from "@/calc";

const base = { envelopeUA: 500, infiltrationCfm: 100, hdd65: 5000, correctionFactor: 1, pricePerUnitUSD: 1.5, gridLbPerKWh: 0.81 };

describe("degree-day method (ASHRAE Fundamentals, energy estimating chapter, from memory; METHODS.md §4)", () => {
  it("gas furnace: Q = 24·(UA + 1.08·CFM)·HDD / AFUE, in therms of 100,000 Btu", () => {
    // 24 × (500 + 108) × 5000 = 72,960,000 Btu; ÷ 0.8 = 91,200,000 Btu = 912 therms; × $1.50 = $1,368
    const r = annualHeating({ ...base, fuel: "natural-gas", efficiency: { kind: "afue", value: 0.8 } });
    expect(r.loadBtu).toBeCloseTo(72_960_000, 4);
    expect(r.fuelUnits).toBeCloseTo(912, 8);
    expect(r.costUSD).toBeCloseTo(1368, 8);
    // 91.2 MMBtu × 53.06 kg/MMBtu (EPA GHG Emission Factors Hub) × 2.20462 lb/kg
    expect(r.co2Lb).toBeCloseTo(91.2 * 53.06 * 2.20462262, 3);
    expect(r.correctionFactor).toBe(1);
  });
  it("oil and propane in gallons (138,500 and 91,500 Btu/gal, from memory)", () => {
    expect(annualHeating({ ...base, fuel: "oil", efficiency: { kind: "afue", value: 0.8 } }).fuelUnits).toBeCloseTo(91_200_000 / 138_500, 8);
    expect(annualHeating({ ...base, fuel: "propane", efficiency: { kind: "afue", value: 0.8 } }).fuelUnits).toBeCloseTo(91_200_000 / 91_500, 8);
  });
  it("electric resistance (COP 1) and heat pump (HSPF 9 → COP 9/3.412) in kWh; CO2 from the grid factor", () => {
    const kwhBtu = 3.6e6 / 1055.05585262; // 1 kWh = 3.6 MJ; 1 Btu (IT) = 1055.05585262 J (NIST SP 811)
    const er = annualHeating({ ...base, fuel: "electric-resistance", efficiency: { kind: "cop", value: 1 } });
    expect(er.fuelUnits).toBeCloseTo(72_960_000 / kwhBtu, 3);
    expect(er.co2Lb).toBeCloseTo(er.fuelUnits * 0.81, 6);
    expect(seasonalEfficiency({ kind: "hspf", value: 9 })).toBeCloseTo(9000 / kwhBtu, 8);
    const hp = annualHeating({ ...base, fuel: "heat-pump", efficiency: { kind: "hspf", value: 9 } });
    expect(hp.fuelUnits).toBeCloseTo(er.fuelUnits / (9000 / kwhBtu), 6);
    expect(FUELS["heat-pump"].unit).toBe("kWh");
  });
  it("the correction factor C_D scales the load and is reported", () => {
    const r = annualHeating({ ...base, correctionFactor: 0.8, fuel: "natural-gas", efficiency: { kind: "afue", value: 0.8 } });
    expect(r.fuelUnits).toBeCloseTo(912 * 0.8, 8);
    expect(r.correctionFactor).toBe(0.8);
  });
});

describe("economics (10 CFR 455.63 payback; 10 CFR 440.21 SIR; NIST Handbook 135 UPV)", () => {
  it("UPV = [1 − (1+d)^−N]/d: d = 3 %, N = 20 → 14.8775 (hand: 1 − 1.03^−20 = 0.446324; ÷ 0.03)", () => {
    expect(upv(0.03, 20)).toBeCloseTo((1 - 1.03 ** -20) / 0.03, 12);
    expect(upv(0.03, 20)).toBeCloseTo(14.8775, 4);
    expect(upv(0, 12)).toBe(12);
  });
  it("modified UPV* with escalation e: (1+e)/(d−e)·[1 − ((1+e)/(1+d))^N]; equals UPV at e = 0 and N at e = d", () => {
    expect(upvEscalated(0.03, 0, 20)).toBeCloseTo(upv(0.03, 20), 12);
    expect(upvEscalated(0.03, 0.03, 20)).toBe(20);
    // hand: Σ_{t=1..N} ((1+e)/(1+d))^t for d = 3 %, e = 2 %, N = 10
    let s = 0;
    for (let t = 1; t <= 10; t++) s += (1.02 / 1.03) ** t;
    expect(upvEscalated(0.03, 0.02, 10)).toBeCloseTo(s, 12);
  });
  it("simple payback and SIR", () => {
    expect(simplePayback(1000, 250)).toBe(4);
    expect(simplePayback(1000, 0)).toBeNull();
    expect(savingsToInvestment(100, 1000, 0.03, 0, 20)).toBeCloseTo((100 * upv(0.03, 20)) / 1000, 12);
    expect(savingsToInvestment(100, 0, 0.03, 0, 20)).toBeNull();
  });
});
