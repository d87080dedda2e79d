// What an issued document freezes: every input, every result, the company's details and the
// methods and sources used. The on-screen report and the PDF are both drawn from this object.
import type { HouseAnalysis } from "@/calc";
import type { AssessmentDoc } from "@/lib/assessment/doc";

export type DocumentKind = "savings-report" | "proposal";

export type ProposalLine = {
  description: string;
  quantity: number;
  unit: string;
  unitPriceCents: number;
  totalCents: number;
  /** False for lines sales tax does not apply to (a permit fee, for instance). */
  taxable?: boolean;
  /** Which upgrade the line prices, when it prices one. */
  upgradeIndex?: number;
};

export type ProposalTerms = {
  lines: ProposalLine[];
  subtotalCents: number;
  /** The lines that price upgrades, added up: equals the savings report's package cost (both before tax). */
  upgradesCents?: number;
  /** Sales tax in parts per million of the taxable lines: 6.625 % is 66 250. */
  taxRatePpm?: number;
  /** Snapshots issued before the rate was kept in ppm: hundredths of a percent (662.5 for 6.625 %). */
  taxRateBasisPoints?: number;
  taxCents: number;
  totalCents: number;
  depositCents: number;
  validUntil: number;
  terms: string;
};

export type ReportSnapshot = {
  kind: DocumentKind;
  version: number;
  issuedAt: number;
  issuedByName: string;
  company: { name: string; phone: string | null; email: string | null; address: string | null; licenseLine: string | null; insuranceLine: string | null };
  job: { id: string; number: number; title: string };
  house: { street: string; city: string; state: string; postalCode: string; yearBuilt: number };
  client: { name: string };
  /** "measured" once a test-out reading exists: the report then says the leakage figures are measured. */
  leakageBasis: "predicted" | "measured";
  assessment: AssessmentDoc;
  analysis: HouseAnalysis;
  proposal?: ProposalTerms;
  /** Where the upgrade costs came from, and whether they include sales tax (absent on older snapshots). */
  costBasis?: { source: "price-book"; includesSalesTax: boolean };
  /** Photos chosen for this document; a homeowner may read exactly these. */
  photoIds: string[];
  /** What the report shows beside each photo in `photoIds`, frozen at issue (older snapshots lack it). */
  photos?: SnapshotPhoto[];
  /** The crew log as it stood at issue, when the job had entries (older snapshots lack it). */
  crewSummary?: CrewSummarySnapshot;
};

export type SnapshotPhoto = {
  id: string;
  tag: "before" | "during" | "after" | "thermal";
  caption: string | null;
  surfaceId: string | null;
  surfaceLabel: string | null;
  takenAt: number | null;
  width: number | null;
  height: number | null;
};

/** The crew log's summary frozen into a report: bags, warnings and how they ended, test-out. */
export type CrewSummarySnapshot = {
  entries: number;
  bags: { expected: number; logged: number; ratio: number | null };
  holes: { expected: number; logged: number };
  wallsFinished: number;
  wallsTotal: number;
  perWall: { surfaceId: string; name: string; expectedBags: number; loggedBags: number; ratio: number | null; status: string; finished: boolean }[];
  warnings: { wall: string; kind: "overfill" | "underfill"; bagsAtRaise: number; raisedAt: number; state: "open" | "resolved" | "cleared"; resolution: { note: string; by: string; at: number } | null }[];
  /** Predicted (calc without the reading) against the blower-door reading at test-out, when one was taken. */
  testOut: { testInCfm50: number | null; predictedCfm50: number | null; measuredCfm50: number; measuredReductionPct: number | null; testedAt: number } | null;
};

/** What the report's costs are, in one sentence (older snapshots without `costBasis` say nothing). */
export function costBasisNote(s: Pick<ReportSnapshot, "costBasis">): string | null {
  if (!s.costBasis) return null;
  return s.costBasis.includesSalesTax
    ? "Costs are priced from our price book for your house and include sales tax."
    : "Costs are priced from our price book for your house, before sales tax; the proposal adds the permit and any sales tax.";
}

/** A proposal's tax rate in parts per million, whichever way its snapshot stored it. */
export function taxRatePpmOf(p: Pick<ProposalTerms, "taxRatePpm" | "taxRateBasisPoints">): number {
  return p.taxRatePpm ?? Math.round((p.taxRateBasisPoints ?? 0) * 100);
}

/** A rate in ppm as written: 66 250 → "6.625 %". */
export function taxRateLabel(ppm: number): string {
  return `${String(Number((ppm / 10_000).toFixed(4)))} %`;
}

/** The figures a version list shows side by side. */
export function headline(s: ReportSnapshot) {
  const a = s.analysis;
  return {
    annualCostBeforeUSD: a.baseline.energy.costUSD,
    annualCostAfterUSD: a.final.energy.costUSD,
    yearlySavingUSD: a.package.savings.usd,
    paybackYears: a.package.simplePaybackYears,
    cfm50Before: a.baseline.cfm50,
    cfm50After: a.final.cfm50,
    totalCents: s.proposal?.totalCents ?? null,
  };
}
