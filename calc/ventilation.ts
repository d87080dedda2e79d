// Whole-dwelling ventilation, ASHRAE Standard 62.2-2016 (METHODS.md §3).

// Qtot = 0.03·A_floor + 7.5·(N_br + 1), cfm (62.2-2016 §4.1.1)
export const QTOT_PER_FT2 = 0.03;
export const QTOT_PER_OCCUPANT = 7.5;
// Q_inf = 0.052·Q50·wsf·(H/8.2)^0.4, cfm (62.2-2016 §4.1.2; DOE SWS "Calculation of the Infiltration Credit")
export const INF_CREDIT_COEFF = 0.052;
export const INF_REF_HEIGHT_FT = 8.2;
export const INF_HEIGHT_EXPONENT = 0.4;
// Weather and shielding factor when the station's is not known: from memory, a mid-range value;
// look up the station in 62.2-2016 Normative Appendix B
export const DEFAULT_WSF = 0.5;

export interface VentilationInput { floorAreaFt2: number; bedrooms: number; cfm50: number; wsf: number; heightFt: number; balanced: boolean }
export interface VentilationResult {
  qTotCfm: number; qInfCfm: number; phi: number; fanCfm: number; needsFan: boolean; inputs: VentilationInput; formula: string;
}

export function ventilation62_2(i: VentilationInput): VentilationResult {
  const qTot = QTOT_PER_FT2 * i.floorAreaFt2 + QTOT_PER_OCCUPANT * (i.bedrooms + 1);
  const qInf = INF_CREDIT_COEFF * i.cfm50 * i.wsf * (i.heightFt / INF_REF_HEIGHT_FT) ** INF_HEIGHT_EXPONENT;
  // Φ = 1 for balanced systems, Q_inf/Q_tot otherwise (62.2-2016 §4.1.2, from memory)
  const phi = i.balanced ? 1 : qInf / qTot;
  const fan = Math.max(0, qTot - phi * qInf);
  return {
    qTotCfm: qTot, qInfCfm: qInf, phi, fanCfm: fan, needsFan: fan > 0, inputs: i,
    formula: "Q_tot = 0.03·A + 7.5·(N_br + 1); Q_inf = 0.052·Q50·wsf·(H/8.2)^0.4; Q_fan = Q_tot − Φ·Q_inf",
  };
}
