// Dense-pack quantities per wall: cavity volume → pounds at the installed density →
// bags → holes (METHODS.md §5).

// Installed density for walls, lb/ft³: at least 3.5 (DOE Standard Work Specifications 4.1103.1, per METHODS.md)
export const DEFAULT_DENSITY_LB_FT3 = 3.5;
// Bag weight, lb: about 25 lb is typical; use the product's own (common practice)
export const DEFAULT_BAG_WEIGHT_LB = 25;
// Height of one bay (one storey of studs), ft, when the auditor gives none (common practice)
export const DEFAULT_STOREY_HEIGHT_FT = 8.5;

export interface DensePackInput {
  surfaceId: string; surfaceName: string;
  grossAreaFt2: number; netAreaFt2: number; heightFt: number;
  framingFraction: number; cavityDepthIn: number; spacingIn: number;
  densityLbFt3: number; bagWeightLb: number; storeyHeightFt: number;
  /** Share of bays blocked part-way (fire-blocking, a mid-height obstruction): two holes each. */
  blockedBayFraction: number;
}

export interface DensePackEstimate {
  surfaceId: string; surfaceName: string;
  cavityVolumeFt3: number; pounds: number; bags: number; bagsRoundedUp: number;
  bays: number; blockedBays: number; holes: number;
  perBay: { volumeFt3: number; pounds: number; bags: number };
  inputs: DensePackInput; formula: string;
}

export function densePackEstimate(i: DensePackInput): DensePackEstimate {
  const volume = i.netAreaFt2 * (1 - i.framingFraction) * (i.cavityDepthIn / 12);
  const pounds = volume * i.densityLbFt3;
  const bags = pounds / i.bagWeightLb;
  const lengthFt = i.grossAreaFt2 / i.heightFt;
  const baysAcross = Math.ceil((lengthFt * 12) / i.spacingIn - 1e-9);
  const baysUp = Math.max(1, Math.round(i.heightFt / i.storeyHeightFt));
  const bays = baysAcross * baysUp;
  const blocked = Math.round(bays * i.blockedBayFraction);
  return {
    surfaceId: i.surfaceId, surfaceName: i.surfaceName,
    cavityVolumeFt3: volume, pounds, bags, bagsRoundedUp: Math.ceil(bags - 1e-9),
    bays, blockedBays: blocked, holes: bays + blocked,
    perBay: { volumeFt3: volume / bays, pounds: pounds / bays, bags: bags / bays },
    inputs: i,
    formula: "volume = net area × (1 − framing fraction) × cavity depth; lb = volume × density; bags = lb ÷ bag weight; holes = bays + blocked bays",
  };
}
