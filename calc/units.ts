// Unit conversions. Warmstead computes in US customary (IP) units; these
// factors are derived once, at load, by mathjs from its unit definitions, so
// no conversion number is typed by hand and the hot path stays plain arithmetic.
import { unit } from "mathjs";

const f = (from: string, to: string) => unit(1, from).toNumber(to);

// R-value: m²·K/W → h·ft²·°F/Btu (mathjs unit definitions; ≈ 5.6783)
export const R_SI_TO_IP = f("m^2 K / W", "h ft^2 degF / BTU");
// U-factor: Btu/h·ft²·°F → W/m²·K (mathjs unit definitions)
export const U_IP_TO_SI = f("BTU / (h ft^2 degF)", "W / (m^2 K)");
// length: inch → metre (mathjs; exact 0.0254)
export const IN_TO_M = f("inch", "m");
// area: ft² → m² (mathjs)
export const FT2_TO_M2 = f("ft^2", "m^2");
// area: cm² → in² (mathjs)
export const CM2_TO_IN2 = f("cm^2", "inch^2");
// volume: ft³ → m³ (mathjs)
export const FT3_TO_M3 = f("ft^3", "m^3");
// flow: cfm → L/s (mathjs)
export const CFM_TO_LPS = f("ft^3 / min", "L / s");
// flow: cfm → m³/s (mathjs)
export const CFM_TO_M3S = f("ft^3 / min", "m^3 / s");
// power: Btu/h → W (mathjs)
export const BTUH_TO_W = f("BTU / h", "W");
// energy: kWh → Btu (mathjs; ≈ 3,412.14)
export const KWH_TO_BTU = f("kWh", "BTU");
// speed: mph → m/s (mathjs; exact 0.44704)
export const MPH_TO_MS = f("mi / h", "m / s");
// temperature interval: 1 °F difference in K (mathjs; 5/9)
export const DELTA_F_TO_K = f("degF / s", "K / s");
// mass: kg → lb (mathjs)
export const KG_TO_LB = f("kg", "lb");

/** °C → °F (absolute temperatures). */
export const cToF = (c: number) => c * 1.8 + 32;
/** °F → °C (absolute temperatures). */
export const fToC = (fahrenheit: number) => (fahrenheit - 32) / 1.8;

/** SI display helpers: each takes the IP figure and returns the SI one. */
export const toSI = {
  rValue: (rIP: number) => rIP / R_SI_TO_IP, // m²·K/W
  uFactor: (uIP: number) => uIP * U_IP_TO_SI, // W/m²·K
  area: (ft2: number) => ft2 * FT2_TO_M2, // m²
  volume: (ft3: number) => ft3 * FT3_TO_M3, // m³
  temperature: (degF: number) => unit(degF, "degF").toNumber("degC"), // °C (mathjs, absolute scale)
  temperatureDifference: (deltaF: number) => deltaF / 1.8, // K
  power: (btuh: number) => btuh * BTUH_TO_W, // W
  airflow: (cfm: number) => cfm * CFM_TO_LPS, // L/s
  length: (inches: number) => inches * IN_TO_M, // m
};

/** General display conversion through mathjs (slow path, for reports). */
export function convert(value: number, from: string, to: string): number {
  return unit(value, from).toNumber(to);
}
