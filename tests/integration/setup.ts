// Shared by integration tests: a fresh migrated and seeded SQLite file per test file, made the
// process's database before anything calls getDb().
import { eq } from "drizzle-orm";
import { afterAll, beforeAll } from "vitest";
import { companies, users } from "@/db/schema";
import { seedDatabase, seedId } from "@/db/seed";
import { createTestDb, type TestDb } from "../support/test-db";

export const ids = {
  owner: seedId("user:owner"),
  auditor: seedId("user:auditor"),
  installer: seedId("user:installer"),
  installer2: seedId("user:installer2"),
  homeowner: seedId("user:homeowner"),
  homeowner2: seedId("user:homeowner2"),
  demoJob: seedId("job:1006"),
  otherCompany: "00000000-0000-4000-8000-00000000c0de",
  otherOwner: "00000000-0000-4000-8000-0000000000aa",
};

export function seededDbForFile() {
  const ctx = {} as { t: TestDb };
  beforeAll(async () => {
    ctx.t = await createTestDb();
    process.env.DATABASE_URL = ctx.t.url;
    await seedDatabase(ctx.t.db);
    // A second company, to prove nobody sees across tenants.
    await ctx.t.db.insert(companies).values({ id: ids.otherCompany, name: "Other Co", slug: "other-co" });
    await ctx.t.db.insert(users).values({ id: ids.otherOwner, companyId: ids.otherCompany, email: "boss@other.example", name: "Other Boss", role: "owner", passwordHash: null });
  });
  afterAll(async () => {
    const { closeDb } = await import("@/db");
    closeDb();
    ctx.t?.cleanup();
  });
  return ctx;
}

export async function disableUser(t: TestDb, id: string, disabled = true) {
  await t.db.update(users).set({ disabled }).where(eq(users.id, id));
}
