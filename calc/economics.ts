// Simple payback (10 CFR 455.63), savings-to-investment ratio (10 CFR 440.21: a
// measure qualifies at SIR ≥ 1) and present-value factors (NIST Handbook 135).

/** Uniform present value factor UPV = [1 − (1+d)^−N] / d (NIST Handbook 135). */
export function upv(d: number, years: number): number {
  return d === 0 ? years : (1 - (1 + d) ** -years) / d;
}

/**
 * Modified uniform present value factor for an annual amount escalating at e:
 * UPV* = (1+e)/(d−e) · [1 − ((1+e)/(1+d))^N]  (NIST Handbook 135, 1995, modified UPV;
 * the same form appears as UPW* in the GSA P100 life-cycle costing criteria). UPV* = N when d = e.
 */
export function upvEscalated(d: number, e: number, years: number): number {
  if (Math.abs(d - e) < 1e-12) return years;
  return ((1 + e) / (d - e)) * (1 - ((1 + e) / (1 + d)) ** years);
}

/** Years to repay the cost from the first-year saving; null when there is no saving. */
export function simplePayback(costUSD: number, annualSavingUSD: number): number | null {
  const years = costUSD / annualSavingUSD;
  return annualSavingUSD > 0 && Number.isFinite(years) ? years : null;
}

/** SIR = present value of lifetime energy-cost savings / installed cost; null for a zero cost. */
export function savingsToInvestment(annualSavingUSD: number, costUSD: number, d: number, e: number, lifeYears: number): number | null {
  const sir = (annualSavingUSD * upvEscalated(d, e, lifeYears)) / costUSD;
  return costUSD > 0 && Number.isFinite(sir) ? sir : null;
}

// Measure lives, years: wall and attic insulation 20–30 → 25; air sealing 10–15 → 12 (from memory, METHODS.md §4);
// replacement windows 25 (from memory)
export const MEASURE_LIFE_YEARS = { "dense-pack-walls": 25, "attic-insulation": 25, "air-sealing": 12, windows: 25 } as const;

// Default real discount rate 3 % and fuel escalation 0 % (placeholders, common practice; set from the NIST Handbook 135 annual supplement)
export const DEFAULT_DISCOUNT_RATE = 0.03;
export const DEFAULT_FUEL_ESCALATION = 0;
