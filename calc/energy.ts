// Annual heating energy by the degree-day method (ASHRAE Fundamentals, "Energy
// Estimating and Modeling Methods" chapter, from memory):
// Q = 24 · (UA + 1.08 · CFM_nat) · HDD · C_D / η, with 1.08·CFM = 0.018·V·ACH.
import { AIR_BTUH_PER_CFM_F } from "./envelope";
import { KG_TO_LB, KWH_TO_BTU } from "./units";

export type Fuel = "natural-gas" | "oil" | "propane" | "electric-resistance" | "heat-pump";
export type Efficiency = { kind: "afue"; value: number } | { kind: "cop"; value: number } | { kind: "hspf"; value: number };

export interface FuelInfo { unit: string; btuPerUnit: number; co2KgPerMMBtu?: number; source: string }
export const FUELS: Record<Fuel, FuelInfo> = {
  // therm = 100,000 Btu (definition); 53.06 kg CO2/MMBtu (EPA GHG Emission Factors Hub, per METHODS.md)
  "natural-gas": { unit: "therm", btuPerUnit: 100_000, co2KgPerMMBtu: 53.06, source: "therm = 100,000 Btu; CO2 53.06 kg/MMBtu, EPA GHG Emission Factors Hub" },
  // No. 2 oil ≈ 138,500 Btu/gal (EIA heat content, from memory); 73.96 kg CO2/MMBtu (EPA factor, from memory)
  oil: { unit: "gallon", btuPerUnit: 138_500, co2KgPerMMBtu: 73.96, source: "No. 2 oil 138,500 Btu/gal and 73.96 kg CO2/MMBtu, from memory" },
  // propane ≈ 91,500 Btu/gal (EIA heat content, from memory); 62.87 kg CO2/MMBtu (EPA factor, from memory)
  propane: { unit: "gallon", btuPerUnit: 91_500, co2KgPerMMBtu: 62.87, source: "propane 91,500 Btu/gal and 62.87 kg CO2/MMBtu, from memory" },
  // kWh = 3,412.14 Btu (unit definition via mathjs)
  "electric-resistance": { unit: "kWh", btuPerUnit: KWH_TO_BTU, source: "kWh = 3,412 Btu; CO2 from the grid factor" },
  "heat-pump": { unit: "kWh", btuPerUnit: KWH_TO_BTU, source: "kWh = 3,412 Btu; CO2 from the grid factor" },
};
// US average grid CO2, lb/kWh, 2023 (EIA FAQ, per METHODS.md); the company may set its own
export const DEFAULT_GRID_LB_PER_KWH = 0.81;

/** Seasonal efficiency as a plain ratio of heat delivered to energy bought. HSPF is Btu/Wh, so COP = HSPF / 3.412. */
export function seasonalEfficiency(e: Efficiency): number {
  return e.kind === "hspf" ? (e.value * 1000) / KWH_TO_BTU : e.value;
}

export interface AnnualHeatingInput {
  envelopeUA: number; infiltrationCfm: number; hdd65: number; correctionFactor: number;
  fuel: Fuel; efficiency: Efficiency; pricePerUnitUSD: number; gridLbPerKWh: number;
}
export interface AnnualHeating {
  heatLossCoefficient: number; loadBtu: number; efficiency: number; fuelBtu: number;
  fuelUnits: number; fuelUnit: string; costUSD: number; co2Lb: number; mmbtu: number;
  correctionFactor: number; formula: string;
}

export function annualHeating(i: AnnualHeatingInput): AnnualHeating {
  const hlc = i.envelopeUA + AIR_BTUH_PER_CFM_F * i.infiltrationCfm;
  const load = 24 * hlc * i.hdd65 * i.correctionFactor;
  const eff = seasonalEfficiency(i.efficiency);
  const fuelBtu = load / eff;
  const info = FUELS[i.fuel];
  const units = fuelBtu / info.btuPerUnit;
  const co2Lb = info.co2KgPerMMBtu !== undefined ? (fuelBtu / 1e6) * info.co2KgPerMMBtu * KG_TO_LB : units * i.gridLbPerKWh;
  return {
    heatLossCoefficient: hlc, loadBtu: load, efficiency: eff, fuelBtu, fuelUnits: units, fuelUnit: info.unit,
    costUSD: units * i.pricePerUnitUSD, co2Lb, mmbtu: fuelBtu / 1e6, correctionFactor: i.correctionFactor,
    formula: "Q = 24 × (UA + 1.08 × CFM_nat) × HDD65 × C_D / η",
  };
}
