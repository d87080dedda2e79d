// Blower door → ACH50, effective leakage area, and natural infiltration by the
// N-factor method and by the ASHRAE basic (Sherman–Grimsrud) model, side by side.
import { CFM_TO_LPS, CFM_TO_M3S, CM2_TO_IN2, DELTA_F_TO_K, IN_TO_M, MPH_TO_MS } from "./units";

export type Shielding = "well-shielded" | "normal" | "exposed";
export type ShelterClass = 1 | 2 | 3 | 4 | 5;

// N = Czone × height × shielding (Sherman 1987, Energy and Buildings 10, 81–86; table not checked: from memory)
export const N_ZONE: Record<1 | 2 | 3 | 4, number> = { 1: 15.5, 2: 18.5, 3: 21.5, 4: 24.5 };
// Height factor by stories 1 / 1.5 / 2 / 3 (same table, from memory); other story counts interpolated
export const N_HEIGHT: [number, number][] = [[1, 1], [1.5, 0.9], [2, 0.8], [3, 0.7]];
// Shielding factor (same table, from memory)
export const N_SHIELDING: Record<Shielding, number> = { "well-shielded": 1.2, normal: 1, exposed: 0.9 };

// Basic-model stack coefficient Cs, (L/s)²/(cm⁴·K), 1/2/3 stories (EnergyPlus I/O Reference, group-airflow.tex, citing ASHRAE HoF 2005/2001)
export const CS_SI = [0.000145, 0.00029, 0.000435];
// Basic-model wind coefficient Cw, (L/s)²/(cm⁴·(m/s)²), shelter class 1–5 × 1/2/3 stories (same source)
export const CW_SI: Record<ShelterClass, number[]> = {
  1: [0.000319, 0.00042, 0.000494], 2: [0.000246, 0.000325, 0.000382], 3: [0.000174, 0.000231, 0.000271],
  4: [0.000104, 0.000137, 0.000161], 5: [0.000032, 0.000042, 0.000049],
};
// SI → IP: Q[cfm] = A[in²]·√(Cs·ΔT[°F] + Cw·U[mph]²); factors from mathjs (units.ts)
const FLOW_AREA = (CM2_TO_IN2 * CFM_TO_LPS) ** 2;
export const csIP = (csSI: number) => (csSI * DELTA_F_TO_K) / FLOW_AREA;
export const cwIP = (cwSI: number) => (cwSI * MPH_TO_MS * MPH_TO_MS) / FLOW_AREA;

// Air density for the ELA, kg/m³ (ASHRAE Fundamentals, ventilation and infiltration chapter, from memory)
export const ELA_AIR_DENSITY = 1.2;
// ELA reference pressure, Pa, and discharge coefficient (same chapter, from memory)
export const ELA_PRESSURE_PA = 4;
export const ELA_CD = 1;
// Default flow exponent (METHODS.md §3; common practice)
export const DEFAULT_FLOW_EXPONENT = 0.65;

function interp(table: [number, number][], x: number): number {
  if (x <= table[0][0]) return table[0][1];
  for (let i = 1; i < table.length; i++) {
    const [x1, y1] = table[i];
    const [x0, y0] = table[i - 1];
    if (x <= x1) return y0 + ((y1 - y0) * (x - x0)) / (x1 - x0);
  }
  return table[table.length - 1][1];
}

export const ach50 = (cfm50: number, volumeFt3: number) => (cfm50 * 60) / volumeFt3;

/** Effective leakage area at 4 Pa from CFM50: Q4 = CFM50·(4/50)^n; ELA = Q4·√(ρ/2ΔP)/Cd. */
export function effectiveLeakageArea(cfm50: number, n = DEFAULT_FLOW_EXPONENT) {
  const cfm4 = cfm50 * (ELA_PRESSURE_PA / 50) ** n;
  const m2 = (cfm4 * CFM_TO_M3S * Math.sqrt(ELA_AIR_DENSITY / (2 * ELA_PRESSURE_PA))) / ELA_CD;
  return { cfm4, in2: m2 / (IN_TO_M * IN_TO_M), cm2: m2 * 1e4 };
}

export function nFactor(zone: 1 | 2 | 3 | 4, stories: number, shielding: Shielding) {
  const height = interp(N_HEIGHT, stories);
  return { n: N_ZONE[zone] * height * N_SHIELDING[shielding], zoneFactor: N_ZONE[zone], heightFactor: height, shieldingFactor: N_SHIELDING[shielding] };
}

function byStories(row: number[], s: number): number {
  return s <= 2 ? row[0] + (row[1] - row[0]) * (s - 1) : row[1] + (row[2] - row[1]) * (s - 2);
}

/** Basic-model coefficients in IP, interpolated linearly between 1, 2 and 3 stories. */
export function basicCoefficients(stories: number, shelter: ShelterClass) {
  const s = Math.min(3, Math.max(1, stories));
  const cs = byStories(CS_SI, s);
  const cw = byStories(CW_SI[shelter], s);
  return { csIP: csIP(cs), cwIP: cwIP(cw), csSI: cs, cwSI: cw };
}

/** Q = A_L·√(Cs·ΔT + Cw·U²), cfm, with A_L in in². */
export function basicModelCfm(elaIn2: number, cs: number, cw: number, deltaTF: number, windMph: number): number {
  return elaIn2 * Math.sqrt(cs * Math.max(0, deltaTF) + cw * windMph * windMph);
}

export interface InfiltrationOptions {
  volumeFt3: number; stories: number;
  nFactorZone: 1 | 2 | 3 | 4; shielding: Shielding; nFactorOverride?: number;
  shelterClass: ShelterClass; flowExponent: number;
  seasonalDeltaTF: number; seasonalWindMph: number; designDeltaTF: number; designWindMph: number;
  method: "n-factor" | "ashrae-basic";
}

export function computeInfiltration(cfm50: number, o: InfiltrationOptions) {
  const ela = effectiveLeakageArea(cfm50, o.flowExponent);
  const nf = nFactor(o.nFactorZone, o.stories, o.shielding);
  const N = o.nFactorOverride ?? nf.n;
  const a50 = ach50(cfm50, o.volumeFt3);
  const nAch = a50 / N;
  const c = basicCoefficients(o.stories, o.shelterClass);
  const seasonalCfm = basicModelCfm(ela.in2, c.csIP, c.cwIP, o.seasonalDeltaTF, o.seasonalWindMph);
  const designCfm = basicModelCfm(ela.in2, c.csIP, c.cwIP, o.designDeltaTF, o.designWindMph);
  const nFactorResult = { n: N, zoneFactor: nf.zoneFactor, heightFactor: nf.heightFactor, shieldingFactor: nf.shieldingFactor, overridden: o.nFactorOverride !== undefined, achNat: nAch, cfmNat: (nAch * o.volumeFt3) / 60, source: "Sherman 1987, Energy and Buildings 10:81–86 (N table from memory)" };
  const basic = {
    csIP: c.csIP, cwIP: c.cwIP, csSI: c.csSI, cwSI: c.cwSI, shelterClass: o.shelterClass,
    seasonal: { deltaTF: o.seasonalDeltaTF, windMph: o.seasonalWindMph, cfm: seasonalCfm, ach: (seasonalCfm * 60) / o.volumeFt3 },
    design: { deltaTF: o.designDeltaTF, windMph: o.designWindMph, cfm: designCfm, ach: (designCfm * 60) / o.volumeFt3 },
    source: "ASHRAE HoF basic model; coefficients from EnergyPlus I/O Reference group-airflow.tex, converted SI→IP",
  };
  const useN = o.method === "n-factor";
  return {
    cfm50, volumeFt3: o.volumeFt3, ach50: a50, flowExponent: o.flowExponent, ela, nFactor: nFactorResult, ashraeBasic: basic,
    method: o.method,
    /** Heating-season natural rate used for annual energy. */
    seasonal: useN ? { cfm: nFactorResult.cfmNat, ach: nAch } : { cfm: seasonalCfm, ach: (seasonalCfm * 60) / o.volumeFt3 },
    /** Natural rate used for the design heat load. */
    design: useN ? { cfm: nFactorResult.cfmNat, ach: nAch } : { cfm: designCfm, ach: (designCfm * 60) / o.volumeFt3 },
  };
}
export type InfiltrationResult = ReturnType<typeof computeInfiltration>;
