import "server-only";
import { createHash } from "node:crypto";
import { and, desc, eq, isNull, max } from "drizzle-orm";
import { getDb } from "@/db";
import { acceptances, clients, companies, houses, issuedDocuments, jobs, jobStageEvents, users } from "@/db/schema";
import { ApiError, notFound } from "@/lib/api/errors";
import type { AuthUser } from "@/lib/authz/guard";
import { latestTest } from "@/lib/assessment/doc";
import { priceDoc } from "@/lib/assessment/pricing";
import { frozenLine, proposalLines, proposalTotals, type PricedLine } from "@/lib/documents/proposal-lines";
import { headline, type DocumentKind, type ReportSnapshot } from "@/lib/documents/snapshot";
import { queueMail } from "@/lib/mail/outbox";
import { logActivity } from "./activity";
import { activePriceItems, analyzeDoc, loadAssessment } from "./assessment";
import { documentExtras } from "./document-extras";
import { DEPOSIT_SHARE, freezeDraft, setProposalStatus, writeDraft } from "./proposals";
import { jobScope } from "./scope";

const DAY = 86_400_000;
export const PROPOSAL_VALID_DAYS = 30;
// Terms are the company's; this default is invented for the demo. The deposit share is in ./proposals.
const TERMS = "Work follows local codes and licensed practice. Quantities are estimates: material is billed as installed, within 10 % of the estimate unless agreed in writing. The deposit is due on acceptance; the balance on completion after the test-out.";

export const contentHash = (snapshot: ReportSnapshot) => createHash("sha256").update(JSON.stringify(snapshot)).digest("hex");

/** Freezes the job as it is now into a new version of a savings report or proposal. */
export async function issueDocument(user: AuthUser, jobId: string, kind: DocumentKind, photoIds: string[] = []) {
  const db = getDb();
  const { doc } = await loadAssessment(user, jobId);
  const { analysis, issues } = analyzeDoc(doc);
  if (!analysis) throw new ApiError(422, "The assessment is not complete enough to issue: fix these fields first.", Object.fromEntries(issues.map((i) => [i.path, [i.message]])));
  const [row] = await db
    .select({ job: jobs, house: houses, client: clients, company: companies })
    .from(jobs).innerJoin(houses, eq(houses.id, jobs.houseId)).innerJoin(clients, eq(clients.id, jobs.clientId)).innerJoin(companies, eq(companies.id, jobs.companyId))
    .where(and(eq(jobs.id, jobId), jobScope(db, user)));
  if (!row) throw notFound("Job");
  const extras = await documentExtras(user, jobId, photoIds);
  const now = Date.now();
  const c = row.company;
  let proposal: ReportSnapshot["proposal"];
  let draftLines: PricedLine[] = [];
  if (kind === "proposal") {
    // The same priced lines as the upgrade costs in `analysis` (one function prices both).
    const pricing = priceDoc(doc, analysis, await activePriceItems(user));
    draftLines = proposalLines(pricing);
    const totals = proposalTotals(draftLines, c.taxRatePpm);
    proposal = {
      lines: draftLines.map(frozenLine), subtotalCents: totals.subtotalCents, upgradesCents: totals.upgradesCents, taxRatePpm: c.taxRatePpm, taxCents: totals.taxCents, totalCents: totals.totalCents,
      depositCents: Math.round(totals.totalCents * DEPOSIT_SHARE), validUntil: now + PROPOSAL_VALID_DAYS * DAY, terms: TERMS,
    };
  }

  return db.transaction(async (tx) => {
    const [{ last }] = await tx.select({ last: max(issuedDocuments.version) }).from(issuedDocuments).where(and(eq(issuedDocuments.jobId, jobId), eq(issuedDocuments.kind, kind)));
    const version = (last ?? 0) + 1;
    const snapshot: ReportSnapshot = {
      kind, version, issuedAt: now, issuedByName: user.name,
      company: { name: c.name, phone: c.phone, email: c.email, address: c.address, licenseLine: c.licenseLine, insuranceLine: c.insuranceLine },
      job: { id: jobId, number: row.job.number, title: row.job.title },
      house: { street: row.house.street, city: row.house.city, state: row.house.state, postalCode: row.house.postalCode, yearBuilt: row.house.yearBuilt },
      client: { name: row.client.name },
      leakageBasis: latestTest(doc, "test-out") ? "measured" : "predicted",
      assessment: doc, analysis, proposal, ...extras,
      costBasis: { source: "price-book", includesSalesTax: false },
    };
    await tx.update(issuedDocuments).set({ supersededAt: new Date(now) }).where(and(eq(issuedDocuments.jobId, jobId), eq(issuedDocuments.kind, kind), isNull(issuedDocuments.supersededAt)));
    // A proposal freezes the job's draft: the lines are written once more from this very pricing,
    // the draft becomes "issued" and an earlier issued one "superseded".
    let proposalId: string | null = null;
    if (proposal) {
      proposalId = await writeDraft(tx, jobId, doc, draftLines, c.taxRatePpm);
      await freezeDraft(tx, jobId, proposalId, { validUntil: proposal.validUntil, terms: proposal.terms });
    }
    const [created] = await tx
      .insert(issuedDocuments)
      .values({ companyId: user.companyId, jobId, kind, version, snapshot: snapshot as unknown as Record<string, unknown>, contentHash: contentHash(snapshot), issuedAt: new Date(now), issuedById: user.id, proposalId })
      .returning();
    return created!;
  }).then(async (created) => {
    await logActivity(db, { companyId: user.companyId, userId: user.id, action: "document.issue", entityType: "issued-document", entityId: created.id, detail: { kind, version: created.version } });
    return summarize(created);
  });
}

type DocRow = typeof issuedDocuments.$inferSelect;
function summarize(d: DocRow, accepted?: { name: string; acceptedAt: Date } | null) {
  const s = d.snapshot as unknown as ReportSnapshot;
  return { id: d.id, jobId: d.jobId, kind: d.kind, version: d.version, issuedAt: d.issuedAt.getTime(), issuedByName: s.issuedByName, supersededAt: d.supersededAt?.getTime() ?? null, contentHash: d.contentHash, headline: headline(s), accepted: accepted ? { name: accepted.name, at: accepted.acceptedAt.getTime() } : null };
}
export type DocumentSummary = ReturnType<typeof summarize>;

export async function listDocuments(user: AuthUser, jobId?: string) {
  const db = getDb();
  const rows = await db
    .select({ d: issuedDocuments, a: acceptances })
    .from(issuedDocuments).innerJoin(jobs, eq(jobs.id, issuedDocuments.jobId)).leftJoin(acceptances, eq(acceptances.issuedDocumentId, issuedDocuments.id))
    .where(and(jobScope(db, user), jobId ? eq(issuedDocuments.jobId, jobId) : undefined))
    .orderBy(desc(issuedDocuments.issuedAt), desc(issuedDocuments.version));
  return rows.map((r) => summarize(r.d, r.a));
}

export async function getDocument(user: AuthUser, id: string) {
  const db = getDb();
  const [r] = await db
    .select({ d: issuedDocuments, a: acceptances })
    .from(issuedDocuments).innerJoin(jobs, eq(jobs.id, issuedDocuments.jobId)).leftJoin(acceptances, eq(acceptances.issuedDocumentId, issuedDocuments.id))
    .where(and(eq(issuedDocuments.id, id), jobScope(db, user)));
  if (!r) throw notFound("Document");
  return { ...summarize(r.d, r.a), snapshot: r.d.snapshot as unknown as ReportSnapshot };
}

/** A homeowner's acceptance: name, time, address and the document's hash, recorded once and never changed. */
export async function acceptProposal(user: AuthUser, id: string, input: { name: string }, ip: string | null, userAgent: string | null) {
  const db = getDb();
  const doc = await getDocument(user, id);
  if (doc.kind !== "proposal") throw new ApiError(422, "Only a proposal can be accepted.");
  if (doc.supersededAt) throw new ApiError(409, "This proposal has been replaced by a newer version. Open the newest one to accept it.");
  if (doc.accepted) throw new ApiError(409, `This proposal was already accepted by ${doc.accepted.name}.`);
  const now = new Date();
  const result = await db.transaction(async (tx) => {
    const inserted = await tx.insert(acceptances).values({ issuedDocumentId: id, name: input.name, ip, userAgent, documentHash: doc.contentHash, acceptedAt: now, userId: user.id }).onConflictDoNothing().returning({ id: acceptances.id });
    if (!inserted.length) return false;
    const [issued] = await tx.select({ proposalId: issuedDocuments.proposalId }).from(issuedDocuments).where(eq(issuedDocuments.id, id));
    if (issued?.proposalId) await setProposalStatus(tx, issued.proposalId, "accepted");
    const [job] = await tx.select({ stage: jobs.stage, version: jobs.version }).from(jobs).where(eq(jobs.id, doc.jobId));
    if (job && job.stage !== "approved") {
      await tx.update(jobs).set({ stage: "approved", version: job.version + 1, updatedAt: now }).where(eq(jobs.id, doc.jobId));
      await tx.insert(jobStageEvents).values({ jobId: doc.jobId, fromStage: job.stage, toStage: "approved", byUserId: user.id, at: now, note: `Proposal v${doc.version} accepted by ${input.name}` });
    }
    return true;
  });
  if (!result) throw new ApiError(409, "This proposal was already accepted.");
  await logActivity(db, { companyId: user.companyId, userId: user.id, action: "proposal.accept", entityType: "issued-document", entityId: id, detail: { name: input.name, hash: doc.contentHash }, ip });
  const office = await db.select({ email: users.email }).from(users).where(and(eq(users.companyId, user.companyId), eq(users.role, "owner"), eq(users.disabled, false)));
  const s = doc.snapshot;
  for (const o of office) {
    await queueMail({
      to: o.email, kind: "proposal-accepted", companyId: user.companyId, relatedJobId: doc.jobId,
      subject: `Proposal accepted: job #${s.job.number}, ${s.house.street}`,
      text: `${input.name} accepted proposal version ${doc.version} for ${s.house.street}, ${s.house.city} on ${now.toUTCString()}.\nTotal: $${((s.proposal?.totalCents ?? 0) / 100).toFixed(2)}. Document hash ${doc.contentHash}.\nThe job has moved to Approved.`,
    });
  }
  return { acceptedAt: now.getTime() };
}
