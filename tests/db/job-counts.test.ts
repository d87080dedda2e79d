// job_counts (migration 0007) must always equal count(*) of jobs per company and stage, and the
// word index must file each job in its company's range of row ids (migration 0009): checked after inserts,
// stage changes, a move to another company, renames and deletes, in random orders.
import { eq, sql } from "drizzle-orm";
import fc from "fast-check";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { companies, houses, jobs } from "@/db/schema";
import { demoCompanyId, seedDatabase, seedId } from "@/db/seed";
import { jobStages } from "@/lib/stages";
import { createTestDb, type TestDb } from "../support/test-db";

let t: TestDb;
const other = "00000000-0000-4000-8000-0000000c0f17";
beforeAll(async () => {
  t = await createTestDb();
  await seedDatabase(t.db);
  await t.db.insert(companies).values({ id: other, name: "Other Co", slug: "other-co-counts" });
});
afterAll(() => t.cleanup());

/** Per company: the jobs the word index files in the company's range of row ids (migration 0009), and the jobs it really has. */
async function scopes() {
  const out: { company: string; indexed: number[]; real: number[] }[] = [];
  for (const company of [demoCompanyId, other]) {
    const [key] = await t.db.all<{ key: number }>(sql`select key from company_keys where company_id = ${company}`);
    const base = (key?.key ?? -1) * 2 ** 32;
    const indexed = await t.db.all<{ rowid: number }>(sql`select rowid - ${base} as rowid from job_words where rowid between ${base} and ${base + 2 ** 32 - 1} order by rowid`);
    const real = await t.db.all<{ rowid: number }>(sql`select rowid from jobs where company_id = ${company} order by rowid`);
    out.push({ company, indexed: indexed.map((r) => r.rowid), real: real.map((r) => r.rowid) });
  }
  // and nothing outside any company's range
  const [{ n }] = await t.db.all<{ n: number }>(sql`select count(*) as n from job_words`);
  const [{ m }] = await t.db.all<{ m: number }>(sql`select count(*) as m from jobs`);
  expect(n).toBe(m);
  return out;
}

async function counts() {
  const kept = await t.db.all<{ company_id: string; stage: string; n: number }>(sql`select company_id, stage, n from job_counts where n <> 0 order by company_id, stage`);
  const real = await t.db.all<{ company_id: string; stage: string; n: number }>(sql`select company_id, stage, count(*) as n from jobs group by company_id, stage order by company_id, stage`);
  return { kept, real };
}

describe("job_counts", () => {
  it("starts equal to the seeded jobs", async () => {
    const { kept, real } = await counts();
    expect(real.length).toBeGreaterThan(0);
    expect(kept).toEqual(real);
  });

  it("stays equal through random inserts, stage changes, company moves and deletes", async () => {
    const clientId = seedId("client:tansyfield");
    const [{ houseId }] = await t.db.select({ houseId: houses.id }).from(houses).where(eq(houses.clientId, clientId));
    let n = 0;
    const op = fc.oneof(
      fc.record({ kind: fc.constant("insert" as const), stage: fc.constantFrom(...jobStages) }),
      fc.record({ kind: fc.constant("stage" as const), stage: fc.constantFrom(...jobStages), pick: fc.nat() }),
      fc.record({ kind: fc.constant("move" as const), pick: fc.nat() }),
      fc.record({ kind: fc.constant("delete" as const), pick: fc.nat() }),
      fc.record({ kind: fc.constant("rename" as const), pick: fc.nat() }),
    );
    await fc.assert(
      fc.asyncProperty(fc.array(op, { minLength: 1, maxLength: 12 }), async (ops) => {
        for (const o of ops) {
          const mine = await t.db.select({ id: jobs.id, companyId: jobs.companyId }).from(jobs).where(sql`${jobs.title} like 'count test %'`);
          const target = "pick" in o && mine.length ? mine[o.pick % mine.length] : undefined;
          if (o.kind === "insert") {
            await t.db.insert(jobs).values({ companyId: demoCompanyId, number: 90_000 + n++, houseId, clientId, title: `count test ${n}`, stage: o.stage, createdById: seedId("user:owner") });
          } else if (target && o.kind === "stage") {
            await t.db.update(jobs).set({ stage: o.stage }).where(eq(jobs.id, target.id));
          } else if (target && o.kind === "move") {
            await t.db.update(jobs).set({ companyId: target.companyId === other ? demoCompanyId : other }).where(eq(jobs.id, target.id));
          } else if (target && o.kind === "delete") {
            await t.db.delete(jobs).where(eq(jobs.id, target.id));
          } else if (target && o.kind === "rename") {
            await t.db.update(jobs).set({ title: `count test renamed ${n++}` }).where(eq(jobs.id, target.id));
          }
        }
        const { kept, real } = await counts();
        expect(kept).toEqual(real);
        for (const s of await scopes()) expect(s.indexed, s.company).toEqual(s.real);
      }),
      { numRuns: 25 },
    );
  });
});
