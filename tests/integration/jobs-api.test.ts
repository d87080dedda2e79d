import { describe, expect, it, vi } from "vitest";
import { demoCompanyId } from "@/db/seed";
import { actAs } from "../support/auth-mock";
import { call, form } from "../support/route";
import { disableUser, ids, seededDbForFile } from "./setup";

vi.mock("@/lib/auth", () => import("../support/auth-mock"));
vi.mock("next/cache", () => ({ revalidatePath: vi.fn() }));

const jobsRoute = await import("@/app/api/jobs/route");
const jobRoute = await import("@/app/api/jobs/[id]/route");
const { createJobAction } = await import("@/app/(office)/jobs/new/actions");

const ctx = seededDbForFile();

type ListBody = { jobs: { number: number; clientName: string; stage: string; id: string; updatedAt: number }[]; total: number; page: number };
const list = (qs: string) => call<ListBody>(jobsRoute.GET as never, { path: `/api/jobs?${qs}` });

describe("GET /api/jobs", () => {
  it("lists the company's eight seeded jobs, newest change first, 25 a page", async () => {
    actAs(ids.owner);
    const r = await list("");
    expect(r.status).toBe(200);
    expect(r.json.total).toBe(8);
    expect(r.json.jobs.map((j) => j.number)).toContain(1006);
    // newest change first, as milliseconds since 1970
    const times = r.json.jobs.map((j) => j.updatedAt);
    expect(times.every((t) => Number.isInteger(t) && t > Date.UTC(2020, 0, 1))).toBe(true);
    expect(times).toEqual([...times].sort((a, b) => b - a));
  });

  it("gives each row the job's own facts, field by field, on every kind of list", async () => {
    actAs(ids.owner);
    const detail = (await call(jobRoute.GET as never, { params: { id: ids.demoJob } })).json.job as {
      id: string; number: number; title: string; stage: string; updatedAt: string; client: { name: string }; house: { street: string; city: string }; auditor: { name: string } | null;
    };
    const expected = {
      id: detail.id, number: detail.number, title: detail.title, stage: detail.stage, clientName: detail.client.name,
      address: `${detail.house.street}, ${detail.house.city}`, auditorName: detail.auditor?.name ?? null, updatedAt: new Date(detail.updatedAt).getTime(),
    };
    expect(expected.auditorName).not.toBeNull();
    for (const qs of ["", `q=${detail.number}`, "q=tansy", `stage=${detail.stage}`, "q=ansyfie", "sort=client&q=road"]) {
      const row = (await list(qs)).json.jobs.find((j) => j.id === detail.id);
      expect(row, qs).toEqual(expected);
    }
  });

  it("searches by client name, street and job number", async () => {
    actAs(ids.auditor);
    expect((await list("q=Pashley")).json.jobs.map((j) => j.number)).toEqual([1006]);
    expect((await list("q=Tansyfield")).json.jobs.map((j) => j.number)).toEqual([1006]);
    expect((await list("q=1003")).json.jobs.map((j) => j.number)).toEqual([1003]);
    expect((await list("q=%25")).json.total).toBe(0); // a literal % matches nothing, not everything
  });

  it("gives the whole total with a full page, for every role (kept tally or count)", async () => {
    actAs(ids.owner);
    const all = await list("pageSize=3");
    expect(all.json.jobs).toHaveLength(3);
    expect(all.json.total).toBe(8);
    expect((await list("pageSize=1&stage=intake")).json.total).toBe(2);
    expect((await list("pageSize=1&q=Road")).json.total).toBe((await list("q=Road")).json.jobs.length);
    actAs(ids.installer);
    const mine = (await list("")).json.total;
    expect(mine).toBeGreaterThan(1);
    expect((await list("pageSize=1")).json.total).toBe(mine);
  });

  it("matches the beginnings of words, in any order, and falls back to any substring", async () => {
    actAs(ids.auditor);
    const numbers = async (q: string) => (await list(`q=${encodeURIComponent(q)}`)).json.jobs.map((j) => j.number);
    expect(await numbers("tansy")).toEqual([1006]); // a word beginning (job_words)
    expect(await numbers("Road 27 tansy")).toEqual([1006]); // every word, any order
    expect(await numbers("ansyfie")).toEqual([1006]); // inside a word: no word begins so, the trigram index finds it
    expect(await numbers("tansy nowhere")).toEqual([]); // a word that matches nothing rules the job out
    expect(await numbers('"')).toEqual([]); // punctuation alone is not a syntax error
    // no company id is ever a word of a job (the index files companies by row id, migration 0009)
    expect(await numbers(`c${demoCompanyId.replace(/-/g, "")}`)).toEqual([]);
    expect(await numbers(`c${demoCompanyId.slice(0, 3)}`)).toEqual([]);
  });

  it("filters by stage, sorts and paginates", async () => {
    actAs(ids.owner);
    const intake = await list("stage=intake");
    expect(intake.json.jobs.every((j) => j.stage === "intake")).toBe(true);
    expect(intake.json.total).toBe(2);
    const byNumber = await list("sort=number&dir=asc&pageSize=3&page=2");
    expect(byNumber.json.jobs.map((j) => j.number)).toEqual([1004, 1005, 1006]);
  });

  it("shows an installer only the jobs they are assigned to", async () => {
    actAs(ids.installer2);
    const r = await list("");
    expect(r.json.jobs.map((j) => j.number).sort()).toEqual([1001, 1003]);
  });

  it("answers bad query parameters with 422 naming the field", async () => {
    actAs(ids.owner);
    const r = await call<{ fields: Record<string, string[]> }>(jobsRoute.GET as never, { path: "/api/jobs?stage=nowhere&page=0" });
    expect(r.status).toBe(422);
    expect(r.json.fields.stage[0]).toMatch(/stage/i);
    expect(r.json.fields.page[0]).toMatch(/page/i);
  });
});

describe("POST /api/jobs", () => {
  const good = {
    client: { name: "Ada Fernhollow", email: "ada@mail.example" },
    house: { street: "9 Brackenridge Way", city: "Harrowmere", state: "nj", postalCode: "07000", yearBuilt: 1938, stories: "2", conditionedAreaFt2: 1400, ceilingHeightFt: 8, bedrooms: 3, foundation: "basement", shielding: "normal" },
  };

  it("creates a job at Intake with the next number and volume from floor area × ceiling height", async () => {
    actAs(ids.auditor);
    const r = await call(jobsRoute.POST as never, { method: "POST", body: good });
    expect(r.status).toBe(201);
    const job = r.json.job as { number: number; stage: string; house: { volumeFt3: number; state: string }; history: unknown[] };
    expect(job.number).toBe(1009);
    expect(job.stage).toBe("intake");
    expect(job.house.volumeFt3).toBe(11_200);
    expect(job.house.state).toBe("NJ");
    expect(job.history).toHaveLength(1);
  });

  it("refuses bad facts with 422 and a reason per field", async () => {
    actAs(ids.auditor);
    const bad = { client: { name: "" }, house: { ...good.house, yearBuilt: 1280, conditionedAreaFt2: -5, ceilingHeightFt: "", postalCode: "ABC", stories: "7" } };
    const r = await call<{ fields: Record<string, string[]> }>(jobsRoute.POST as never, { method: "POST", body: bad });
    expect(r.status).toBe(422);
    expect(r.json.fields["client.name"]).toEqual(["Enter client name."]);
    expect(r.json.fields["house.yearBuilt"][0]).toBe("Year built must be a whole number between 1,700 and 2,030.");
    expect(r.json.fields["house.conditionedAreaFt2"][0]).toMatch(/Conditioned floor area must be between 100 and 50,000 ft²/);
    expect(r.json.fields["house.postalCode"][0]).toMatch(/ZIP/);
    expect(r.json.fields["house.stories"][0]).toMatch(/stories/i);
  });

  it("answers malformed JSON with 400 and a foreign Origin with 403", async () => {
    actAs(ids.owner);
    expect((await call(jobsRoute.POST as never, { method: "POST", body: "{not json" })).status).toBe(400);
    expect((await call(jobsRoute.POST as never, { method: "POST", body: good, headers: { origin: "https://evil.example" } })).status).toBe(403);
  });
});

describe("PATCH /api/jobs/[id]", () => {
  it("moves the stage, records who and when, and bumps the version", async () => {
    actAs(ids.auditor);
    const before = (await call(jobRoute.GET as never, { params: { id: ids.demoJob } })).json.job as { version: number };
    const r = await call(jobRoute.PATCH as never, { method: "PATCH", params: { id: ids.demoJob }, body: { version: before.version, stage: "proposed", stageNote: "Proposal drafted" } });
    expect(r.status).toBe(200);
    const job = r.json.job as { version: number; stage: string; history: { toStage: string; byName: string; note: string }[] };
    expect(job.version).toBe(before.version + 1);
    expect(job.stage).toBe("proposed");
    expect(job.history[0]).toMatchObject({ toStage: "proposed", byName: "Tobias Lindqvist-Ayre", note: "Proposal drafted" });
  });

  it("refuses a stale version with 409 and the current record, so nobody overwrites silently", async () => {
    actAs(ids.owner);
    const current = (await call(jobRoute.GET as never, { params: { id: ids.demoJob } })).json.job as { version: number };
    const first = await call(jobRoute.PATCH as never, { method: "PATCH", params: { id: ids.demoJob }, body: { version: current.version, title: "First edit" } });
    expect(first.status).toBe(200);
    const second = await call(jobRoute.PATCH as never, { method: "PATCH", params: { id: ids.demoJob }, body: { version: current.version, title: "Second edit" } });
    expect(second.status).toBe(409);
    expect((second.json.current as { title: string }).title).toBe("First edit");
  });

  it("refuses unknown fields and a crew member who is not an installer of the company", async () => {
    actAs(ids.owner);
    const { version } = (await call(jobRoute.GET as never, { params: { id: ids.demoJob } })).json.job as { version: number };
    expect((await call(jobRoute.PATCH as never, { method: "PATCH", params: { id: ids.demoJob }, body: { version, companyId: "x" } })).status).toBe(422);
    const r = await call<{ fields: Record<string, string[]> }>(jobRoute.PATCH as never, { method: "PATCH", params: { id: ids.demoJob }, body: { version, crewIds: [ids.otherOwner] } });
    expect(r.status).toBe(422);
    expect(r.json.fields.crewIds[0]).toMatch(/installers of your company/);
  });
});

describe("new job form action", () => {
  it("returns field messages and keeps everything typed", async () => {
    actAs(ids.auditor);
    const typed = { "client.name": "Kept Name", "house.street": "5 Kept St", "house.city": "Harrowmere", "house.yearBuilt": "nineteen", "house.conditionedAreaFt2": "1500", "house.bedrooms": "3" };
    const state = await createJobAction({}, form(typed));
    expect(state.ok).toBe(false);
    expect(state.fields?.["house.yearBuilt"]).toEqual(["Year built must be a number."]);
    expect(state.fields?.["house.volumeFt3"]?.[0]).toMatch(/volume/);
    expect(state.values).toMatchObject(typed);
  });
});

describe("a disabled account", () => {
  it("is refused on its next request", async () => {
    actAs(ids.installer);
    expect((await list("")).status).toBe(200);
    await disableUser(ctx.t, ids.installer);
    expect((await list("")).status).toBe(401);
    await disableUser(ctx.t, ids.installer, false);
  });
});

describe("search index follows edits", () => {
  it("finds a job by its client's new name after the client is renamed, and not by the old one", async () => {
    const { clients } = await import("@/db/schema");
    const { eq } = await import("drizzle-orm");
    const { seedId } = await import("@/db/seed");
    actAs(ids.owner);
    expect((await list("q=Pashley-Wren")).json.total).toBe(1);
    await ctx.t.db.update(clients).set({ name: "Eleanor Quenby" }).where(eq(clients.id, seedId("client:tansyfield")));
    expect((await list("q=Quenby")).json.jobs.map((j) => j.number)).toEqual([1006]);
    expect((await list("q=Pashley-Wren")).json.total).toBe(0);
    expect((await list("q=QUENBY")).json.total).toBe(1); // case-insensitive
  });
});
