// Crew log, safety acknowledgement and test-out on the demo job (1006), through the route handlers.
import { eq } from "drizzle-orm";
import { describe, expect, it, vi } from "vitest";
import { checkWall } from "@/calc";
import { crewLogEntries, jobs, jobStageEvents, leakageTests } from "@/db/schema";
import { actAs } from "../support/auth-mock";
import { call } from "../support/route";
import { ids, seededDbForFile } from "./setup";

vi.mock("@/lib/auth", () => import("../support/auth-mock"));

const crewRoute = await import("@/app/api/jobs/[id]/crew-log/route");
const ackRoute = await import("@/app/api/jobs/[id]/safety-ack/route");
const testOutRoute = await import("@/app/api/jobs/[id]/test-out/route");
const jobRoute = await import("@/app/api/jobs/[id]/route");
const { OVERFILL_WARNING, UNDERFILL_WARNING } = await import("@/lib/data/crew-log");
type CrewLog = import("@/lib/data/crew-log").CrewLogView;

const ctx = seededDbForFile();
const params = { id: ids.demoJob };

const getLog = async (as: string = ids.installer) => (actAs(as), (await call<CrewLog>(crewRoute.GET as never, { params })).json);
const post = (body: Record<string, unknown>, as: string = ids.installer) =>
  (actAs(as), call<{ replayed: boolean; entry: { id: string; bagsBlown: number; user: { name: string } }; wall: CrewLog["walls"][number] | null; fields?: Record<string, string[]> }>(crewRoute.POST as never, { method: "POST", params, body: { clientRequestId: crypto.randomUUID(), ...body } }));

describe("GET crew log", () => {
  it("lists every dense-pack wall with the estimate from calc's analysis", async () => {
    const log = await getLog();
    expect(log.walls.length).toBeGreaterThanOrEqual(2);
    for (const w of log.walls) {
      expect(w.expected.bags).toBeGreaterThan(0);
      expect(w.expected.holes).toBeGreaterThanOrEqual(w.expected.bays);
      expect(w.logged).toEqual({ bags: 0, holes: 0, blockedBays: 0, prefilledBays: 0, entries: 0 });
      expect(w.warning).toBeNull();
    }
    expect(log.thresholds).toEqual({ high: 1.3, low: 0.8 });
    expect(log.safety.cautions.map((c) => c.id)).toEqual(expect.arrayContaining(["lead-paint", "cellulose-dust", "combustion-safety"]));
    expect(log.safety.mine).toBeNull();
    expect(log.canWrite).toBe(true);
    expect(log.pricesVisible).toBe(false);
    expect(log.testOut.measuredCfm50).toBeNull();
    expect(log.testOut.testInCfm50).toBe(3900);
  });
});

describe("entries and their warnings at the thresholds", () => {
  it("exactly 1.3× expected is not over; a hair above raises the overfill warning at once", async () => {
    const wall = (await getLog()).walls[0]!;
    const exact = Math.round(wall.expected.bags * 1.3 * 100) / 100;
    // Round the exact threshold down to cents so it is at or under 1.3× in floating point.
    const atThreshold = checkWall(wall.surfaceId, wall.name, wall.expected.bags, exact).status === "possible-bypass" ? exact - 0.01 : exact;
    const first = await post({ surfaceId: wall.surfaceId, bagsBlown: atThreshold, holesDrilled: 12 });
    expect(first.status).toBe(201);
    expect(first.json.wall!.logged.bags).toBeCloseTo(atThreshold, 9);
    expect(first.json.wall!.check.status).toBe("as-expected");
    expect(first.json.wall!.warning).toBeNull();

    const over = await post({ surfaceId: wall.surfaceId, bagsBlown: 0.5, note: "north-east corner took a lot" });
    expect(over.status).toBe(201);
    expect(over.json.wall!.check.status).toBe("possible-bypass");
    expect(over.json.wall!.warning).toEqual({ kind: "overfill", title: OVERFILL_WARNING, message: expect.stringContaining("Possible bypass") });
    expect(over.json.wall!.warnings).toHaveLength(1);
    expect(over.json.wall!.warnings[0]!.state).toBe("open");

    const resolved = await post({ surfaceId: wall.surfaceId, resolution: "Open plumbing chase behind the kitchen; blocked it and checked the basement." });
    expect(resolved.json.wall!.warnings[0]).toMatchObject({ state: "resolved", resolution: { note: expect.stringContaining("plumbing chase"), by: "Dario Mendel-Quist" } });

    const log = await getLog(ids.auditor);
    const w = log.walls.find((x) => x.surfaceId === wall.surfaceId)!;
    expect(w.entries.map((e) => e.user.name)).toEqual(["Dario Mendel-Quist", "Dario Mendel-Quist", "Dario Mendel-Quist"]);
    expect(w.logged.holes).toBe(12);
    expect(log.summary.warnings).toEqual([expect.objectContaining({ kind: "overfill", state: "resolved", wall: wall.name })]);
    expect(log.summary.openWarnings).toBe(0);
    expect(log.pricesVisible).toBe(true);
  });

  it("exactly 0.8× on a finished wall is fine; just under raises the underfill warning only once finished", async () => {
    const wall = (await getLog()).walls[1]!;
    const low = Math.round(wall.expected.bags * 0.8 * 100) / 100;
    const atThreshold = checkWall(wall.surfaceId, wall.name, wall.expected.bags, low).status === "possible-voids-or-low-density" ? low + 0.01 : low;
    const under = Math.round((atThreshold - 0.01) * 100) / 100;

    const unfinished = await post({ surfaceId: wall.surfaceId, bagsBlown: under, holesDrilled: 20 });
    expect(unfinished.json.wall!.check.status).toBe("possible-voids-or-low-density");
    expect(unfinished.json.wall!.warning).toBeNull(); // still blowing: no underfill warning yet

    const done = await post({ surfaceId: wall.surfaceId, finished: true });
    expect(done.json.wall!.finished).toBe(true);
    expect(done.json.wall!.warning).toEqual({ kind: "underfill", title: UNDERFILL_WARNING, message: expect.stringContaining("Possible voids") });

    const topped = await post({ surfaceId: wall.surfaceId, bagsBlown: 0.01, finished: true });
    expect(topped.json.wall!.logged.bags).toBeCloseTo(atThreshold, 9);
    expect(topped.json.wall!.check.status).toBe("as-expected");
    expect(topped.json.wall!.warning).toBeNull();
    expect(topped.json.wall!.warnings).toEqual([expect.objectContaining({ kind: "underfill", state: "cleared" })]);
  });

  it("follows changed thresholds from the assessment (highRatio / lowRatio are settable in calc)", async () => {
    const log = await getLog();
    for (const w of log.walls) {
      const c = checkWall(w.surfaceId, w.name, w.expected.bags, w.logged.bags, log.thresholds.high, log.thresholds.low);
      expect(w.check.status).toBe(c.status);
    }
  });
});

describe("replay with the same clientRequestId", () => {
  it("answers the stored entry with 200 and creates no duplicate", async () => {
    const wall = (await getLog()).walls[2] ?? (await getLog()).walls[0]!;
    const clientRequestId = crypto.randomUUID();
    const body = { clientRequestId, surfaceId: wall.surfaceId, bagsBlown: 3.5, holesDrilled: 4 };
    const first = await post(body);
    const again = await post(body);
    const third = await post({ ...body, bagsBlown: 9 }); // a changed body with the same id is still the first entry
    expect([first.status, again.status, third.status]).toEqual([201, 200, 200]);
    expect(again.json.replayed).toBe(true);
    expect(again.json.entry.id).toBe(first.json.entry.id);
    expect(third.json.entry.bagsBlown).toBe(3.5);
    const rows = await ctx.t.db.select().from(crewLogEntries).where(eq(crewLogEntries.clientRequestId, clientRequestId));
    expect(rows).toHaveLength(1);
  });

  it("refuses a request id another user already used, without a duplicate", async () => {
    const wall = (await getLog()).walls[0]!;
    const clientRequestId = crypto.randomUUID();
    expect((await post({ clientRequestId, surfaceId: wall.surfaceId, bagsBlown: 1 })).status).toBe(201);
    // installer2 is not on the job: 404, and nothing of the entry shows.
    const other = await post({ clientRequestId, surfaceId: wall.surfaceId, bagsBlown: 1 }, ids.installer2);
    expect(other.status).toBe(404);
    expect(JSON.stringify(other.json)).not.toContain(wall.surfaceId);
  });
});

describe("bad input → 422 naming the field", () => {
  const cases: [string, Record<string, unknown>, string][] = [
    ["negative bags", { bagsBlown: -1 }, "bagsBlown"],
    ["too many bags", { bagsBlown: 201 }, "bagsBlown"],
    ["bags as words", { bagsBlown: "lots" }, "bagsBlown"],
    ["three decimals", { bagsBlown: 1.005 }, "bagsBlown"],
    ["fractional holes", { holesDrilled: 2.5 }, "holesDrilled"],
    ["negative blocked bays", { blockedBays: -2 }, "blockedBays"],
    ["huge pre-filled bays", { prefilledBays: 5000 }, "prefilledBays"],
    ["note too long", { note: "x".repeat(1001) }, "note"],
    ["finished not a flag", { finished: "maybe" }, "finished"],
    ["request id not a UUID", { clientRequestId: "abc" }, "clientRequestId"],
    ["a wall that is not dense-pack", { surfaceId: "not-a-wall" }, "surfaceId"],
    ["no wall", { surfaceId: undefined }, "surfaceId"],
    ["logged in the future", { loggedAt: Date.now() + 86_400_000 }, "loggedAt"],
  ];
  it.each(cases)("%s", async (_name, patch, field) => {
    const wall = (await getLog()).walls[0]!;
    const before = (await getLog()).walls[0]!.logged.entries;
    const r = await post({ surfaceId: wall.surfaceId, bagsBlown: 1, ...patch });
    expect(r.status).toBe(422);
    expect(Object.keys(r.json.fields!)).toContain(field);
    expect((await getLog()).walls[0]!.logged.entries).toBe(before);
  });

  it("not JSON → 400 / 415, never a 500", async () => {
    actAs(ids.installer);
    expect((await call(crewRoute.POST as never, { method: "POST", params, body: "{nope", headers: { "content-type": "application/json" } })).status).toBe(400);
    expect((await call(crewRoute.POST as never, { method: "POST", params, body: "a=1", headers: { "content-type": "text/plain" } })).status).toBe(415);
    expect((await call(crewRoute.POST as never, { method: "POST", params, body: [] })).status).toBe(422);
  });
});

describe("safety acknowledgement", () => {
  it("needs every caution of the job, then records it for the installer", async () => {
    const log = await getLog();
    const keys = log.safety.cautions.map((c) => c.id);
    actAs(ids.installer);
    const partial = await call<{ fields: Record<string, string[]> }>(ackRoute.POST as never, { method: "POST", params, body: { cautionKeys: keys.slice(1) } });
    expect(partial.status).toBe(422);
    expect(partial.json.fields.cautionKeys![0]).toContain(log.safety.cautions[0]!.hazard);
    const bogus = await call<{ fields: Record<string, string[]> }>(ackRoute.POST as never, { method: "POST", params, body: { cautionKeys: [...keys, "made-up"] } });
    expect(bogus.status).toBe(422);
    expect(bogus.json.fields.cautionKeys!.join(" ")).toContain("made-up");
    expect((await call(ackRoute.POST as never, { method: "POST", params, body: { cautionKeys: "all" } })).status).toBe(422);
    const ok = await call<{ acknowledgement: { cautionKeys: string[]; acknowledgedAt: number } }>(ackRoute.POST as never, { method: "POST", params, body: { cautionKeys: keys } });
    expect(ok.status).toBe(201);
    expect(ok.json.acknowledgement.cautionKeys).toEqual(keys);
    const after = await getLog();
    expect(after.safety.mine!.cautionKeys).toEqual(keys);
    expect(after.safety.cautions.every((c) => /local codes and licensed practice/.test(c.message))).toBe(true);
    expect((await getLog(ids.auditor)).safety.acknowledgements[0]!.userName).toBe("Dario Mendel-Quist");
  });
});

describe("test-out", () => {
  type TestOut = { replayed: boolean; movedToVerified: boolean; readingId: string; stage: string; version: number; result: CrewLog["testOut"]; error?: string; fields?: Record<string, string[]> };
  const readings = async (id?: string) => (await ctx.t.db.select().from(leakageTests).where(eq(leakageTests.jobId, ids.demoJob))).filter((t) => t.phase === "test-out" && (!id || t.id === id));
  const record = (body: Record<string, unknown>, as: string = ids.installer) =>
    (actAs(as), call<TestOut>(testOutRoute.POST as never, { method: "POST", params, body: { clientRequestId: crypto.randomUUID(), ...body } }));

  it("refuses bad readings with 422 naming the field", async () => {
    for (const [body, field] of [[{ cfm50: 0 }, "cfm50"], [{ cfm50: "x" }, "cfm50"], [{}, "cfm50"], [{ cfm50: 2500, windMph: 90 }, "windMph"], [{ cfm50: 2500, outdoorTempF: 200 }, "outdoorTempF"], [{ cfm50: 2500, clientRequestId: "1" }, "clientRequestId"]] as const) {
      const r = await record(body);
      expect(r.status).toBe(422);
      expect(Object.keys(r.json.fields!)).toContain(field);
    }
  });

  it("moves installing → verified with a stage event and answers measured vs predicted", async () => {
    actAs(ids.auditor);
    const job = (await call<{ job: { version: number } }>(jobRoute.GET as never, { params })).json.job;
    expect((await call(jobRoute.PATCH as never, { method: "PATCH", params, body: { version: job.version, stage: "installing" } })).status).toBe(200);
    const [before] = await ctx.t.db.select().from(jobs).where(eq(jobs.id, ids.demoJob));

    const clientRequestId = crypto.randomUUID();
    const r = await record({ clientRequestId, cfm50: 2350, outdoorTempF: 38, windMph: 6, notes: "Attic hatch weatherstripped" });
    expect(r.status).toBe(201);
    expect(r.json.movedToVerified).toBe(true);
    expect(r.json.stage).toBe("verified");
    expect(r.json.version).toBe(before!.version + 1);
    expect(r.json.result.measuredCfm50).toBe(2350);
    expect(r.json.result.testInCfm50).toBe(3900);
    expect(r.json.result.predictedCfm50).toBeGreaterThan(0);
    expect(r.json.result.predictedCfm50).not.toBe(2350);
    expect(r.json.result.measuredReductionPct).toBeCloseTo((1 - 2350 / 3900) * 100, 9);
    expect(r.json.result.usesMeasuredLeakage).toBe(true);
    expect(r.json.result.savings.measured!.mmbtu).not.toBeCloseTo(r.json.result.savings.predicted!.mmbtu, 3);
    expect(r.json.result.savings.measured).not.toHaveProperty("usd"); // installers see no money
    expect(r.json.result.testOut).toMatchObject({ cfm50: 2350, outdoorTempF: 38, windMph: 6, notes: "Attic hatch weatherstripped" });

    const events = await ctx.t.db.select().from(jobStageEvents).where(eq(jobStageEvents.jobId, ids.demoJob));
    expect(events.filter((e) => e.fromStage === "installing" && e.toStage === "verified" && e.byUserId === ids.installer)).toHaveLength(1);

    // A retry (the phone's queue sending again after the answer was lost) records nothing new,
    // moves nothing, and gets the same answer as the first send.
    const again = await record({ clientRequestId, cfm50: 2350, outdoorTempF: 38, windMph: 6, notes: "Attic hatch weatherstripped" });
    expect(again.status).toBe(200);
    expect(again.json.replayed).toBe(true);
    expect(again.json.readingId).toBe(clientRequestId);
    expect(again.json.movedToVerified).toBe(true);
    expect(again.json.version).toBe(r.json.version);
    expect(again.json.stage).toBe("verified");
    expect(again.json.result).toEqual(r.json.result);
    expect(await readings(clientRequestId)).toHaveLength(1);
    expect(await readings()).toHaveLength(1);
    const eventsAfter = await ctx.t.db.select().from(jobStageEvents).where(eq(jobStageEvents.jobId, ids.demoJob));
    expect(eventsAfter.filter((e) => e.toStage === "verified")).toHaveLength(1);

    const log = await getLog(ids.owner);
    expect(log.job.stage).toBe("verified");
    expect(log.testOut.measuredCfm50).toBe(2350);
    expect(log.testOut.savings.measured!.usd).toEqual(expect.any(Number));
  });

  it("a later reading on a verified job adds a test and leaves the stage", async () => {
    const r = await record({ cfm50: 2300 }, ids.auditor);
    expect(r.status).toBe(201);
    expect(r.json.movedToVerified).toBe(false);
    expect(r.json.stage).toBe("verified");
    expect(r.json.result.measuredCfm50).toBe(2300);
    expect(r.json.result.savings.measured!.usd).toEqual(expect.any(Number));
  });

  it("two copies of one reading sent at once store one reading, and both get its answer", async () => {
    const clientRequestId = crypto.randomUUID();
    const before = (await readings()).length;
    const [x, y] = await Promise.all([record({ clientRequestId, cfm50: 2280 }), record({ clientRequestId, cfm50: 2280 })]);
    expect([x.status, y.status].sort()).toEqual([200, 201]);
    expect(x.json.readingId).toBe(clientRequestId);
    expect(y.json.readingId).toBe(clientRequestId);
    expect(x.json.result).toEqual(y.json.result);
    expect(x.json.version).toBe(y.json.version);
    expect(await readings(clientRequestId)).toHaveLength(1);
    expect((await readings()).length).toBe(before + 1);
  });

  it("a reading's key cannot be reused for another job, and a key from an unseen job reveals nothing", async () => {
    const [used] = await readings();
    const [demo] = await ctx.t.db.select().from(jobs).where(eq(jobs.id, ids.demoJob));
    const other = (await ctx.t.db.select().from(jobs).where(eq(jobs.companyId, demo!.companyId))).find((j) => j.id !== ids.demoJob)!;
    const r = await (actAs(ids.auditor), call<TestOut>(testOutRoute.POST as never, { method: "POST", params: { id: other.id }, body: { clientRequestId: used!.id, cfm50: 2000 } }));
    expect(r.status).toBe(409);
    expect(r.json.fields?.clientRequestId).toEqual(["Already used for another reading."]);
    expect((await ctx.t.db.select().from(leakageTests).where(eq(leakageTests.jobId, other.id))).filter((t) => t.id === used!.id)).toHaveLength(0);
    // The owner of another company: the job is not theirs, so 404 before the key is even looked at.
    const foreign = await record({ clientRequestId: used!.id, cfm50: 2000 }, ids.otherOwner);
    expect(foreign.status).toBe(404);
  });
});
