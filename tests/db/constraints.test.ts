import { eq, getTableName, sql } from "drizzle-orm";
import type { SQLiteTable } from "drizzle-orm/sqlite-core";
import { afterEach, beforeEach, describe, expect, it } from "vitest";
import * as s from "@/db/schema";
import { createTestDb, type TestDb } from "../support/test-db";
import { buildCompany, issueProposal } from "./fixture";
import { schemaTables as tables, sqlErrorOf } from "./helpers";

let t: TestDb;
beforeEach(async () => {
  t = await createTestDb();
});
afterEach(() => t.cleanup());

async function count(table: SQLiteTable, where?: ReturnType<typeof eq>) {
  const q = t.db.select({ n: sql<number>`count(*)` }).from(table);
  const [row] = await (where ? q.where(where) : q);
  return row.n;
}

describe("cascades", () => {
  it("deleting a company removes all its data, issued documents included, and nothing of another company", async () => {
    const a = await buildCompany(t.db, "a");
    const b = await buildCompany(t.db, "b");
    await issueProposal(t.db, a);
    await issueProposal(t.db, b);
    const before: Record<string, number> = {};
    for (const table of tables) before[getTableName(table)] = await count(table);

    await t.db.delete(s.companies).where(eq(s.companies.id, a.company.id));

    for (const table of tables) {
      const name = getTableName(table);
      const expected = name === "sign_in_attempts" ? 0 : before[name] / 2;
      expect(await count(table), name).toBe(expected);
    }
  });

  it("deleting a job without issued documents removes its work and unlinks its mail", async () => {
    const f = await buildCompany(t.db, "a");
    await t.db.delete(s.jobs).where(eq(s.jobs.id, f.job.id));
    for (const table of [s.jobCrew, s.jobStageEvents, s.heatingSystems, s.surfaces, s.leakageTests, s.upgrades, s.proposals, s.proposalLineItems, s.crewLogEntries, s.safetyAcknowledgements, s.photos]) {
      expect(await count(table), getTableName(table)).toBe(0);
    }
    expect(await count(s.assemblies)).toBe(1); // the company's library assembly stays; the job's own one goes
    const [mail] = await t.db.select().from(s.mailOutbox);
    expect(mail.relatedJobId).toBeNull();
    expect(await count(s.houses)).toBe(1);
  });

  it("refuses to delete a job, or the proposal, once a document has been issued", async () => {
    const f = await buildCompany(t.db, "a");
    await issueProposal(t.db, f);
    expect(await sqlErrorOf(t.db.delete(s.jobs).where(eq(s.jobs.id, f.job.id)))).toMatch(/FOREIGN KEY/);
    expect(await sqlErrorOf(t.db.delete(s.proposals).where(eq(s.proposals.id, f.proposal.id)))).toMatch(/FOREIGN KEY/);
    expect(await count(s.surfaces)).toBe(2);
  });

  it("refuses to delete a house or client that still has jobs", async () => {
    const f = await buildCompany(t.db, "a");
    expect(await sqlErrorOf(t.db.delete(s.houses).where(eq(s.houses.id, f.house.id)))).toMatch(/FOREIGN KEY/);
    expect(await sqlErrorOf(t.db.delete(s.clients).where(eq(s.clients.id, f.client.id)))).toMatch(/FOREIGN KEY/);
  });

  it("deleting a homeowner account unlinks the client and drops the tokens", async () => {
    const f = await buildCompany(t.db, "a");
    await t.db.delete(s.users).where(eq(s.users.id, f.homeowner.id));
    const [client] = await t.db.select().from(s.clients);
    expect(client.userId).toBeNull();
    expect(await count(s.authTokens)).toBe(0);
  });

  it("deleting an auditor with no authored records unassigns them and keeps the log", async () => {
    const f = await buildCompany(t.db, "a");
    await t.db.delete(s.leakageTests); // the only record the fixture's auditor authored
    await t.db.delete(s.users).where(eq(s.users.id, f.auditor.id));
    const [job] = await t.db.select().from(s.jobs);
    expect(job.auditorId).toBeNull();
    const [entry] = await t.db.select().from(s.activityLog);
    expect(entry.userId).toBeNull();
  });

  it("refuses to delete a user who has history on a job (disable them instead)", async () => {
    const f = await buildCompany(t.db, "a");
    expect(await sqlErrorOf(t.db.delete(s.users).where(eq(s.users.id, f.installer.id)))).toMatch(/FOREIGN KEY/);
    expect(await sqlErrorOf(t.db.delete(s.users).where(eq(s.users.id, f.owner.id)))).toMatch(/FOREIGN KEY/);
  });

  it("deleting an assembly drops its layers and unlinks surfaces; deleting a wall takes its window", async () => {
    const f = await buildCompany(t.db, "a");
    await t.db.delete(s.assemblies).where(eq(s.assemblies.id, f.assembly.id));
    expect(await count(s.assemblyLayers)).toBe(0);
    const [wall] = await t.db.select().from(s.surfaces).where(eq(s.surfaces.id, f.wall.id));
    expect(wall.existingAssemblyId).toBeNull();
    expect(wall.proposedAssemblyId).toBe(f.jobAssembly.id);
    await t.db.delete(s.surfaces).where(eq(s.surfaces.id, f.wall.id));
    expect(await count(s.surfaces)).toBe(0);
    const [photo] = await t.db.select().from(s.photos);
    expect(photo.surfaceId).toBeNull();
  });

  it("deleting a price-book item keeps the upgrade and line item, unlinked", async () => {
    const f = await buildCompany(t.db, "a");
    await t.db.delete(s.priceBookItems).where(eq(s.priceBookItems.id, f.item.id));
    const [upgrade] = await t.db.select().from(s.upgrades);
    const [line] = await t.db.select().from(s.proposalLineItems);
    expect(upgrade.priceBookItemId).toBeNull();
    expect(line.priceBookItemId).toBeNull();
    expect(line.totalCents).toBe(15000);
  });
});

describe("uniqueness", () => {
  it("allows one account per e-mail address, across companies", async () => {
    const a = await buildCompany(t.db, "a");
    const b = await buildCompany(t.db, "b");
    const message = await sqlErrorOf(
      t.db.insert(s.users).values({ companyId: b.company.id, email: a.owner.email, name: "Dup", role: "owner" }),
    );
    expect(message).toMatch(/UNIQUE constraint failed: users\.email/);
  });

  it("stores e-mail addresses in lower case only", async () => {
    const a = await buildCompany(t.db, "a");
    const message = await sqlErrorOf(
      t.db.insert(s.users).values({ companyId: a.company.id, email: "Mixed@Case.example", name: "M", role: "auditor" }),
    );
    expect(message).toMatch(/CHECK constraint failed: users_email_lower_case/);
  });

  it("numbers jobs once per company, and the same number in another company is fine", async () => {
    const a = await buildCompany(t.db, "a");
    const b = await buildCompany(t.db, "b");
    expect(b.job.number).toBe(a.job.number);
    const message = await sqlErrorOf(
      t.db.insert(s.jobs).values({ ...a.job, id: undefined }),
    );
    expect(message).toMatch(/UNIQUE constraint failed: jobs\.company_id, jobs\.number/);
  });

  it("rejects a replayed crew-log submission", async () => {
    const a = await buildCompany(t.db, "a");
    const entry = { jobId: a.job.id, userId: a.installer.id, clientRequestId: "phone-req-1", loggedAt: new Date(), bagsBlown: 4 };
    await t.db.insert(s.crewLogEntries).values(entry);
    await t.db.insert(s.crewLogEntries).values(entry).onConflictDoNothing({ target: s.crewLogEntries.clientRequestId });
    expect(await count(s.crewLogEntries, eq(s.crewLogEntries.clientRequestId, "phone-req-1"))).toBe(1);
  });

  it("issues each document version once per job and kind", async () => {
    const a = await buildCompany(t.db, "a");
    const doc = await issueProposal(t.db, a);
    const message = await sqlErrorOf(t.db.insert(s.issuedDocuments).values({ ...doc, id: undefined }));
    expect(message).toMatch(/UNIQUE constraint failed: issued_documents\.job_id, issued_documents\.kind, issued_documents\.version/);
  });

  it("keeps built-in assembly keys unique, while companies may reuse one for their copies", async () => {
    const a = await buildCompany(t.db, "a");
    const builtIn = { name: "2x4 wall", kind: "wall" as const, builtInKey: "wall-2x4-16oc" };
    await t.db.insert(s.assemblies).values(builtIn);
    await t.db.insert(s.assemblies).values({ ...builtIn, companyId: a.company.id });
    await t.db.insert(s.assemblies).values({ ...builtIn, companyId: a.company.id });
    expect(await sqlErrorOf(t.db.insert(s.assemblies).values(builtIn))).toMatch(/UNIQUE constraint failed/);
  });
});
