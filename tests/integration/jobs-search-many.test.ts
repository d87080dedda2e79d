// A search that matches many jobs (more than FEW_MATCHES in lib/data/jobs.ts) is counted inside the
// word index within its company's range of row ids (migration 0009) and listed from the company index;
// one that matches few is counted and listed from its matches. Both must give each company exactly
// its own jobs, for every role, with a stage filter and across pages.
import { describe, expect, it, vi } from "vitest";
import { clients, houses, jobs } from "@/db/schema";
import { demoCompanyId, seedId } from "@/db/seed";
import { jobStages } from "@/lib/stages";
import { actAs } from "../support/auth-mock";
import { call } from "../support/route";
import { ids, seededDbForFile } from "./setup";

vi.mock("@/lib/auth", () => import("../support/auth-mock"));

const jobsRoute = await import("@/app/api/jobs/route");
const ctx = seededDbForFile();

type ListBody = { jobs: { number: number; title: string; stage: string }[]; total: number };
const list = (qs: string) => call<ListBody>(jobsRoute.GET as never, { path: `/api/jobs?${qs}` });

/** `n` jobs of `companyId` whose client is called "<name> <i>", stages in turn. */
async function addJobs(companyId: string, name: string, n: number, firstNumber: number) {
  const db = ctx.t.db;
  for (let i = 0; i < n; i++) {
    const clientId = seedId(`many:${companyId}:${name}:client:${i}`);
    const houseId = seedId(`many:${companyId}:${name}:house:${i}`);
    await db.insert(clients).values({ id: clientId, companyId, name: `${name} ${i}` });
    await db.insert(houses).values({ id: houseId, companyId, clientId, street: `${i} Lantern Row`, city: "Harrowmere", state: "NJ", postalCode: "07000", yearBuilt: 1950, stories: 2, conditionedAreaFt2: 1500, volumeFt3: 12000, bedrooms: 3, foundation: "basement" });
    await db.insert(jobs).values({ companyId, number: firstNumber + i, houseId, clientId, title: `${name} job ${i}`, stage: jobStages[i % jobStages.length], createdById: companyId === demoCompanyId ? ids.owner : ids.otherOwner });
  }
}

describe("searches matching many jobs", () => {
  it("counts and pages each company's own matches", async () => {
    await addJobs(demoCompanyId, "Quillon", 230, 5000);
    await addJobs(ids.otherCompany, "Quillon", 40, 5000);
    await addJobs(ids.otherCompany, "Marrowby", 260, 6000);

    actAs(ids.owner);
    const first = await list("q=quillon");
    expect(first.status).toBe(200);
    expect(first.json.total).toBe(230);
    expect(first.json.jobs).toHaveLength(25);
    expect(first.json.jobs.every((j) => j.title.startsWith("Quillon job"))).toBe(true);
    const last = await list("q=quillon&page=10");
    expect(last.json.jobs).toHaveLength(5);
    expect(last.json.total).toBe(230);
    expect((await list("q=quillon&page=11")).json).toMatchObject({ jobs: [], total: 230 });
    const byNumber = await list("q=quillon&sort=number&dir=asc&pageSize=3&page=2");
    expect(byNumber.json.jobs.map((j) => j.number)).toEqual([5003, 5004, 5005]);
    // with a stage the count reads the job rows, and agrees
    const installing = await list("q=quillon&stage=installing");
    expect(installing.json.total).toBe(Array.from({ length: 230 }, (_, i) => jobStages[i % jobStages.length]).filter((s) => s === "installing").length);
    // every company's matches number 530, but none of the other company's are this owner's
    expect((await list("q=marrowby")).json.total).toBe(0);
    expect((await list("q=lantern")).json.total).toBe(230);

    actAs(ids.otherOwner);
    expect((await list("q=quillon")).json.total).toBe(40);
    expect((await list("q=marrowby")).json.total).toBe(260);
    expect((await list("q=lantern row")).json.total).toBe(300);

    // an installer sees only assigned jobs, whatever the index holds
    actAs(ids.installer);
    expect((await list("q=quillon")).json.total).toBe(0);
  });

  it("lists a few matches sorted and paged from the matches", async () => {
    actAs(ids.auditor);
    const few = await list("q=quillon 12&sort=updated");
    expect(few.json.jobs.map((j) => j.title).sort()).toEqual(["Quillon job 12", "Quillon job 120", "Quillon job 121", "Quillon job 122", "Quillon job 123", "Quillon job 124", "Quillon job 125", "Quillon job 126", "Quillon job 127", "Quillon job 128", "Quillon job 129"].sort());
    expect(few.json.total).toBe(11);
    const stageSorted = await list("q=quillon 12&sort=stage&dir=asc&pageSize=4&page=2");
    const all = await list("q=quillon 12&sort=stage&dir=asc&pageSize=11");
    expect(stageSorted.json.jobs).toEqual(all.json.jobs.slice(4, 8));
    const stages = all.json.jobs.map((j) => j.stage);
    expect(stages).toEqual([...stages].sort());
    // sorted by client (joined before paging), and a page past the end still says how many there are
    const byClient = await list("q=quillon 12&sort=client&dir=desc&pageSize=3");
    expect(byClient.json.jobs.map((j) => j.title)).toEqual(["Quillon job 129", "Quillon job 128", "Quillon job 127"]);
    expect(byClient.json.total).toBe(11);
    const past = await list("q=quillon 12&page=5");
    expect(past.json.jobs).toEqual([]);
    expect(past.json.total).toBe(11);
    // an installer's few matches are their assigned jobs only
    actAs(ids.installer);
    expect((await list("q=quillon 12")).json).toMatchObject({ jobs: [], total: 0 });
  });
});
