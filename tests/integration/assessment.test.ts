import { describe, expect, it, vi } from "vitest";
import { analyzeHouse, demoHouseInput } from "@/calc";
import type { AssessmentDoc } from "@/lib/assessment/doc";
import { toHouseInput } from "@/lib/assessment/to-house-input";
import { actAs } from "../support/auth-mock";
import { call } from "../support/route";
import { actors, type Actor } from "./matrix-support";
import { ids, seededDbForFile } from "./setup";

vi.mock("@/lib/auth", () => import("../support/auth-mock"));

const route = await import("@/app/api/jobs/[id]/assessment/route");
seededDbForFile();

type Loaded = { version: number; doc: AssessmentDoc; issues: { path: string; message: string }[]; pricesVisible: boolean; canEdit: boolean };
const load = (as: string | null = ids.auditor) => (actAs(as), call<Loaded>(route.GET as never, { params: { id: ids.demoJob } }));
const save = (version: number, doc: unknown) => call<{ version: number; issues: unknown[]; headline: { annualCostUSD: number } | null; fields?: Record<string, string[]> }>(route.PUT as never, { method: "PUT", params: { id: ids.demoJob }, body: { version, doc } });

describe("the demo assessment", () => {
  it("is fully entered: complete results, the same as calc's demo house at the seeded gas price", async () => {
    const r = await load();
    expect(r.status).toBe(200);
    expect(r.json.issues).toEqual([]);
    expect(r.json.doc.surfaces).toHaveLength(demoHouseInput.surfaces.length);
    const fromDb = analyzeHouse(toHouseInput(r.json.doc));
    const reference = analyzeHouse({ ...demoHouseInput, heating: { ...demoHouseInput.heating, pricePerUnitUSD: 1.45 }, indoorRH: 0.4 });
    expect(fromDb.baseline.envelope.totalUA).toBeCloseTo(reference.baseline.envelope.totalUA, 9);
    expect(fromDb.baseline.energy.costUSD).toBeCloseTo(reference.baseline.energy.costUSD, 9);
    expect(fromDb.package.savings.usd).toBeCloseTo(reference.package.savings.usd, 9);
    expect(fromDb.densePack.map((d) => d.bags)).toEqual(reference.densePack.map((d) => d.bags));
  });
});

describe("saving", () => {
  it("round-trips every field, bumps the version and recomputes on the server", async () => {
    const { json } = await load();
    const doc = structuredClone(json.doc);
    doc.house.yearBuilt = 1927;
    doc.surfaces[0]!.grossAreaFt2 = 600;
    doc.surfaces[0]!.openings.push({ kind: "window", areaFt2: 10, count: 1, productKey: "window-double-nonmetal", label: "New window" });
    doc.leakage.tests.push({ id: crypto.randomUUID(), phase: "test-out", cfm50: 2500, testedAt: Date.now(), outdoorTempF: 41, windMph: 5, notes: "after sealing" });
    doc.upgrades.reverse();
    const r = await save(json.version, doc);
    expect(r.status).toBe(200);
    expect(r.json.version).toBe(json.version + 1);
    expect(r.json.issues).toEqual([]);
    const again = await load();
    expect(again.json.doc.house.yearBuilt).toBe(1927);
    expect(again.json.doc.surfaces[0]!.grossAreaFt2).toBe(600);
    expect(again.json.doc.surfaces[0]!.openings.map((o) => o.label)).toContain("New window");
    expect(again.json.doc.upgrades.map((u) => u.type)).toEqual(doc.upgrades.map((u) => u.type));
    expect(again.json.doc.leakage.tests.filter((t) => t.phase === "test-out")).toHaveLength(1);
    expect(r.json.headline!.annualCostUSD).toBeCloseTo(analyzeHouse(toHouseInput(again.json.doc)).baseline.energy.costUSD, 6);
  });

  it("refuses a stale version with 409", async () => {
    const { json } = await load();
    expect((await save(json.version, json.doc)).status).toBe(200);
    expect((await save(json.version, json.doc)).status).toBe(409);
  });

  it("refuses bad numbers with 422 naming the field, from calc's own bounds", async () => {
    const { json } = await load();
    const doc = structuredClone(json.doc);
    doc.surfaces[1]!.grossAreaFt2 = -5;
    doc.house.volumeFt3 = 0;
    const r = await save(json.version, doc);
    expect(r.status).toBe(422);
    expect(r.json.fields!["surfaces.1.grossAreaFt2"]).toEqual(["must be greater than 0"]);
    expect(r.json.fields!["house.volumeFt3"]).toEqual(["must be greater than 0"]);
  });

  it("keeps an incomplete assessment and says what is missing", async () => {
    const { json } = await load();
    const doc = structuredClone(json.doc);
    doc.surfaces[0]!.assemblyKey = "no-such-stack";
    const r = await save(json.version, doc);
    expect(r.status).toBe(200);
    expect(r.json.headline).toBeNull();
    expect(JSON.stringify(r.json.issues)).toContain("surfaces.0.assemblyKey");
  });
});

describe("who sees what", () => {
  it("gives an assigned installer the assessment without prices, read-only", async () => {
    const r = await load(ids.installer);
    expect(r.status).toBe(200);
    expect(r.json.pricesVisible).toBe(false);
    expect(r.json.canEdit).toBe(false);
    expect(r.json.doc.heating.pricePerUnitUSD).toBe(0);
    expect(r.json.doc.upgrades.every((u) => u.costUSD === 0)).toBe(true);
  });

  const expected: Record<Actor, [number, number]> = {
    anonymous: [401, 401], "homeowner of the job": [403, 403], "homeowner of another job": [403, 403], "installer assigned": [200, 403],
    "installer not assigned": [404, 403], auditor: [200, 200], owner: [200, 200], "user of another company": [404, 404],
  };
  it.each(Object.keys(actors) as Actor[])("GET and PUT /api/jobs/[id]/assessment as %s", async (actor) => {
    const { json } = await load(ids.owner);
    actAs(actors[actor]);
    const get = await call(route.GET as never, { params: { id: ids.demoJob } });
    actAs(actors[actor]);
    const put = await save(json.version, json.doc);
    expect([get.status, put.status]).toEqual(expected[actor]);
  });
});

describe("openings keep their ids across saves", () => {
  it("so photos and notes attached to a window stay attached", async () => {
    const { json } = await load();
    const before = json.doc.surfaces.flatMap((s) => s.openings.map((o) => o.id));
    expect(before.every(Boolean)).toBe(true);
    expect((await save(json.version, json.doc)).status).toBe(200);
    const after = (await load()).json.doc.surfaces.flatMap((s) => s.openings.map((o) => o.id));
    expect(after).toEqual(before);
  });
});
