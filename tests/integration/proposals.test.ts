// One set of prices: the upgrade costs of the assessment, the savings report and the proposal all
// come from the price book with the job's own changes, and the draft proposal lives in
// proposals/proposal_line_items until issuing freezes it.
import { eq } from "drizzle-orm";
import { describe, expect, it, vi } from "vitest";
import { companies, issuedDocuments, proposalLineItems, proposals } from "@/db/schema";
import type { AssessmentDoc } from "@/lib/assessment/doc";
import type { DraftProposal } from "@/lib/data/proposals";
import type { ReportSnapshot } from "@/lib/documents/snapshot";
import { actAs } from "../support/auth-mock";
import { call } from "../support/route";
import { ids, seededDbForFile } from "./setup";

vi.mock("@/lib/auth", () => import("../support/auth-mock"));
process.env.MAIL_RETRY_INTERVAL_MS = "0";
process.env.SMTP_PORT = "1";

const assessmentRoute = await import("@/app/api/jobs/[id]/assessment/route");
const proposalRoute = await import("@/app/api/jobs/[id]/proposal/route");
const docsRoute = await import("@/app/api/jobs/[id]/documents/route");
const docRoute = await import("@/app/api/documents/[docId]/route");
const acceptRoute = await import("@/app/api/documents/[docId]/accept/route");
const taxRoute = await import("@/app/api/price-book/tax-rate/route");
const ctx = seededDbForFile();

type Loaded = { version: number; doc: AssessmentDoc };
const load = async (as: string = ids.auditor) => (actAs(as), (await call<Loaded>(assessmentRoute.GET as never, { params: { id: ids.demoJob } })).json);
const save = (version: number, doc: AssessmentDoc) => (actAs(ids.auditor), call<{ version: number; fields?: Record<string, string[]> }>(assessmentRoute.PUT as never, { method: "PUT", params: { id: ids.demoJob }, body: { version, doc } }));
const draft = (as: string | null = ids.auditor) => (actAs(as), call<{ proposal: DraftProposal }>(proposalRoute.GET as never, { params: { id: ids.demoJob } }));
const issue = async (kind: "savings-report" | "proposal") => {
  actAs(ids.auditor);
  const r = await call<{ document: { id: string } }>(docsRoute.POST as never, { method: "POST", params: { id: ids.demoJob }, body: { kind } });
  expect(r.status).toBe(201);
  actAs(ids.owner);
  return { id: r.json.document.id, snapshot: (await call<{ document: { snapshot: ReportSnapshot } }>(docRoute.GET as never, { params: { docId: r.json.document.id } })).json.document.snapshot };
};
const upgradeLinesCents = (s: ReportSnapshot, index?: number) => s.proposal!.lines.filter((l) => (index === undefined ? l.upgradeIndex !== undefined : l.upgradeIndex === index)).reduce((a, l) => a + l.totalCents, 0);
const cents = (usd: number) => Math.round(usd * 100);

/** The savings report and the proposal issued from the same job state show the same costs, upgrade by upgrade. */
async function issueBothAndCompare() {
  const report = await issue("savings-report");
  const proposal = await issue("proposal");
  const a = report.snapshot.analysis;
  expect(report.snapshot.costBasis).toEqual({ source: "price-book", includesSalesTax: false });
  expect(cents(a.package.costUSD)).toBe(upgradeLinesCents(proposal.snapshot));
  expect(proposal.snapshot.proposal!.upgradesCents).toBe(cents(a.package.costUSD));
  a.upgrades.forEach((u, i) => expect(upgradeLinesCents(proposal.snapshot, i)).toBe(cents(u.costUSD)));
  return { report, proposal };
}

describe("upgrade costs from the price book", () => {
  it("the demo job's upgrades are priced from the price book, and the assessment, draft proposal and documents agree", async () => {
    const { doc } = await load();
    const items = await ctx.t.db.select().from((await import("@/db/schema")).priceBookItems);
    const airSeal = items.find((i) => i.code === "AIR-SEAL")!;
    // Air sealing: hours from the CFM50 taken out (3,900 → 2,400) at the invented 100 CFM50 per crew hour.
    expect(doc.upgrades[0]!.type).toBe("air-sealing");
    expect(doc.upgrades[0]!.costUSD).toBe((15 * airSeal.unitPriceCents) / 100);
    const r = await draft();
    expect(r.status).toBe(200);
    expect(r.json.proposal.status).toBe("draft");
    expect(r.json.proposal.costsIncludeSalesTax).toBe(false);
    expect(r.json.proposal.upgrades.map((u) => u.costCents)).toEqual(doc.upgrades.map((u) => cents(u.costUSD)));
    expect(r.json.proposal.lines.find((l) => l.key === "permit")!.taxable).toBe(false);
    const rows = await ctx.t.db.select().from(proposalLineItems).where(eq(proposalLineItems.proposalId, r.json.proposal.id));
    expect(rows).toHaveLength(r.json.proposal.lines.length);
    expect(rows.filter((x) => x.upgradeId === doc.upgrades[2]!.id).reduce((a, x) => a + x.totalCents, 0)).toBe(cents(doc.upgrades[2]!.costUSD));
    // Reading it again updates the same draft, it does not pile up drafts.
    expect((await draft()).json.proposal.id).toBe(r.json.proposal.id);
    await issueBothAndCompare();
  });

  it("a per-job change to a line, or to an upgrade's total with a reason, changes the report and the proposal alike", async () => {
    const before = await load();
    const doc = structuredClone(before.doc);
    doc.upgrades[0]!.pricing = { lines: { hours: { quantity: 22 } } };
    doc.upgrades[2]!.pricing = { lines: { bags: { unitPriceCents: 1900 } } };
    doc.upgrades[1]!.pricing = { totalOverride: { cents: 300_000, reason: "Two attic hatches to rebuild" } };
    doc.upgrades[0]!.costUSD = 1; // a typed cost is not trusted: the server prices again
    expect((await save(before.version, doc)).status).toBe(200);

    const after = (await load()).doc;
    const seal = (await ctx.t.db.select().from((await import("@/db/schema")).priceBookItems)).find((i) => i.code === "AIR-SEAL")!;
    expect(cents(after.upgrades[0]!.costUSD)).toBe(22 * seal.unitPriceCents);
    expect(cents(after.upgrades[1]!.costUSD)).toBe(300_000);
    expect(after.upgrades[1]!.pricing!.totalOverride!.reason).toBe("Two attic hatches to rebuild");
    expect(cents(after.upgrades[2]!.costUSD)).toBeGreaterThan(cents(before.doc.upgrades[2]!.costUSD));

    const { report, proposal } = await issueBothAndCompare();
    expect(cents(report.snapshot.analysis.upgrades[0]!.costUSD)).toBe(22 * seal.unitPriceCents);
    expect(proposal.snapshot.proposal!.lines.find((l) => l.description === "Price adjustment: Two attic hatches to rebuild")).toBeTruthy();
    expect(cents(report.snapshot.analysis.package.costUSD)).not.toBe(cents(before.doc.upgrades.reduce((a, u) => a + u.costUSD, 0)));
  });

  it("a changed price book price reaches the next load, draft and documents", async () => {
    const { priceBookItems } = await import("@/db/schema");
    await ctx.t.db.update(priceBookItems).set({ unitPriceCents: 2000 }).where(eq(priceBookItems.code, "DRILL-PLUG"));
    const { doc } = await load();
    const d = await draft();
    const holes = d.json.proposal.lines.find((l) => l.key === "holes")!;
    expect(holes.unitPriceCents).toBe(2000);
    expect(d.json.proposal.upgrades[2]!.costCents).toBe(cents(doc.upgrades[2]!.costUSD));
    await issueBothAndCompare();
  });

  it("bad per-job pricing is refused with the field named, and nothing is saved", async () => {
    const before = await load();
    const doc = structuredClone(before.doc);
    doc.upgrades[1]!.pricing = { totalOverride: { cents: 100_000, reason: "  " } };
    doc.upgrades[2]!.pricing = { lines: { bags: { quantity: -3 } } };
    const r = await save(before.version, doc);
    expect(r.status).toBe(422);
    expect(r.json.fields!["upgrades.1.pricing.totalOverride.reason"]![0]).toMatch(/say why the total is overridden/);
    expect(r.json.fields!["upgrades.2.pricing.lines.bags.quantity"]![0]).toMatch(/quantity cannot be negative/);
    expect((await load()).version).toBe(before.version);
  });

  it("installers see neither costs nor per-job pricing, and cannot read the draft proposal", async () => {
    const { doc } = await load(ids.installer);
    expect(doc.upgrades.every((u) => u.costUSD === 0 && u.pricing == null)).toBe(true);
    expect((await draft(ids.installer)).status).toBe(403);
  });
});

describe("the proposal's life: draft, issued, superseded, accepted", () => {
  it("issuing freezes the draft and links it; a re-issue supersedes it; accepting marks it accepted", async () => {
    const first = await issue("proposal");
    const [d1] = await ctx.t.db.select().from(issuedDocuments).where(eq(issuedDocuments.id, first.id));
    expect(d1!.proposalId).toBeTruthy();
    const [p1] = await ctx.t.db.select().from(proposals).where(eq(proposals.id, d1!.proposalId!));
    expect(p1!.status).toBe("issued");
    const frozen = await ctx.t.db.select().from(proposalLineItems).where(eq(proposalLineItems.proposalId, p1!.id));
    expect(frozen.reduce((a, l) => a + l.totalCents, 0)).toBe(first.snapshot.proposal!.subtotalCents);

    // A new draft starts; the issued one is not touched by it.
    const next = await draft();
    expect(next.json.proposal.id).not.toBe(p1!.id);
    expect(next.json.proposal.status).toBe("draft");

    const second = await issue("proposal");
    const [d2] = await ctx.t.db.select().from(issuedDocuments).where(eq(issuedDocuments.id, second.id));
    expect(d2!.proposalId).toBe(next.json.proposal.id);
    expect((await ctx.t.db.select().from(proposals).where(eq(proposals.id, p1!.id)))[0]!.status).toBe("superseded");

    actAs(ids.homeowner);
    expect((await call(acceptRoute.POST as never, { method: "POST", params: { docId: second.id }, body: { name: "Eleanor Pashley-Wren", consent: true } })).status).toBe(201);
    expect((await ctx.t.db.select().from(proposals).where(eq(proposals.id, d2!.proposalId!)))[0]!.status).toBe("accepted");
  });

  it("the owner sets the sales tax rate as a percentage; a bad one is refused with the field named and nothing changes", async () => {
    const put = (taxRatePercent: unknown) => (actAs(ids.owner), call<{ taxRatePpm: number; fields?: Record<string, string[]> }>(taxRoute.PUT as never, { method: "PUT", body: { taxRatePercent } }));
    expect((await put("7")).json.taxRatePpm).toBe(70_000);
    for (const [bad, why] of [["6.62501", /at most four decimal places/], ["abc", /must be a percentage/], ["-1", /cannot be negative/], ["30", /at most 25 %/], ["", /Enter the sales tax rate/]] as const) {
      const r = await put(bad);
      expect(r.status).toBe(422);
      expect(r.json.fields!.taxRatePercent![0]).toMatch(why);
    }
    const [c] = await ctx.t.db.select({ ppm: companies.taxRatePpm }).from(companies).where(eq(companies.slug, "kestrel-bay"));
    expect(c!.ppm).toBe(70_000);
    expect((await put("6.625 %")).json.taxRatePpm).toBe(66_250);
  });

  it("keeps a 6.625 % sales tax exactly, on the taxable lines only", async () => {
    const [c] = await ctx.t.db.select({ ppm: companies.taxRatePpm }).from(companies).where(eq(companies.slug, "kestrel-bay"));
    expect(c!.ppm).toBe(66_250);
    const { snapshot } = await issue("proposal");
    const p = snapshot.proposal!;
    const taxable = p.lines.filter((l) => l.taxable !== false).reduce((a, l) => a + l.totalCents, 0);
    expect(p.taxRatePpm).toBe(66_250);
    expect(p.taxCents).toBe(Math.round(taxable * 0.06625));
    expect(p.totalCents).toBe(p.subtotalCents + p.taxCents);
    expect(p.lines.some((l) => l.taxable === false)).toBe(true);
  });
});
