// Priced lines for a job, built from the upgrades, the quantities calc worked out (dense-pack
// bags and holes, attic floor area, the CFM50 an air-sealing crew has to take out) and the
// company's price book, with the auditor's per-job changes applied. One pure function prices
// both the upgrade costs the savings report uses and the lines of the proposal, so the two
// always agree. The caller passes the price book and the analysis in.
import type { HouseAnalysis } from "@/calc";
import type { LineOverride, UpgradePricing } from "@/db/schema";
import type { ProposalLine } from "./snapshot";

export type PriceItem = { id?: string; code: string; name: string; unit: string; unitPriceCents: number; taxable?: boolean };

// Crew productivity for labour hours on dense-pack walls: the company's own figure; this default
// is invented for the demo (common practice is to set it from the crew's past jobs).
export const DEFAULT_BAGS_PER_CREW_HOUR = 6;

// Air-sealing crew hours: the CFM50 a crew takes out of a house per hour of work. The company's
// own figure; this default is invented for the demo (set it from the crew's test-in/test-out
// records). The auditor edits the hours per job.
export const DEFAULT_CFM50_CUT_PER_CREW_HOUR = 100;

/** The price book codes each kind of line is priced with. */
export const PRICE_CODES = { bags: "CEL-BAG", holes: "DRILL-PLUG", labour: "LAB-INS", area: "ATTIC-BLOWN", hours: "AIR-SEAL", windows: "WINDOW", permit: "PERMIT" } as const;

/** A line as the upgrades section and the proposal show it: the priced line plus where each figure came from. */
export type PricedLine = ProposalLine & {
  /** Stable per upgrade ("bags", "holes", "labour", "area", "hours", "item", "adjustment"): per-job overrides are keyed by it. */
  key: string;
  code: string | null;
  priceBookItemId: string | null;
  /** The quantity and unit price before this job's overrides. */
  computed: { quantity: number; unitPriceCents: number };
  overridden: { quantity: boolean; unitPrice: boolean };
  /** Set when the price book lacks the item: the line is priced at $0 until the auditor types a unit price. */
  missingCode?: string;
};

export type UpgradePrice = {
  upgradeId: string;
  index: number;
  lines: PricedLine[];
  /** Sum of the lines, before any total override. */
  linesCents: number;
  /** What the upgrade costs (the lines, or the override): the savings report's cost, before sales tax. */
  costCents: number;
  totalOverride: { cents: number; reason: string } | null;
};

export type JobPricing = {
  upgrades: UpgradePrice[];
  /** Lines that price the job, not one upgrade (the permit). */
  jobLines: PricedLine[];
  /** Every upgrade's cost added up: equals the proposal's subtotal of upgrade lines. */
  upgradesCents: number;
};

type PricedUpgradeInput = { id: string; type: string; name?: string | null; pricing?: UpgradePricing | null };

const roundHalf = (x: number) => Math.max(0.5, Math.round(x * 2) / 2);
const cents = (quantity: number, unitPriceCents: number) => Math.round(quantity * unitPriceCents);

/**
 * Prices every upgrade of a job. `analysis` must be the analysis of the same upgrades in the same
 * order (its costs do not matter: none of the quantities depend on them; see `twoPass` below).
 */
export function priceJob(
  upgrades: PricedUpgradeInput[],
  analysis: Pick<HouseAnalysis, "upgrades" | "densePack"> & { input: { surfaces: { id: string; grossAreaFt2: number }[] } },
  items: PriceItem[],
  opts: { permit: boolean } = { permit: true },
): JobPricing {
  const byCode = new Map(items.map((i) => [i.code, i]));
  const areaOf = new Map(analysis.input.surfaces.map((s) => [s.id, s.grossAreaFt2]));

  const make = (key: string, code: string | null, quantity: number, description: string, upgradeIndex: number | undefined, override: LineOverride | undefined, fallbackUnit = "each"): PricedLine => {
    const item = code ? byCode.get(code) : undefined;
    const computed = { quantity, unitPriceCents: item?.unitPriceCents ?? 0 };
    const q = override?.quantity ?? computed.quantity;
    const p = override?.unitPriceCents ?? computed.unitPriceCents;
    return {
      key, code: item ? item.code : null, priceBookItemId: item?.id ?? null,
      description, quantity: q, unit: item?.unit ?? fallbackUnit, unitPriceCents: p, totalCents: cents(q, p), taxable: item?.taxable ?? true, upgradeIndex,
      computed, overridden: { quantity: override?.quantity !== undefined, unitPrice: override?.unitPriceCents !== undefined },
      ...(code && !item && override?.unitPriceCents === undefined ? { missingCode: code } : {}),
    };
  };

  const priced = upgrades.map((u, i): UpgradePrice => {
    const a = analysis.upgrades[i];
    const o = u.pricing?.lines ?? {};
    const lines: PricedLine[] = [];
    const name = u.name || a?.name || u.type;
    if (u.type === "dense-pack-walls") {
      const ids = new Set((a?.details.surfaceIds as string[] | undefined) ?? []);
      const walls = analysis.densePack.filter((w) => ids.has(w.surfaceId));
      // Cellulose is bought by the bag: the estimate's total, rounded up to a whole bag.
      const bags = Math.ceil(walls.reduce((s, w) => s + w.bags, 0) - 1e-9);
      const holes = walls.reduce((s, w) => s + w.holes, 0);
      const bagLine = make("bags", PRICE_CODES.bags, bags, `Dense-pack cellulose, ${walls.length} walls (from the estimate)`, i, o.bags, "bag");
      lines.push(bagLine);
      lines.push(make("holes", PRICE_CODES.holes, holes, "Drill, plug and patch fill holes", i, o.holes, "hole"));
      // Labour follows the bags actually priced, so a changed bag count moves the hours too.
      lines.push(make("labour", PRICE_CODES.labour, roundHalf(bagLine.quantity / DEFAULT_BAGS_PER_CREW_HOUR), "Insulation crew labour", i, o.labour, "hour"));
    } else if (u.type === "attic-insulation") {
      // Ceilings already at the target get nothing blown in, so they are not priced.
      const added = ((a?.details.added as { surfaceId: string; addedRIP: number }[] | undefined) ?? []).filter((x) => x.addedRIP > 0);
      const area = Math.round(added.reduce((s, x) => s + (areaOf.get(x.surfaceId) ?? 0), 0));
      lines.push(make("area", PRICE_CODES.area, area, `${name} (attic floor)`, i, o.area, "ft2"));
    } else if (u.type === "air-sealing") {
      const from = Number(a?.details.fromCfm50 ?? 0);
      const to = Number(a?.details.toCfm50 ?? 0);
      lines.push(make("hours", PRICE_CODES.hours, roundHalf(Math.max(0, from - to) / DEFAULT_CFM50_CUT_PER_CREW_HOUR), name, i, o.hours, "hour"));
    } else if (u.type === "windows") {
      const count = Number(a?.details.windowsReplaced ?? 0);
      lines.push(make("item", PRICE_CODES.windows, count, name, i, o.item));
    } else {
      lines.push(make("item", null, 1, name, i, o.item));
    }
    const kept = lines.filter((l) => l.quantity > 0 || l.overridden.quantity);
    const linesCents = kept.reduce((s, l) => s + l.totalCents, 0);
    const over = u.pricing?.totalOverride ?? null;
    return { upgradeId: u.id, index: i, lines: kept, linesCents, costCents: over ? over.cents : linesCents, totalOverride: over };
  });

  const jobLines: PricedLine[] = [];
  if (opts.permit && byCode.has(PRICE_CODES.permit)) jobLines.push(make("permit", PRICE_CODES.permit, 1, byCode.get(PRICE_CODES.permit)!.name, undefined, undefined, "permit"));
  return { upgrades: priced, jobLines, upgradesCents: priced.reduce((s, u) => s + u.costCents, 0) };
}

/**
 * The proposal's lines: every upgrade's lines, an adjustment line where the auditor overrode an
 * upgrade's total (so the upgrade lines still add up to the cost the savings report shows), then
 * the job's own lines.
 */
export function proposalLines(pricing: JobPricing): PricedLine[] {
  const out: PricedLine[] = [];
  for (const u of pricing.upgrades) {
    out.push(...u.lines);
    const diff = u.costCents - u.linesCents;
    if (u.totalOverride && diff !== 0) {
      out.push({
        key: "adjustment", code: null, priceBookItemId: null, description: `Price adjustment: ${u.totalOverride.reason}`, quantity: 1, unit: "each",
        unitPriceCents: diff, totalCents: diff, taxable: true, upgradeIndex: u.index, computed: { quantity: 1, unitPriceCents: diff }, overridden: { quantity: false, unitPrice: true },
      });
    }
  }
  return [...out, ...pricing.jobLines];
}

/** Subtotal, tax and total of priced lines. The rate is in parts per million (6.625 % is 66 250). */
export function proposalTotals(lines: ProposalLine[], taxRatePpm: number) {
  const subtotalCents = lines.reduce((a, l) => a + l.totalCents, 0);
  const taxableCents = lines.filter((l) => l.taxable !== false).reduce((a, l) => a + l.totalCents, 0);
  const taxCents = Math.round((taxableCents * taxRatePpm) / 1_000_000);
  const upgradesCents = lines.filter((l) => l.upgradeIndex !== undefined).reduce((a, l) => a + l.totalCents, 0);
  return { subtotalCents, taxableCents, taxCents, totalCents: subtotalCents + taxCents, upgradesCents };
}

/** The line as a snapshot keeps it (no editing details). */
export const frozenLine = (l: PricedLine): ProposalLine => ({
  description: l.description, quantity: l.quantity, unit: l.unit, unitPriceCents: l.unitPriceCents, totalCents: l.totalCents, taxable: l.taxable, upgradeIndex: l.upgradeIndex,
});
