// Upgrade costs from the price book, in two passes. Pure: the caller passes the price book and
// the function that analyses a document (calc's analyzeHouse behind the browser's or the server's
// error handling), so the browser and the server run exactly this.
//
// The circle: the priced lines need quantities only the analysis knows (dense-pack bags and holes,
// the ceilings an attic upgrade covers, the CFM50 air sealing takes out), and the analysis needs
// each upgrade's cost for its payback and SIR. None of those quantities depends on a cost, so:
//   pass 1  analyse the document with whatever costs it holds → quantities;
//   price   priceJob(quantities, price book, the job's overrides) → each upgrade's cost;
//   pass 2  analyse again with those costs → payback and SIR.
// When the document already holds the priced costs (the steady state after a load or a save),
// pass 2 would repeat pass 1 exactly, so it is skipped.
import type { HouseAnalysis } from "@/calc";
import { priceJob, type JobPricing, type PriceItem } from "@/lib/documents/proposal-lines";
import type { AssessmentDoc } from "./doc";

/** The document with each upgrade's `costUSD` set to its priced cost. */
export function withCosts(doc: AssessmentDoc, pricing: JobPricing): AssessmentDoc {
  return { ...doc, upgrades: doc.upgrades.map((u, i) => (pricing.upgrades[i] ? { ...u, costUSD: pricing.upgrades[i]!.costCents / 100 } : u)) };
}

/** True when every upgrade already carries its priced cost (to the cent). */
export function costsMatch(doc: AssessmentDoc, pricing: JobPricing): boolean {
  return doc.upgrades.every((u, i) => Math.round(u.costUSD * 100) === (pricing.upgrades[i]?.costCents ?? Math.round(u.costUSD * 100)));
}

/** Prices a document from an analysis of it (pass 1 of the two). */
export function priceDoc(doc: AssessmentDoc, analysis: HouseAnalysis, items: PriceItem[]): JobPricing {
  return priceJob(doc.upgrades, analysis, items);
}

/**
 * Both passes. Without an analysis (the document is incomplete) there is nothing to price from:
 * the document keeps the costs it has and `pricing` is null.
 */
export function twoPass<R extends { analysis: HouseAnalysis | null }>(doc: AssessmentDoc, items: PriceItem[], analyze: (d: AssessmentDoc) => R): { doc: AssessmentDoc; pricing: JobPricing | null; result: R } {
  const first = analyze(doc);
  if (!first.analysis) return { doc, pricing: null, result: first };
  const pricing = priceDoc(doc, first.analysis, items);
  if (costsMatch(doc, pricing)) return { doc, pricing, result: first };
  const priced = withCosts(doc, pricing);
  return { doc: priced, pricing, result: analyze(priced) };
}
