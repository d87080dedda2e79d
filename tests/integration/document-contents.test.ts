// What goes into an issued document beside the assessment: the photos the auditor chose (checked
// against the job, shown on the photos page of the PDF) and the crew-log summary, frozen at issue.
import { mkdtempSync, rmSync } from "node:fs";
import os from "node:os";
import path from "node:path";
import { eq } from "drizzle-orm";
import { NextRequest } from "next/server";
import { PDFParse } from "pdf-parse";
import { afterAll, beforeAll, describe, expect, it, vi } from "vitest";
import { issuedDocuments } from "@/db/schema";
import { seedId } from "@/db/seed-scenario";
import { bagsFigure } from "@/lib/documents/crew-summary";
import type { ReportSnapshot } from "@/lib/documents/snapshot";
import { LocalStorage, resetStorage } from "@/lib/storage";
import { actAs } from "../support/auth-mock";
import { call } from "../support/route";
import { makeImage, postPhoto } from "./photos-support";
import { ids, seededDbForFile } from "./setup";

vi.mock("@/lib/auth", () => import("../support/auth-mock"));

const docsRoute = await import("@/app/api/jobs/[id]/documents/route");
const docRoute = await import("@/app/api/documents/[docId]/route");
const pdfRoute = await import("@/app/api/documents/[docId]/pdf/route");
const photosRoute = await import("@/app/api/jobs/[id]/photos/route");
const crewRoute = await import("@/app/api/jobs/[id]/crew-log/route");
const testOutRoute = await import("@/app/api/jobs/[id]/test-out/route");
type CrewLog = import("@/lib/data/crew-log").CrewLogView;

const ctx = seededDbForFile();
const dir = mkdtempSync(path.join(os.tmpdir(), "warmstead-doc-contents-"));
const params = { id: ids.demoJob };
type Summary = { id: string; version: number; contentHash: string };

const issue = (body: Record<string, unknown>, as = ids.auditor) =>
  (actAs(as), call<{ document: Summary; error?: string; fields?: Record<string, string[]> }>(docsRoute.POST as never, { method: "POST", params, body }));
const snapshotOf = async (docId: string) => (actAs(ids.owner), (await call<{ document: { snapshot: ReportSnapshot } }>(docRoute.GET as never, { params: { docId } })).json.document.snapshot);
async function pdfOf(docId: string, as = ids.homeowner) {
  actAs(as);
  const req = new NextRequest(`http://localhost:3000/api/documents/${docId}/pdf`, { headers: { host: "localhost:3000" } });
  const res = await (pdfRoute.GET as never as (q: unknown, c: unknown) => Promise<Response>)(req, { params: Promise.resolve({ docId }) });
  const bytes = Buffer.from(await res.arrayBuffer());
  return { res, bytes };
}
async function pdfText(bytes: Buffer) {
  const parser = new PDFParse({ data: new Uint8Array(bytes) });
  try {
    const r = await parser.getText();
    return { total: r.total, text: r.text.replace(/\s+/g, " ") };
  } finally {
    await parser.destroy();
  }
}
async function upload(jobId: string, fields: Record<string, string>) {
  actAs(ids.auditor);
  const r = await postPhoto(photosRoute.POST as never, jobId, fields, { bytes: await makeImage("jpeg", { width: 640, height: 480 }), name: "p.jpg" });
  if (r.status !== 201) throw new Error(`upload failed: ${r.status} ${r.json.error}`);
  return r.json.photo!.id as string;
}
const crewPost = (body: Record<string, unknown>) =>
  (actAs(ids.installer), call<{ wall: CrewLog["walls"][number] | null }>(crewRoute.POST as never, { method: "POST", params, body: { clientRequestId: crypto.randomUUID(), ...body } }));

let before = "", after = "", thermal = "", otherJobPhoto = "";
beforeAll(async () => {
  process.env.UPLOAD_TMP_DIR = path.join(dir, "incoming");
  resetStorage(new LocalStorage(path.join(dir, "store")));
  before = await upload(ids.demoJob, { tag: "before", caption: "Cold north wall before the work" });
  after = await upload(ids.demoJob, { tag: "after", caption: "North wall patched and painted" });
  thermal = await upload(ids.demoJob, { tag: "thermal", caption: "Infrared scan of the stair wall" });
  otherJobPhoto = await upload(seedId("job:1002"), { tag: "before", caption: "Another house" });
});
afterAll(() => {
  resetStorage();
  delete process.env.UPLOAD_TMP_DIR;
  rmSync(dir, { recursive: true, force: true });
});

describe("choosing photos when issuing", () => {
  it("refuses a photo of another job with 422 naming photoIds, and issues nothing", async () => {
    void ctx;
    const countBefore = (await ctx.t.db.select().from(issuedDocuments)).length;
    const r = await issue({ kind: "savings-report", photoIds: [before, otherJobPhoto] });
    expect(r.status).toBe(422);
    expect(Object.keys(r.json.fields!)).toEqual(["photoIds"]);
    expect(r.json.fields!.photoIds[0]).toContain(otherJobPhoto);
    expect(r.json.fields!.photoIds[0]).not.toContain(before);
    expect((await ctx.t.db.select().from(issuedDocuments)).length).toBe(countBefore);
    const unknown = await issue({ kind: "savings-report", photoIds: ["no-such-photo"] });
    expect([unknown.status, unknown.json.fields!.photoIds[0]]).toEqual([422, expect.stringContaining("not part of this job")]);
    const bad = await issue({ kind: "savings-report", photoIds: "all" });
    expect([bad.status, Object.keys(bad.json.fields!)]).toEqual([422, ["photoIds"]]);
  });

  it("freezes the chosen photos with their captions, drops repeats, and draws them on a photos page of the PDF", async () => {
    const plain = await issue({ kind: "savings-report" });
    const plainSnapshot = await snapshotOf(plain.json.document.id);
    expect([plainSnapshot.photoIds, plainSnapshot.photos]).toEqual([[], undefined]);
    expect(plainSnapshot.crewSummary).toBeUndefined(); // nobody has logged anything yet
    const plainBytes = (await pdfOf(plain.json.document.id)).bytes;
    const plainPdf = await pdfText(plainBytes);

    const r = await issue({ kind: "savings-report", photoIds: [after, before, thermal, before] });
    expect(r.status).toBe(201);
    const s = await snapshotOf(r.json.document.id);
    expect(s.photoIds).toEqual([after, before, thermal]);
    expect(s.photos!.map((p) => [p.id, p.tag, p.caption])).toEqual([
      [after, "after", "North wall patched and painted"],
      [before, "before", "Cold north wall before the work"],
      [thermal, "thermal", "Infrared scan of the stair wall"],
    ]);

    const { res, bytes } = await pdfOf(r.json.document.id);
    expect(res.status).toBe(200);
    expect(res.headers.get("content-length")).toBe(String(bytes.length));
    expect(res.headers.get("x-content-length")).toBe(String(bytes.length));
    expect(res.headers.get("cache-control")).toContain("no-transform");
    expect(res.headers.get("content-disposition")).toBe(`attachment; filename="warmstead-savings-report-job-1006-v${r.json.document.version}.pdf"`);
    if (process.env.KEEP_PDF) (await import("node:fs")).writeFileSync(`${process.env.KEEP_PDF}/photos.pdf`, bytes);
    const parsed = await pdfText(bytes);
    expect(parsed.total).toBe(plainPdf.total + 1);
    expect(parsed.text).toContain("Photos from your house");
    expect(parsed.text).toContain("Cold north wall before the work");
    expect(parsed.text).toContain("Infrared scan of the stair wall");
    expect(parsed.text).not.toContain("Image not available");
    // three embedded JPEGs (thumbnails re-encoded), and still a light file
    expect(bytes.toString("latin1").match(/\/Filter \/DCTDecode/g)?.length).toBe(3);
    expect(bytes.length - plainBytes.length).toBeLessThan(3 * 120_000);
  }, 60_000); // two PDF renders, the first one cold

  it("a proposal issued with photos shows them in its appended savings-report pages", async () => {
    const r = await issue({ kind: "proposal", photoIds: [before, after] });
    expect(r.status).toBe(201);
    const { bytes } = await pdfOf(r.json.document.id);
    const parsed = await pdfText(bytes);
    expect(parsed.text).toContain("Photos from your house");
    expect(parsed.text).toContain("North wall patched and painted");
    expect(bytes.toString("latin1").match(/\/Filter \/DCTDecode/g)?.length).toBe(2);
  }, 40_000);
});

describe("the crew log in the final report", () => {
  it("freezes the crew summary at issue; a later entry changes neither the snapshot nor its hash; the PDF says what the crew did", async () => {
    actAs(ids.installer);
    const log0 = (await call<CrewLog>(crewRoute.GET as never, { params })).json;
    const [w1, w2] = log0.walls;
    expect(w2).toBeDefined();
    await crewPost({ surfaceId: w1!.surfaceId, bagsBlown: Math.ceil(w1!.expected.bags * 1.5), holesDrilled: 10, note: "Took far more than expected" });
    await crewPost({ surfaceId: w1!.surfaceId, bagsBlown: 0, resolution: "Found an open chase behind the stair; blocked it", finished: true });
    await crewPost({ surfaceId: w2!.surfaceId, bagsBlown: 3.5, holesDrilled: 4 });
    actAs(ids.installer);
    const log = (await call<CrewLog>(crewRoute.GET as never, { params })).json;

    const r = await issue({ kind: "savings-report" });
    const docId = r.json.document.id;
    const s = await snapshotOf(docId);
    const c = s.crewSummary!;
    expect(c.entries).toBe(3);
    expect(c.bags).toEqual(log.summary.bags);
    expect(c.perWall.find((w) => w.surfaceId === w2!.surfaceId)!.loggedBags).toBe(3.5);
    expect(c.warnings).toHaveLength(1);
    expect(c.warnings[0]).toMatchObject({ kind: "overfill", state: "resolved", resolution: { note: "Found an open chase behind the stair; blocked it" } });
    expect(c.testOut).toBeNull();

    const crewPdf = (await pdfOf(docId)).bytes;
    if (process.env.KEEP_PDF) (await import("node:fs")).writeFileSync(`${process.env.KEEP_PDF}/crew.pdf`, crewPdf);
    const text = (await pdfText(crewPdf)).text;
    expect(text).toContain("What the crew did");
    expect(text).toContain(bagsFigure(c.bags.logged));
    expect(text).toContain(`of about ${bagsFigure(c.bags.expected)} bags estimated`);
    expect(text).toContain("Found an open chase behind the stair; blocked it");

    const [row] = await ctx.t.db.select().from(issuedDocuments).where(eq(issuedDocuments.id, docId));
    await crewPost({ surfaceId: w2!.surfaceId, bagsBlown: 2, finished: true });
    const [later] = await ctx.t.db.select().from(issuedDocuments).where(eq(issuedDocuments.id, docId));
    expect(later!.contentHash).toBe(row!.contentHash);
    expect((later!.snapshot as unknown as ReportSnapshot).crewSummary!.bags.logged).toBe(c.bags.logged);

    const next = await snapshotOf((await issue({ kind: "savings-report" })).json.document.id);
    expect(next.crewSummary!.bags.logged).toBeCloseTo(c.bags.logged + 2, 9);
  }, 40_000);

  it("carries the test-out reading, measured against predicted", async () => {
    actAs(ids.installer);
    expect((await call(testOutRoute.POST as never, { method: "POST", params, body: { clientRequestId: crypto.randomUUID(), cfm50: 2410 } })).status).toBe(201);
    const s = await snapshotOf((await issue({ kind: "savings-report" })).json.document.id);
    expect(s.crewSummary!.testOut).toMatchObject({ measuredCfm50: 2410, testInCfm50: 3900 });
    expect(s.crewSummary!.testOut!.predictedCfm50).toBeGreaterThan(0);
  });
});
