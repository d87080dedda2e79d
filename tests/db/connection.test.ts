import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { companies, users } from "@/db/schema";
import { createTestDb, type TestDb } from "../support/test-db";
import { sqlErrorOf } from "./helpers";

let t: TestDb;
beforeAll(async () => {
  t = await createTestDb();
});
afterAll(() => t.cleanup());

describe("db/index", () => {
  it("does not open a database at import time", async () => {
    const saved = process.env.DATABASE_URL;
    process.env.DATABASE_URL = "file:/nonexistent-warmstead-dir/never.db";
    try {
      const mod = await import("@/db");
      expect(typeof mod.getDb).toBe("function");
      expect(mod.databaseUrl()).toBe("file:/nonexistent-warmstead-dir/never.db");
    } finally {
      if (saved === undefined) delete process.env.DATABASE_URL;
      else process.env.DATABASE_URL = saved;
    }
  });

  it("getDb() opens DATABASE_URL once per process until closeDb()", async () => {
    const { closeDb, getDb } = await import("@/db");
    const saved = process.env.DATABASE_URL;
    process.env.DATABASE_URL = t.url;
    try {
      const db = getDb();
      expect(getDb()).toBe(db);
      expect(typeof (await db.$count(companies))).toBe("number");
      closeDb();
      expect(getDb()).not.toBe(db);
    } finally {
      closeDb();
      if (saved === undefined) delete process.env.DATABASE_URL;
      else process.env.DATABASE_URL = saved;
    }
  });

  it("reads file paths out of file: URLs", async () => {
    const { sqliteFilePath } = await import("@/db");
    expect(sqliteFilePath("file:./data/warmstead.db")).toBe("./data/warmstead.db");
    expect(sqliteFilePath("file:///tmp/a b.db".replace(" ", "%20"))).toBe("/tmp/a b.db");
    expect(sqliteFilePath("file:/tmp/x.db?mode=rwc")).toBe("/tmp/x.db");
    expect(sqliteFilePath("file::memory:")).toBeNull();
    expect(sqliteFilePath("libsql://db.example.turso.io")).toBeNull();
  });

  it("enforces foreign keys on every pooled connection, not just the first", async () => {
    // Hold two transactions open so the pool has to hand out three distinct connections.
    const a = await t.db.$client.transaction("read");
    const b = await t.db.$client.transaction("read");
    try {
      for (const conn of [a, b, t.db.$client]) {
        const { rows } = await conn.execute("PRAGMA foreign_keys");
        expect(Number(rows[0].foreign_keys)).toBe(1);
      }
      const { rows } = await t.db.$client.execute("PRAGMA busy_timeout");
      expect(Number(Object.values(rows[0])[0])).toBe(5000);
    } finally {
      a.close();
      b.close();
    }
  });

  it("rejects a row whose foreign key points nowhere", async () => {
    const message = await sqlErrorOf(
      t.db.insert(users).values({ companyId: "no-such-company", email: "x@example.test", name: "X", role: "auditor" }),
    );
    expect(message).toMatch(/FOREIGN KEY constraint failed/);
  });

  it("fills ids and timestamps and round-trips booleans and JSON", async () => {
    const [company] = await t.db
      .insert(companies)
      .values({ name: "Test Co", slug: "test-co", fuelPricesCentsPerUnit: { gas: 150 } })
      .returning();
    expect(company.id).toMatch(/^[0-9a-f-]{36}$/);
    expect(company.createdAt).toBeInstanceOf(Date);
    expect(company.fuelPricesCentsPerUnit).toEqual({ gas: 150 });
    const [user] = await t.db
      .insert(users)
      .values({ companyId: company.id, email: "a@example.test", name: "A", role: "owner" })
      .returning();
    expect(user.disabled).toBe(false);
    expect(user.unitSystem).toBe("ip");
    expect(user.passwordHash).toBeNull();
  });
});
