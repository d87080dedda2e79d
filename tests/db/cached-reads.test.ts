// db/cached-reads.ts answers plain reads from statements prepared once. Drizzle and the rest of the
// code must not be able to tell its results from the libSQL client's: these run the same
// statements both ways on one seeded file and compare what each gives back.
import { createClient, type Client, type ResultSet } from "@libsql/client";
import { desc, eq, sql } from "drizzle-orm";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { cachedReader, CACHED_STATEMENTS, type CachedReader } from "@/db/cached-reads";
import { sqliteFilePath } from "@/db";
import { companies, jobs, users } from "@/db/schema";
import { seedDatabase } from "@/db/seed";
import { createTestDb, type TestDb } from "../support/test-db";

let t: TestDb;
let plain: Client;
let reader: CachedReader;
beforeAll(async () => {
  t = await createTestDb();
  await seedDatabase(t.db);
  plain = createClient({ url: t.url });
  reader = cachedReader(sqliteFilePath(t.url)!);
});
afterAll(() => {
  reader.close();
  plain.close();
  t.cleanup();
});

/** Everything a caller can observe of a result: columns, each row by index, by name, its keys and its JSON. */
function observe(rs: ResultSet) {
  return {
    columns: rs.columns,
    columnTypes: rs.columnTypes,
    rowsAffected: rs.rowsAffected,
    lastInsertRowid: rs.lastInsertRowid,
    rows: rs.rows.map((row) => ({
      length: row.length,
      byIndex: Array.prototype.slice.call(row),
      keys: Object.keys(row),
      byName: Object.fromEntries(rs.columns.map((c) => [c, row[c]])),
      json: JSON.stringify(row),
      spread: { ...row },
    })),
  };
}

const statements: { name: string; sql: string; args?: unknown[] | Record<string, unknown> }[] = [
  { name: "a join with a repeated column name", sql: "select j.number, c.name, u.name, j.updated_at from jobs j join clients c on c.id = j.client_id left join users u on u.id = j.auditor_id order by j.number" },
  { name: "positional arguments", sql: "select id, email, disabled from users where role = ? and disabled = ? order by email", args: ["auditor", false] },
  { name: "named arguments with a prefix", sql: "select count(*) as n from jobs where stage = :stage", args: { ":stage": "intake" } },
  { name: "numeric column names", sql: "select 1, 2, 'x' as length, 3 as \"0\"" },
  { name: "a name that is a later column's index", sql: "select 'a' as \"2\", 'b' as b, 'c' as c, 'd' as \"9\"" },
  { name: "a name Object.prototype has", sql: "select 'v' as toString, 'w' as constructor" },
  { name: "nulls, reals and an empty result", sql: "select null as a, 1.5 as b, 9007199254740991 as c where 1 = ?", args: [1] },
  { name: "no rows", sql: "select id from jobs where id = ?", args: ["none"] },
  { name: "a blob", sql: "select x'00ff10' as b" },
  { name: "a date argument", sql: "select count(*) as n from jobs where updated_at <= ?", args: [new Date(Date.now() + 86_400_000)] },
];

describe("cached reads give what the libSQL client gives", () => {
  for (const s of statements) {
    it(s.name, async () => {
      const stmt = { sql: s.sql, args: s.args as never };
      const expected = observe(await plain.execute(stmt));
      // twice: the first prepares, the second reuses the statement
      expect(observe(reader.read(stmt)!)).toEqual(expected);
      expect(observe(reader.read(stmt)!)).toEqual(expected);
    });
  }

  it("refuses what the client refuses, with a reason", async () => {
    await expect(plain.execute("select 9223372036854775807 as big")).rejects.toThrow(RangeError);
    expect(() => reader.read("select 9223372036854775807 as big")).toThrow(RangeError);
    expect(() => reader.read({ sql: "select ? as v", args: [Number.NaN] })).toThrow(/finite/);
  });

  it("leaves writes to the client", () => {
    expect(reader.read({ sql: "update jobs set title = title where id = ?", args: ["none"] })).toBeNull();
  });

  it("keeps a bounded number of statements and still answers after evicting", () => {
    for (let i = 0; i < CACHED_STATEMENTS + 20; i++) expect(reader.read(`select ${i} as n`)!.rows[0]!.n).toBe(i);
    expect(reader.read("select 0 as n")!.rows[0]!.n).toBe(0);
  });
});

describe("the database client reads through the cache", () => {
  it("sees a committed write at once, and Drizzle maps rows as before", async () => {
    const [before] = await t.db.select({ title: jobs.title, number: jobs.number, updatedAt: jobs.updatedAt }).from(jobs).orderBy(desc(jobs.number)).limit(1);
    await t.db.update(jobs).set({ title: "Renamed for the read check" }).where(eq(jobs.number, before!.number));
    const [after] = await t.db.select({ title: jobs.title, number: jobs.number, updatedAt: jobs.updatedAt }).from(jobs).where(eq(jobs.number, before!.number));
    expect(after).toMatchObject({ number: before!.number, title: "Renamed for the read check" });
    expect(after!.updatedAt).toBeInstanceOf(Date);
  });

  it("maps booleans, joins with nulls and raw SQL like the client", async () => {
    const viaDb = await t.db.select({ email: users.email, disabled: users.disabled, company: companies.name }).from(users).leftJoin(companies, eq(companies.id, users.companyId)).orderBy(users.email);
    const viaPlain = (await plain.execute("select u.email, u.disabled, c.name from users u left join companies c on c.id = u.company_id order by u.email")).rows;
    expect(viaDb).toEqual(viaPlain.map((r) => ({ email: r.email, disabled: r.disabled === 1, company: r.name })));
    const [raw] = await t.db.all<{ n: number }>(sql`select count(*) as n from users`);
    expect(raw).toEqual({ n: viaPlain.length });
  });

  it("reports a bad statement with the client's error", async () => {
    await expect(t.db.$client.execute("select nope from jobs")).rejects.toMatchObject({ code: "SQLITE_ERROR" });
  });
});

describe("after a failed read", () => {
  it("starts afresh and sees later writes", async () => {
    const own = cachedReader(sqliteFilePath(t.url)!);
    try {
      expect(own.read("select count(*) as n from companies")!.rows[0]!.n).toBeGreaterThan(0);
      expect(() => own.read({ sql: "select abs(?) as v", args: [-9223372036854775808n] })).toThrow(); // integer overflow inside SQLite, mid-statement
      await t.db.insert(companies).values({ id: crypto.randomUUID(), name: "Later Co", slug: `later-${Date.now()}` });
      const rows = own.read("select name from companies where name = 'Later Co'")!.rows;
      expect(rows).toHaveLength(1);
    } finally {
      own.close();
    }
  });
});
