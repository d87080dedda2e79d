// Priced line items for a proposal, built from the upgrades, the dense-pack estimate and the
// company's price book. Pure: the caller passes the price book in.
import type { HouseAnalysis } from "@/calc";
import type { ProposalLine } from "./snapshot";

export type PriceItem = { code: string; name: string; unit: string; unitPriceCents: number; taxable?: boolean };

// Crew productivity for labour hours on dense-pack walls: the company's own figure; this default
// is invented for the demo (common practice is to set it from the crew's past jobs).
export const DEFAULT_BAGS_PER_CREW_HOUR = 6;

const roundHalf = (x: number) => Math.max(0.5, Math.round(x * 2) / 2);

export function proposalLines(analysis: HouseAnalysis, items: PriceItem[], opts: { ceilingAreaFt2: number; permit: boolean }): ProposalLine[] {
  const byCode = new Map(items.map((i) => [i.code, i]));
  const lines: ProposalLine[] = [];
  const line = (code: string, quantity: number, upgradeIndex: number | undefined, description?: string) => {
    const item = byCode.get(code);
    if (!item || quantity <= 0) return false;
    lines.push({ description: description ?? item.name, quantity, unit: item.unit, unitPriceCents: item.unitPriceCents, totalCents: Math.round(quantity * item.unitPriceCents), taxable: item.taxable ?? true, upgradeIndex });
    return true;
  };
  const fallback = (u: HouseAnalysis["upgrades"][number]) =>
    lines.push({ description: u.name, quantity: 1, unit: "each", unitPriceCents: Math.round(u.costUSD * 100), totalCents: Math.round(u.costUSD * 100), upgradeIndex: u.index });

  for (const u of analysis.upgrades) {
    if (u.type === "dense-pack-walls") {
      const bags = analysis.densePack.reduce((a, w) => a + w.bags, 0);
      const holes = analysis.densePack.reduce((a, w) => a + w.holes, 0);
      const ok = line("CEL-BAG", bags, u.index, `Dense-pack cellulose, ${analysis.densePack.length} walls (from the estimate)`);
      line("DRILL-PLUG", holes, u.index, "Drill, plug and patch fill holes");
      line("LAB-INS", roundHalf(bags / DEFAULT_BAGS_PER_CREW_HOUR), u.index, "Insulation crew labour");
      if (!ok) fallback(u);
    } else if (u.type === "attic-insulation") {
      if (!line("ATTIC-BLOWN", Math.round(opts.ceilingAreaFt2), u.index, `${u.name} (attic floor)`)) fallback(u);
    } else if (u.type === "air-sealing") {
      const rate = byCode.get("AIR-SEAL")?.unitPriceCents;
      if (!rate || !line("AIR-SEAL", roundHalf((u.costUSD * 100) / rate), u.index, u.name)) fallback(u);
    } else {
      fallback(u);
    }
  }
  if (opts.permit) line("PERMIT", 1, undefined);
  return lines;
}
