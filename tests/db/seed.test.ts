import { compare } from "bcryptjs";
import { getTableName, sql } from "drizzle-orm";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import * as schema from "@/db/schema";
import { demoAccounts, demoJobId, demoPassword, seedDatabase } from "@/db/seed";
import { createTestDb, type TestDb } from "../support/test-db";
import { schemaTables as tables } from "./helpers";

async function counts(t: TestDb): Promise<Record<string, number>> {
  const out: Record<string, number> = {};
  for (const table of tables) {
    const [row] = await t.db.select({ n: sql<number>`count(*)` }).from(table);
    out[getTableName(table)] = row.n;
  }
  return out;
}

let t: TestDb;
beforeAll(async () => {
  t = await createTestDb();
  await seedDatabase(t.db);
});
afterAll(() => t.cleanup());

describe("seed", () => {
  it("is idempotent: a second run adds no rows", async () => {
    const first = await counts(t);
    await seedDatabase(t.db);
    expect(await counts(t)).toEqual(first);
    expect(first).toMatchObject({ companies: 1, users: 8, jobs: 8, price_book_items: 7 });
  });

  it("has every demo account, signing in with the shared demo password", async () => {
    const rows = await t.db.query.users.findMany();
    expect(demoAccounts).toHaveLength(8);
    for (const account of demoAccounts) {
      const user = rows.find((u) => u.email === account.email);
      expect(user, account.email).toMatchObject({ role: account.role, name: account.name, disabled: false });
      expect(account.email).toMatch(/@kestrelbay\.example$/);
    }
    const owner = rows.find((u) => u.role === "owner")!;
    expect(owner.passwordHash).toMatch(/^\$2[aby]\$10\$/);
    expect(await compare(demoPassword, owner.passwordHash!)).toBe(true);
    const counted = (role: schema.Role) => rows.filter((u) => u.role === role).length;
    expect([counted("owner"), counted("auditor"), counted("installer"), counted("homeowner")]).toEqual([1, 2, 2, 3]);
  });

  it("links each homeowner account to a client record", async () => {
    const homeowners = (await t.db.query.users.findMany()).filter((u) => u.role === "homeowner");
    const clients = await t.db.query.clients.findMany();
    for (const h of homeowners) expect(clients.filter((c) => c.userId === h.id)).toHaveLength(1);
  });

  it("spreads the jobs over every stage, each with a history ending in its stage", async () => {
    const jobs = await t.db.query.jobs.findMany({ with: { stageEvents: true } });
    expect(new Set(jobs.map((j) => j.stage))).toEqual(new Set(schema.jobStages));
    expect(jobs.map((j) => j.number).sort()).toEqual([1001, 1002, 1003, 1004, 1005, 1006, 1007, 1008]);
    for (const job of jobs) {
      const events = [...job.stageEvents].sort((a, b) => a.at.getTime() - b.at.getTime());
      expect(events[0].fromStage).toBeNull();
      expect(events.at(-1)!.toStage).toBe(job.stage);
      expect(events).toHaveLength(schema.jobStages.indexOf(job.stage) + 1);
    }
    const withCrew = await t.db.query.jobCrew.findMany();
    expect(withCrew.length).toBeGreaterThan(0);
  });

  it("holds the demo house of PRODUCT.md", async () => {
    const job = await t.db.query.jobs.findFirst({
      where: (j, { eq }) => eq(j.id, demoJobId),
      with: { house: true, heatingSystems: true, leakageTests: true },
    });
    expect(job?.house).toMatchObject({
      yearBuilt: 1928,
      stories: 2,
      conditionedAreaFt2: 1650,
      climateStationWmo: "725020",
      state: "NJ",
    });
    expect(job?.heatingSystems).toEqual([expect.objectContaining({ fuel: "gas", efficiency: 0.78 })]);
    expect(job?.heatingSystems[0].fuelPriceCentsPerUnit).toBeGreaterThan(0);
    expect(job?.leakageTests).toEqual([expect.objectContaining({ phase: "test-in", cfm50: 3900 })]);
  });

  it("prices the price book in whole cents", async () => {
    const items = await t.db.query.priceBookItems.findMany();
    expect(items.map((i) => i.unit).sort()).toEqual(["bag", "each", "ft2", "hole", "hour", "hour", "permit"]);
    for (const item of items) expect(Number.isInteger(item.unitPriceCents)).toBe(true);
  });
});
