// Upgrade costs from the price book (lib/documents/proposal-lines.ts) and the two passes that feed
// them to the savings figures (lib/assessment/pricing.ts). Quantities are calc's; prices are the
// invented demo price book below; the crew-productivity defaults are invented demo figures.
import { describe, expect, it } from "vitest";
import { analyzeHouse, demoHouseInput, type HouseAnalysis } from "@/calc";
import type { AssessmentDoc } from "@/lib/assessment/doc";
import { costsMatch, twoPass, withCosts } from "@/lib/assessment/pricing";
import { DEFAULT_BAGS_PER_CREW_HOUR, DEFAULT_CFM50_CUT_PER_CREW_HOUR, priceJob, proposalLines, proposalTotals, type PriceItem } from "@/lib/documents/proposal-lines";

const book: PriceItem[] = [
  { id: "p1", code: "CEL-BAG", name: "Dense-pack cellulose", unit: "bag", unitPriceCents: 1650 },
  { id: "p2", code: "LAB-INS", name: "Insulation labour", unit: "hour", unitPriceCents: 8500 },
  { id: "p3", code: "DRILL-PLUG", name: "Drill, plug and patch", unit: "hole", unitPriceCents: 900 },
  { id: "p4", code: "AIR-SEAL", name: "Air sealing labour", unit: "hour", unitPriceCents: 9500 },
  { id: "p5", code: "ATTIC-BLOWN", name: "Attic blown", unit: "ft2", unitPriceCents: 185 },
  { id: "p6", code: "PERMIT", name: "Building permit", unit: "permit", unitPriceCents: 25000, taxable: false },
];

// The demo house as an assessment document: only the parts pricing reads matter here.
const ups = demoHouseInput.upgrades.map((u, i) => ({ ...u, id: `u${i}` }));
const analysis = analyzeHouse(demoHouseInput);
const half = (x: number) => Math.max(0.5, Math.round(x * 2) / 2);

describe("priceJob", () => {
  const p = priceJob(ups, analysis, book);
  const [seal, attic, dense] = p.upgrades;

  it("prices dense-pack from the estimate: bags, holes and crew hours at the price book's prices", () => {
    const bags = Math.ceil(analysis.densePack.reduce((a, w) => a + w.bags, 0));
    const holes = analysis.densePack.reduce((a, w) => a + w.holes, 0);
    expect(bags).toBeGreaterThan(0);
    const byKey = Object.fromEntries(dense!.lines.map((l) => [l.key, l]));
    expect(byKey.bags!.quantity).toBe(bags);
    expect(byKey.bags!.totalCents).toBe(Math.round(bags * 1650));
    expect(byKey.holes!.quantity).toBe(holes);
    expect(byKey.labour!.quantity).toBe(half(bags / DEFAULT_BAGS_PER_CREW_HOUR));
    expect(dense!.costCents).toBe(dense!.lines.reduce((a, l) => a + l.totalCents, 0));
  });

  it("prices air sealing from the CFM50 it takes out, not from a typed cost", () => {
    const hours = half((3900 - 2400) / DEFAULT_CFM50_CUT_PER_CREW_HOUR);
    expect(seal!.lines).toHaveLength(1);
    expect(seal!.lines[0]!.quantity).toBe(hours);
    expect(seal!.costCents).toBe(hours * 9500);
    // The demo input's typed $1,800 plays no part.
    const retyped = priceJob(ups.map((u) => ({ ...u, costUSD: 99_999 })), analysis, book);
    expect(retyped.upgrades[0]!.costCents).toBe(seal!.costCents);
  });

  it("prices the attic on the ceilings the upgrade covers", () => {
    const ceilings = demoHouseInput.surfaces.filter((s) => s.kind === "ceiling").reduce((a, s) => a + s.grossAreaFt2, 0);
    expect(attic!.lines[0]!.quantity).toBe(Math.round(ceilings));
    expect(attic!.costCents).toBe(Math.round(ceilings) * 185);
  });

  it("does not price ceilings already at the target", () => {
    const done = priceJob(ups.map((u) => (u.type === "attic-insulation" ? { ...u, targetRIP: 1 } : u)), analyzeHouse({ ...demoHouseInput, upgrades: demoHouseInput.upgrades.map((u) => (u.type === "attic-insulation" ? { ...u, targetRIP: 1 } : u)) }), book);
    expect(done.upgrades[1]!.lines).toHaveLength(0);
    expect(done.upgrades[1]!.costCents).toBe(0);
  });

  it("applies a job's quantity and unit price changes, and a total override with its reason", () => {
    const changed = priceJob(
      ups.map((u, i) => (i === 2 ? { ...u, pricing: { lines: { bags: { quantity: 100 }, holes: { unitPriceCents: 1000 } } } } : i === 1 ? { ...u, pricing: { totalOverride: { cents: 200_000, reason: "Attic hatch rebuilt in the same visit" } } } : u)),
      analysis, book,
    );
    const d = Object.fromEntries(changed.upgrades[2]!.lines.map((l) => [l.key, l]));
    expect(d.bags!.quantity).toBe(100);
    expect(d.bags!.overridden).toEqual({ quantity: true, unitPrice: false });
    expect(d.bags!.computed.quantity).toBe(dense!.lines[0]!.quantity);
    expect(d.labour!.quantity).toBe(half(100 / DEFAULT_BAGS_PER_CREW_HOUR)); // labour follows the bags priced
    expect(d.holes!.unitPriceCents).toBe(1000);
    expect(changed.upgrades[1]!.costCents).toBe(200_000);
    expect(changed.upgrades[1]!.linesCents).toBe(attic!.linesCents);

    // The proposal's upgrade lines still add up to the upgrade costs: the override becomes an adjustment line.
    const lines = proposalLines(changed);
    const adj = lines.find((l) => l.key === "adjustment")!;
    expect(adj.description).toBe("Price adjustment: Attic hatch rebuilt in the same visit");
    expect(adj.totalCents).toBe(200_000 - attic!.linesCents);
    for (const u of changed.upgrades) expect(lines.filter((l) => l.upgradeIndex === u.index).reduce((a, l) => a + l.totalCents, 0)).toBe(u.costCents);
    expect(proposalTotals(lines, 0).upgradesCents).toBe(changed.upgradesCents);
  });

  it("adds the permit as a job line, untaxed, and a missing price book item prices at $0 and says so", () => {
    expect(p.jobLines.map((l) => [l.key, l.totalCents, l.taxable])).toEqual([["permit", 25000, false]]);
    const noSeal = priceJob(ups, analysis, book.filter((b) => b.code !== "AIR-SEAL"));
    expect(noSeal.upgrades[0]!.lines[0]!.missingCode).toBe("AIR-SEAL");
    expect(noSeal.upgrades[0]!.costCents).toBe(0);
    const typed = priceJob(ups.map((u, i) => (i === 0 ? { ...u, pricing: { lines: { hours: { unitPriceCents: 10_000 } } } } : u)), analysis, book.filter((b) => b.code !== "AIR-SEAL"));
    expect(typed.upgrades[0]!.lines[0]!.missingCode).toBeUndefined();
    expect(typed.upgrades[0]!.costCents).toBe(seal!.lines[0]!.quantity * 10_000);
  });
});

describe("proposalTotals", () => {
  it("keeps a rate of 6.625 % exactly (parts per million) and leaves untaxed lines out of the tax", () => {
    const lines = [
      { description: "a", quantity: 1, unit: "each", unitPriceCents: 100_000, totalCents: 100_000, upgradeIndex: 0 },
      { description: "permit", quantity: 1, unit: "permit", unitPriceCents: 25_000, totalCents: 25_000, taxable: false },
    ];
    const t = proposalTotals(lines, 66_250);
    expect(t.taxCents).toBe(6625); // 6.625 % of $1,000.00
    expect(t.totalCents).toBe(125_000 + 6625);
    expect(t.upgradesCents).toBe(100_000);
  });
});

describe("twoPass", () => {
  const doc = { upgrades: ups } as unknown as AssessmentDoc;
  const analyze = (d: AssessmentDoc) => ({ analysis: analyzeHouse({ ...demoHouseInput, upgrades: d.upgrades.map(({ id: _id, ...u }) => (void _id, u)) }) as HouseAnalysis | null });

  it("prices from pass 1's quantities, then analyses again so payback and SIR use the priced costs", () => {
    let calls = 0;
    const r = twoPass(doc, book, (d) => (calls++, analyze(d)));
    expect(calls).toBe(2);
    const priced = priceJob(ups, analysis, book);
    r.result.analysis!.upgrades.forEach((u, i) => expect(Math.round(u.costUSD * 100)).toBe(priced.upgrades[i]!.costCents));
    expect(r.result.analysis!.package.costUSD * 100).toBeCloseTo(priced.upgradesCents, 6);
    expect(r.result.analysis!.package.simplePaybackYears).toBeCloseTo(priced.upgradesCents / 100 / r.result.analysis!.package.savings.usd, 9);
    expect(costsMatch(r.doc, r.pricing!)).toBe(true);
  });

  it("skips pass 2 when the document already holds its priced costs, and leaves an incomplete document as it is", () => {
    const pricedDoc = withCosts(doc, priceJob(ups, analysis, book));
    let calls = 0;
    twoPass(pricedDoc, book, (d) => (calls++, analyze(d)));
    expect(calls).toBe(1);
    const none = twoPass(doc, book, () => ({ analysis: null }));
    expect(none.pricing).toBeNull();
    expect(none.doc).toBe(doc);
  });
});
