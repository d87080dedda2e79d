import "server-only";
import { and, asc, eq, ne } from "drizzle-orm";
import { getDb, type Db } from "@/db";
import { companies, proposalLineItems, proposals, type ProposalStatus } from "@/db/schema";
import { ApiError } from "@/lib/api/errors";
import type { AuthUser } from "@/lib/authz/guard";
import type { AssessmentDoc } from "@/lib/assessment/doc";
import { priceDoc } from "@/lib/assessment/pricing";
import { proposalLines, proposalTotals, type JobPricing, type PricedLine } from "@/lib/documents/proposal-lines";
import { activePriceItems, analyzeDoc, loadAssessment } from "./assessment";

// The job's draft proposal: one `proposals` row with status "draft" and its `proposal_line_items`,
// written from the same priced lines as the upgrade costs (lib/documents/proposal-lines.ts). The
// per-job overrides themselves live in the assessment document (upgrades[].pricing), because they
// are inputs of the savings figures the browser recomputes on every keystroke and they must save,
// conflict and survive offline with the rest of the assessment. The draft rows are their priced
// result, brought up to date whenever they are read or issued. Issuing freezes the draft
// (status "issued", linked from issued_documents.proposal_id); the next read starts a new draft.

// Deposit share is the company's; this default is invented for the demo.
export const DEPOSIT_SHARE = 0.25;

type Tx = Parameters<Parameters<Db["transaction"]>[0]>[0];

/** The job's assessment (priced), its analysis, and the priced lines of every upgrade. */
export async function jobPricing(user: AuthUser, jobId: string) {
  const [{ doc }, items] = await Promise.all([loadAssessment(user, jobId), activePriceItems(user)]);
  const { analysis, issues } = analyzeDoc(doc);
  if (!analysis) throw new ApiError(422, "The assessment is not complete enough to price: fix these fields first.", Object.fromEntries(issues.map((i) => [i.path, [i.message]])));
  return { doc, analysis, pricing: priceDoc(doc, analysis, items) };
}

export async function companyTaxRatePpm(db: Db | Tx, companyId: string) {
  const [c] = await db.select({ ppm: companies.taxRatePpm }).from(companies).where(eq(companies.id, companyId));
  return c?.ppm ?? 0;
}

/** Writes the priced lines into the job's draft proposal (creating it), and returns its id. */
export async function writeDraft(tx: Tx, jobId: string, doc: AssessmentDoc, lines: PricedLine[], taxRatePpm: number) {
  const totals = proposalTotals(lines, taxRatePpm);
  const [existing] = await tx.select({ id: proposals.id }).from(proposals).where(and(eq(proposals.jobId, jobId), eq(proposals.status, "draft")));
  const values = { taxRatePpm, depositCents: Math.round(totals.totalCents * DEPOSIT_SHARE), updatedAt: new Date() };
  let id = existing?.id;
  if (id) await tx.update(proposals).set(values).where(eq(proposals.id, id));
  else id = (await tx.insert(proposals).values({ ...values, jobId, status: "draft" }).returning({ id: proposals.id }))[0]!.id;
  await tx.delete(proposalLineItems).where(eq(proposalLineItems.proposalId, id));
  if (lines.length) {
    await tx.insert(proposalLineItems).values(lines.map((l, position) => ({
      proposalId: id, position, priceBookItemId: l.priceBookItemId, upgradeId: l.upgradeIndex !== undefined ? (doc.upgrades[l.upgradeIndex]?.id ?? null) : null,
      description: l.description, quantity: l.quantity, unit: l.unit, unitPriceCents: l.unitPriceCents, totalCents: l.totalCents, taxable: l.taxable !== false,
    })));
  }
  return id;
}

/** Marks the draft issued and any earlier issued proposal of the job superseded. */
export async function freezeDraft(tx: Tx, jobId: string, id: string, terms: { validUntil: number; terms: string }) {
  await tx.update(proposals).set({ status: "superseded", updatedAt: new Date() }).where(and(eq(proposals.jobId, jobId), eq(proposals.status, "issued"), ne(proposals.id, id)));
  await tx.update(proposals).set({ status: "issued", validUntil: new Date(terms.validUntil), terms: terms.terms, updatedAt: new Date() }).where(eq(proposals.id, id));
}

export async function setProposalStatus(tx: Tx, id: string, status: ProposalStatus) {
  await tx.update(proposals).set({ status, updatedAt: new Date() }).where(eq(proposals.id, id));
}

export type DraftProposal = {
  id: string;
  status: ProposalStatus;
  taxRatePpm: number;
  /** Upgrade costs here, in the assessment and in the savings report are before sales tax. */
  costsIncludeSalesTax: false;
  upgrades: { upgradeId: string; name: string; costCents: number; linesCents: number; totalOverride: JobPricing["upgrades"][number]["totalOverride"] }[];
  lines: (PricedLine & { upgradeId: string | null })[];
  upgradesCents: number;
  subtotalCents: number;
  taxCents: number;
  totalCents: number;
  depositCents: number;
};

/** The job's draft proposal, brought up to date from the job as it is now. */
export async function getDraftProposal(user: AuthUser, jobId: string): Promise<DraftProposal> {
  const db = getDb();
  const { doc, analysis, pricing } = await jobPricing(user, jobId);
  const lines = proposalLines(pricing);
  const taxRatePpm = await companyTaxRatePpm(db, user.companyId);
  const id = await db.transaction((tx) => writeDraft(tx, jobId, doc, lines, taxRatePpm));
  const [row] = await db.select().from(proposals).where(eq(proposals.id, id));
  const stored = await db.select().from(proposalLineItems).where(eq(proposalLineItems.proposalId, id)).orderBy(asc(proposalLineItems.position));
  const totals = proposalTotals(lines, taxRatePpm);
  return {
    id, status: row!.status, taxRatePpm, costsIncludeSalesTax: false,
    upgrades: pricing.upgrades.map((u) => ({ upgradeId: u.upgradeId, name: analysis.upgrades[u.index]?.name ?? "", costCents: u.costCents, linesCents: u.linesCents, totalOverride: u.totalOverride })),
    lines: lines.map((l, i) => ({ ...l, upgradeId: stored[i]?.upgradeId ?? null })),
    upgradesCents: totals.upgradesCents, subtotalCents: totals.subtotalCents, taxCents: totals.taxCents, totalCents: totals.totalCents, depositCents: row!.depositCents,
  };
}
