// "How we calculated this": one line per method with its source, for reports.
export const METHOD_NOTES = [
  { topic: "U-factors", method: "Parallel path (wood framing) or isothermal planes (steel, masonry); both shown", source: "ASHRAE Handbook—Fundamentals, Heat, Air and Moisture Control in Building Assemblies—Fundamentals" },
  { topic: "Material R-values", method: "SI figures of the dataset entry converted to IP", source: "EnergyPlus ASHRAE_2005_HOF_Materials.idf (ASHRAE HoF 2005); other entries tagged from memory or common practice" },
  { topic: "Design heat load", method: "q = (UA + 1.08 × CFM_nat) × (t_in − t_design)", source: "ASHRAE standard air: 60 × 0.075 × 0.24 = 1.08" },
  { topic: "Air leakage", method: "ACH50 = CFM50 × 60 / V; ELA at 4 Pa, n = 0.65; N-factor; ASHRAE basic model", source: "Sherman 1987 (Energy and Buildings 10); ASHRAE HoF basic model coefficients via EnergyPlus I/O Reference" },
  { topic: "Annual heating", method: "Q = 24 × (UA + 1.08 × CFM_nat) × HDD65 × C_D / η", source: "ASHRAE Fundamentals, degree-day method" },
  { topic: "Climate", method: "Station table, auditor-typed climate, or EPW weather file", source: "EnergyPlus .stat files (ASHRAE Climate Design Data 2009); EPW daily means" },
  { topic: "Economics", method: "Simple payback = cost / first-year saving; SIR = saving × UPV* / cost, UPV* = (1+e)/(d−e) × [1 − ((1+e)/(1+d))^N]", source: "10 CFR 455.63; 10 CFR 440.21; NIST Handbook 135" },
  { topic: "Dense-pack", method: "Net area × (1 − framing fraction) × depth × density ÷ bag weight", source: "DOE Standard Work Specifications 4.1103.1 (≥ 3.5 lb/ft³)" },
  { topic: "Moisture", method: "Steady-state interface temperatures vs indoor dew point (psychrolib)", source: "ASHRAE Fundamentals psychrometrics; screening check only" },
  { topic: "Ventilation", method: "Q_tot, infiltration credit and fan rate", source: "ASHRAE Standard 62.2-2016 §4.1" },
] as const;
