// Display of R and U in the auditor's units (IP inside calc; SI through calc/units.ts).
import { toSI } from "@/calc/units";

export type Units = "ip" | "si";

const finite = (x: number) => Number.isFinite(x);

/** R in the chosen units, as a number (for tests and data attributes). */
export const rIn = (rIP: number, units: Units) => (units === "si" ? toSI.rValue(rIP) : rIP);
export const uIn = (uIP: number, units: Units) => (units === "si" ? toSI.uFactor(uIP) : uIP);

export const R_UNIT: Record<Units, string> = { ip: "h·ft²·°F/Btu", si: "m²·K/W" };
export const U_UNIT: Record<Units, string> = { ip: "Btu/h·ft²·°F", si: "W/m²·K" };

/** "R-11.2" in IP, "RSI 1.97" in SI; "—" for a figure that cannot be shown (not finite, or negative). */
export function formatR(rIP: number, units: Units): string {
  const v = rIn(rIP, units);
  if (!finite(v) || v < 0) return "—";
  return units === "si" ? `RSI ${v.toFixed(2)}` : `R-${v.toFixed(v < 10 ? 2 : 1)}`;
}

/** U to three decimals in either unit. */
export function formatU(uIP: number, units: Units): string {
  const v = uIn(uIP, units);
  return finite(v) ? v.toFixed(3) : "—";
}

export const formatFraction = (f: number) => (finite(f) ? `${Math.round(f * 1000) / 10} %` : "—");

/** Inches for labels: 3.5 → "3.5 in." */
export const formatIn = (inches: number | undefined) => (inches === undefined || !finite(inches) ? "—" : `${Math.round(inches * 1000) / 1000} in.`);
