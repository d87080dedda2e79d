// Writes that overlap in one process (two people saving at once): with the local libSQL client a
// second BEGIN used to wait for SQLite's lock synchronously, freezing the event loop for the busy
// timeout while the open transaction could not finish, then failing with SQLITE_BUSY.
// db/index.ts queues writes (oneWriterAtATime); these check the queue keeps every write and
// never stalls.
import { eq } from "drizzle-orm";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { companies } from "@/db/schema";
import { createTestDb, type TestDb } from "../support/test-db";

let t: TestDb;
beforeAll(async () => {
  t = await createTestDb();
});
afterAll(() => t.cleanup());

const pause = (ms: number) => new Promise((r) => setTimeout(r, ms));
const company = (slug: string) => ({ id: crypto.randomUUID(), name: `Co ${slug}`, slug });

describe("overlapping writes in one process", () => {
  it("two transactions that await between statements both commit, quickly", async () => {
    const started = performance.now();
    const run = (tag: string) =>
      t.db.transaction(async (tx) => {
        await tx.insert(companies).values(company(`${tag}-1`));
        await pause(30);
        await tx.insert(companies).values(company(`${tag}-2`));
      });
    await Promise.all([run("a"), run("b"), run("c")]);
    const rows = await t.db.select({ slug: companies.slug }).from(companies);
    expect(rows.map((r) => r.slug).filter((s) => /^[abc]-/.test(s)).sort()).toEqual(["a-1", "a-2", "b-1", "b-2", "c-1", "c-2"]);
    expect(performance.now() - started).toBeLessThan(3_000); // the busy timeout is 5 s: no one waited for it
  });

  it("a plain write during an open transaction waits its turn instead of failing", async () => {
    let inside = false;
    const tx = t.db.transaction(async (tx) => {
      await tx.insert(companies).values(company("tx-1"));
      inside = true;
      await pause(50);
      await tx.insert(companies).values(company("tx-2"));
    });
    while (!inside) await pause(1);
    await t.db.insert(companies).values(company("plain"));
    await tx;
    const slugs = (await t.db.select({ slug: companies.slug }).from(companies)).map((r) => r.slug);
    expect(slugs).toEqual(expect.arrayContaining(["tx-1", "tx-2", "plain"]));
  });

  it("reads do not wait for an open transaction", async () => {
    let release!: () => void;
    const held = new Promise<void>((r) => (release = r));
    const tx = t.db.transaction(async (tx) => {
      await tx.insert(companies).values(company("slow"));
      await held;
    });
    await pause(10);
    const rows = await t.db.select({ id: companies.id }).from(companies).where(eq(companies.slug, "slow"));
    expect(rows).toEqual([]); // not committed yet, and the read did not wait for it
    release();
    await tx;
  });

  it("a transaction that fails rolls back and lets the next write through", async () => {
    await expect(
      t.db.transaction(async (tx) => {
        await tx.insert(companies).values(company("rolled-back"));
        throw new Error("boom");
      }),
    ).rejects.toThrow("boom");
    await t.db.insert(companies).values(company("after-failure"));
    const slugs = (await t.db.select({ slug: companies.slug }).from(companies)).map((r) => r.slug);
    expect(slugs).toContain("after-failure");
    expect(slugs).not.toContain("rolled-back");
  });
});
