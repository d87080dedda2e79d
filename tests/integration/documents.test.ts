import { eq } from "drizzle-orm";
import { describe, expect, it, vi } from "vitest";
import { issuedDocuments, jobs, mailOutbox } from "@/db/schema";
import type { AssessmentDoc } from "@/lib/assessment/doc";
import type { ReportSnapshot } from "@/lib/documents/snapshot";
import { actAs } from "../support/auth-mock";
import { call } from "../support/route";
import { actors, type Actor } from "./matrix-support";
import { ids, seededDbForFile } from "./setup";

vi.mock("@/lib/auth", () => import("../support/auth-mock"));
process.env.MAIL_RETRY_INTERVAL_MS = "0";
process.env.SMTP_PORT = "1"; // nothing listens: the office notice is recorded in the outbox as queued/failed

const docsRoute = await import("@/app/api/jobs/[id]/documents/route");
const docRoute = await import("@/app/api/documents/[docId]/route");
const acceptRoute = await import("@/app/api/documents/[docId]/accept/route");
const assessmentRoute = await import("@/app/api/jobs/[id]/assessment/route");
const pdfRoute = await import("@/app/api/documents/[docId]/pdf/route");
const ctx = seededDbForFile();

type Summary = { id: string; version: number; kind: string; contentHash: string; supersededAt: number | null; headline: { yearlySavingUSD: number; totalCents: number | null } };
const issue = (kind: string, as: string | null = ids.auditor) => (actAs(as), call<{ document: Summary; fields?: Record<string, string[]> }>(docsRoute.POST as never, { method: "POST", params: { id: ids.demoJob }, body: { kind } }));
const read = (docId: string, as: string | null) => (actAs(as), call<{ document: Summary & { snapshot: ReportSnapshot } }>(docRoute.GET as never, { params: { docId } }));
const accept = (docId: string, body: unknown, as: string | null = ids.homeowner) => (actAs(as), call<{ error?: string; fields?: Record<string, string[]> }>(acceptRoute.POST as never, { method: "POST", params: { docId }, body }));

describe("issuing", () => {
  it("freezes a snapshot: editing the job afterwards changes neither the snapshot nor its hash", async () => {
    const first = await issue("savings-report");
    expect(first.status).toBe(201);
    expect(first.json.document.version).toBe(1);
    const before = (await ctx.t.db.select().from(issuedDocuments).where(eq(issuedDocuments.id, first.json.document.id)))[0]!;

    actAs(ids.auditor);
    const loaded = await call<{ version: number; doc: AssessmentDoc }>(assessmentRoute.GET as never, { params: { id: ids.demoJob } });
    const doc = structuredClone(loaded.json.doc);
    doc.surfaces[0]!.grossAreaFt2 = 999;
    doc.heating.pricePerUnitUSD = 3.1;
    expect((await call(assessmentRoute.PUT as never, { method: "PUT", params: { id: ids.demoJob }, body: { version: loaded.json.version, doc } })).status).toBe(200);

    const after = (await ctx.t.db.select().from(issuedDocuments).where(eq(issuedDocuments.id, first.json.document.id)))[0]!;
    expect(after.contentHash).toBe(before.contentHash);
    expect(JSON.stringify(after.snapshot)).toBe(JSON.stringify(before.snapshot));
    expect((after.snapshot as unknown as ReportSnapshot).assessment.surfaces[0]!.grossAreaFt2).not.toBe(999);
  });

  it("issuing again makes the next version and supersedes the previous one, which is kept", async () => {
    const second = await issue("savings-report");
    expect(second.json.document.version).toBe(2);
    const all = await ctx.t.db.select().from(issuedDocuments).where(eq(issuedDocuments.kind, "savings-report"));
    expect(all.map((d) => d.version).sort()).toEqual([1, 2]);
    expect(all.find((d) => d.version === 1)!.supersededAt).not.toBeNull();
    expect(all.find((d) => d.version === 2)!.supersededAt).toBeNull();
  });

  it("prices a proposal from the price book: bags from the dense-pack estimate, subtotal, tax, total and deposit", async () => {
    const r = await issue("proposal");
    expect(r.status).toBe(201);
    const full = await read(r.json.document.id, ids.owner);
    const p = full.json.document.snapshot.proposal!;
    const bags = Math.ceil(full.json.document.snapshot.analysis.densePack.reduce((a, w) => a + w.bags, 0)); // whole bags
    expect(p.lines.find((l) => l.unit === "bag")!.quantity).toBe(bags);
    expect(p.subtotalCents).toBe(p.lines.reduce((a, l) => a + l.totalCents, 0));
    expect(p.totalCents).toBe(p.subtotalCents + p.taxCents);
    expect(p.depositCents).toBe(Math.round(p.totalCents * 0.25));
  });

  it("refuses unknown kinds with 422", async () => {
    const r = await issue("brochure");
    expect(r.status).toBe(422);
    expect(r.json.fields!.kind[0]).toMatch(/savings-report or proposal/);
  });
});

describe("acceptance", () => {
  it("needs a name and the consent box, and names the missing field", async () => {
    const docs = await ctx.t.db.select().from(issuedDocuments).where(eq(issuedDocuments.kind, "proposal"));
    const r = await accept(docs[0]!.id, { name: "", consent: false });
    expect(r.status).toBe(422);
    expect(Object.keys(r.json.fields!).sort()).toEqual(["consent", "name"]);
  });

  it("records name, time, address and hash once, moves the job to Approved and tells the office; twice is refused", async () => {
    const [proposal] = await ctx.t.db.select().from(issuedDocuments).where(eq(issuedDocuments.kind, "proposal"));
    const ok = await accept(proposal!.id, { name: "Eleanor Pashley-Wren", consent: true });
    expect(ok.status).toBe(201);
    const [job] = await ctx.t.db.select().from(jobs).where(eq(jobs.id, ids.demoJob));
    expect(job!.stage).toBe("approved");
    const mail = await ctx.t.db.select().from(mailOutbox).where(eq(mailOutbox.kind, "proposal-accepted"));
    expect(mail[0]!.to).toBe("owner@kestrelbay.example");
    const again = await accept(proposal!.id, { name: "Eleanor Pashley-Wren", consent: true });
    expect(again.status).toBe(409);
  });

  it("refuses a superseded proposal", async () => {
    const newer = await issue("proposal");
    const old = (await ctx.t.db.select().from(issuedDocuments).where(eq(issuedDocuments.kind, "proposal"))).find((d) => d.version === 1)!;
    expect(newer.json.document.version).toBe(2);
    const r = await accept(old.id, { name: "Eleanor Pashley-Wren", consent: true });
    expect(r.status).toBe(409);
    expect(r.json.error).toMatch(/replaced by a newer version/);
  });
});

describe("who may read and act on documents", () => {
  const cases: { name: string; expect: Record<Actor, number>; run: (as: string | null) => Promise<number> }[] = [
    {
      name: "GET /api/jobs/[id]/documents",
      expect: { anonymous: 401, "homeowner of the job": 200, "homeowner of another job": 200, "installer assigned": 403, "installer not assigned": 403, auditor: 200, owner: 200, "user of another company": 200 },
      run: async (as) => (actAs(as), (await call(docsRoute.GET as never, { params: { id: ids.demoJob } })).status),
    },
    {
      name: "POST /api/jobs/[id]/documents",
      expect: { anonymous: 401, "homeowner of the job": 403, "homeowner of another job": 403, "installer assigned": 403, "installer not assigned": 403, auditor: 201, owner: 201, "user of another company": 404 },
      run: async (as) => (await issue("savings-report", as)).status,
    },
    {
      name: "GET /api/documents/[docId]",
      expect: { anonymous: 401, "homeowner of the job": 200, "homeowner of another job": 404, "installer assigned": 403, "installer not assigned": 403, auditor: 200, owner: 200, "user of another company": 404 },
      run: async (as) => {
        const [d] = await ctx.t.db.select().from(issuedDocuments).limit(1);
        return (await read(d!.id, as)).status;
      },
    },
    {
      name: "POST /api/documents/[docId]/accept (a current, unaccepted proposal)",
      expect: { anonymous: 401, "homeowner of the job": 201, "homeowner of another job": 404, "installer assigned": 403, "installer not assigned": 403, auditor: 403, owner: 403, "user of another company": 403 },
      run: async (as) => {
        const r = await issue("proposal");
        return (await accept(r.json.document.id, { name: "Test Person", consent: true }, as)).status;
      },
    },
  ];
  describe.each(cases)("$name", ({ expect: expected, run }) => {
    it.each(Object.keys(actors) as Actor[])("as %s", async (actor) => {
      expect(await run(actors[actor])).toBe(expected[actor]);
    });
  });

  it("lists another homeowner's documents as none at all", async () => {
    actAs(ids.homeowner2);
    const r = await call<{ documents: unknown[] }>(docsRoute.GET as never, { params: { id: ids.demoJob } });
    expect(r.json.documents).toEqual([]);
  });
});

describe("the PDF route", () => {
  it("answers application/pdf drawn from the frozen snapshot, for the homeowner of the job only", async () => {
    const { PDFParse } = await import("pdf-parse");
    const r = await issue("savings-report");
    const id = r.json.document.id;
    actAs(ids.homeowner);
    const req = new (await import("next/server")).NextRequest(`http://localhost:3000/api/documents/${id}/pdf`, { headers: { host: "localhost:3000" } });
    const res = await (pdfRoute.GET as never as (q: unknown, c: unknown) => Promise<Response>)(req, { params: Promise.resolve({ docId: id }) });
    expect(res.status).toBe(200);
    expect(res.headers.get("content-type")).toBe("application/pdf");
    expect(res.headers.get("x-content-hash")).toBe(r.json.document.contentHash);
    const bytes = Buffer.from(await res.arrayBuffer());
    expect(bytes.subarray(0, 5).toString()).toBe("%PDF-");
    const text = (await new PDFParse({ data: bytes }).getText()).text;
    expect(text).toContain("Kestrel Bay Home Performance");
    expect(text).toContain("27 Tansyfield Road");
    actAs(ids.homeowner2);
    const other = await (pdfRoute.GET as never as (q: unknown, c: unknown) => Promise<Response>)(req, { params: Promise.resolve({ docId: id }) });
    expect(other.status).toBe(404);
  });
});
