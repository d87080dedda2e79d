// Display formatting for the results panel. The calc engine works in IP units; SI figures
// come from calc/units.ts (toSI, and mathjs-derived factors for the rest). Rounding here is
// display precision only: every figure shown is the analysis figure, converted and rounded.
import { convert, MPH_TO_MS, toSI } from "@/calc/units";

export type Units = "ip" | "si";

// Conversion factors without a toSI helper, derived once by mathjs (calc/units.ts `convert`).
const UA_TO_W_PER_K = convert(1, "BTU / (h degF)", "W / K");
const LB_TO_KG = convert(1, "lb", "kg");
const MMBTU_TO_GJ = convert(1e6, "BTU", "GJ");
const LB_FT3_TO_KG_M3 = convert(1, "lb / ft^3", "kg / m^3");

const formats = new Map<number, Intl.NumberFormat>();
/** A number with US grouping and a fixed count of decimals; never shows "-0". */
export function num(x: number, digits = 0): string {
  let f = formats.get(digits);
  if (!f) {
    f = new Intl.NumberFormat("en-US", { minimumFractionDigits: digits, maximumFractionDigits: digits });
    formats.set(digits, f);
  }
  const s = f.format(x);
  return /^-0(\.0+)?$/.test(s) ? s.slice(1) : s.replace(/^-/, "−");
}

const roundTo = (x: number, step: number) => Math.round(x / step) * step;

export const usd = (x: number) => (x < 0 ? `−$${num(-x)}` : `$${num(x)}`);
export const usdCents = (x: number) => `$${num(x, 2)}`;
export const years = (y: number | null) => (y === null ? "no payback" : `${num(y, 1)} years`);
export const sir = (x: number | null) => (x === null ? "n/a" : num(x, 2));
export const percent = (fraction: number, digits = 0) => `${num(fraction * 100, digits)} %`;
export const ach = (x: number) => num(x, 1);
export const achNatural = (x: number) => num(x, 2);

/** Heat flow: design loads to the nearest 100 Btu/h, or kW to one decimal. */
export const power = (btuh: number, u: Units) => (u === "ip" ? `${num(roundTo(btuh, 100))} Btu/h` : `${num(toSI.power(btuh) / 1000, 1)} kW`);
/** Heat flow without rounding to 100 (for the pieces of a load in "how" lists). */
export const powerExact = (btuh: number, u: Units) => (u === "ip" ? `${num(btuh)} Btu/h` : `${num(toSI.power(btuh))} W`);
/** UA as a bare number in the chosen units (Btu/h·°F or W/K), for table cells whose header names the unit. */
export const uaValue = (x: number, u: Units) => (u === "ip" ? x : x * UA_TO_W_PER_K);
export const uaUnit = (u: Units) => (u === "ip" ? "Btu/h·°F" : "W/K");
export const ua = (x: number, u: Units) => (u === "ip" ? `${num(x, 1)} Btu/h·°F` : `${num(x * UA_TO_W_PER_K, 1)} W/K`);
export const flow = (cfm: number, u: Units, digits = 0) => (u === "ip" ? `${num(cfm, digits)} cfm` : `${num(toSI.airflow(cfm), digits)} L/s`);
export const cfm50 = (cfm: number, u: Units) => (u === "ip" ? `${num(cfm)} CFM50` : `${num(toSI.airflow(cfm))} L/s at 50 Pa`);
/** "3,900 → 2,400 CFM50": one unit for both ends of a change. */
export const cfm50Change = (before: number, after: number, u: Units) =>
  u === "ip" ? `${num(before)} → ${num(after)} CFM50` : `${num(toSI.airflow(before))} → ${num(toSI.airflow(after))} L/s at 50 Pa`;
export const temp = (f: number, u: Units) => (u === "ip" ? `${num(f, 1)} °F` : `${num(toSI.temperature(f), 1)} °C`);
export const deltaT = (f: number, u: Units) => (u === "ip" ? `${num(f, 1)} °F` : `${num(toSI.temperatureDifference(f), 1)} K`);
export const area = (ft2: number, u: Units) => (u === "ip" ? `${num(ft2)} ft²` : `${num(toSI.area(ft2), 1)} m²`);
export const volume = (ft3: number, u: Units, digits = 0) => (u === "ip" ? `${num(ft3, digits)} ft³` : `${num(toSI.volume(ft3), digits + 1)} m³`);
export const length = (inches: number, u: Units) => (u === "ip" ? `${num(inches, 2)} in.` : `${num(toSI.length(inches) * 1000)} mm`);
export const heightFt = (ft: number, u: Units) => (u === "ip" ? `${num(ft, 1)} ft` : `${num(toSI.length(ft * 12), 2)} m`);
export const speed = (mph: number, u: Units) => (u === "ip" ? `${num(mph)} mph` : `${num(mph * MPH_TO_MS, 1)} m/s`);
export const mass = (lb: number, u: Units, digits = 0) => (u === "ip" ? `${num(lb, digits)} lb` : `${num(lb * LB_TO_KG, digits)} kg`);
export const massUnit = (u: Units) => (u === "ip" ? "lb" : "kg");
export const massValue = (lb: number, u: Units) => num(u === "ip" ? lb : lb * LB_TO_KG);
export const co2 = (lb: number, u: Units) => `${mass(lb, u)} CO2`;
export const density = (lbFt3: number, u: Units) => (u === "ip" ? `${num(lbFt3, 1)} lb/ft³` : `${num(lbFt3 * LB_FT3_TO_KG_M3)} kg/m³`);
export const energy = (mmbtu: number, u: Units) => (u === "ip" ? `${num(mmbtu, 1)} MMBtu` : `${num(mmbtu * MMBTU_TO_GJ, 1)} GJ`);
export const degreeDays = (hdd65: number, u: Units) => (u === "ip" ? `${num(hdd65)} °F·days (base 65 °F)` : `${num(toSI.temperatureDifference(hdd65))} K·days (base 18.3 °C)`);
export const ela = (in2: number, cm2: number, u: Units) => (u === "ip" ? `${num(in2)} in²` : `${num(cm2)} cm²`);
/** Heat-flow unit label for chart axes (the unit of `power`). */
export const powerUnit = (u: Units) => (u === "ip" ? "Btu/h" : "kW");
/** A heat flow as a bare number in the unit of powerUnit (chart values). */
export const powerValue = (btuh: number, u: Units) => (u === "ip" ? btuh : toSI.power(btuh) / 1000);

/** Fuel in its billing unit (the same in both unit systems: it is what the bill says). */
export function fuel(units: number, unit: string): string {
  const plural = unit === "kWh" || Math.abs(units) === 1 ? unit : `${unit}s`;
  return `${num(units)} ${plural}`;
}

// Field names whose plain reading needs more than splitting the camelCase.
const FIELD_WORDS: Record<string, string> = {
  cfm50TestIn: "CFM50 test-in", cfm50TestOut: "CFM50 test-out", hdd65: "HDD65", cdd65: "CDD65", indoorRH: "indoor RH",
  rValueIP: "R-value", uFactorIP: "U-factor", targetRIP: "target R", costUSD: "cost", pricePerUnitUSD: "price per unit", wmo: "WMO station",
};
const UNIT_SUFFIX: [RegExp, string][] = [[/LbFt3$/, " (lb/ft³)"], [/Ft2$/, " (ft²)"], [/Ft3$/, " (ft³)"], [/Ft$/, " (ft)"], [/In$/, " (in.)"], [/Lb$/, " (lb)"], [/F$/, " (°F)"]];

function fieldWord(p: string): string {
  if (/^\d+$/.test(p)) return String(Number(p) + 1);
  if (FIELD_WORDS[p]) return FIELD_WORDS[p];
  let unit = "";
  for (const [re, label] of UNIT_SUFFIX) if (re.test(p)) { p = p.replace(re, ""); unit = label; break; }
  return p.replace(/([a-z])([A-Z])/g, "$1 $2").toLowerCase() + unit;
}

/** "surfaces.2.grossAreaFt2" → "surfaces › 3 › gross area (ft²)": list entries count from 1. */
export function fieldPath(path: string): string {
  return path.split(".").filter(Boolean).map(fieldWord).join(" › ");
}
