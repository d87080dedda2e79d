// Seeds the invented demo company (db/seed-scenario.ts). Idempotent: rows have
// fixed ids and are inserted with ON CONFLICT DO NOTHING, so a second run adds
// nothing and leaves edits made in the demo alone.
// `npm run db:seed` migrates first, then seeds DATABASE_URL (default data/warmstead.db).
import { hash } from "bcryptjs";
import { closeDb, databaseUrl, getDb, type Db } from "./index";
import { isMainModule, migrateDatabase } from "./migrate";
import * as t from "./schema";
import { seedDemoAssessmentRows } from "./seed-assessment";
import { buildScenario, demoAccounts, demoCompanyId, demoHouseId, demoJobId, demoPassword } from "./seed-scenario";

export { demoAccounts, demoPassword, demoCompanyId, demoJobId, demoHouseId, seedId } from "./seed-scenario";

export type SeedTx = Parameters<Parameters<Db["transaction"]>[0]>[0];

export type DemoRefs = { companyId: string; jobId: string; houseId: string };

export async function seedDatabase(db: Db, now: Date = new Date()): Promise<void> {
  const passwordHash = await hash(demoPassword, 10);
  const rows = buildScenario(now, passwordHash);
  await db.transaction(async (tx) => {
    await tx.insert(t.companies).values(rows.company).onConflictDoNothing();
    await tx.insert(t.users).values(rows.users).onConflictDoNothing();
    await tx.insert(t.clients).values(rows.clients).onConflictDoNothing();
    await tx.insert(t.houses).values(rows.houses).onConflictDoNothing();
    await tx.insert(t.jobs).values(rows.jobs).onConflictDoNothing();
    await tx.insert(t.jobCrew).values(rows.jobCrew).onConflictDoNothing();
    await tx.insert(t.jobStageEvents).values(rows.jobStageEvents).onConflictDoNothing();
    await tx.insert(t.heatingSystems).values(rows.heatingSystems).onConflictDoNothing();
    await tx.insert(t.leakageTests).values(rows.leakageTests).onConflictDoNothing();
    await tx.insert(t.priceBookItems).values(rows.priceBookItems).onConflictDoNothing();
    await seedDemoAssessment(tx, { companyId: demoCompanyId, jobId: demoJobId, houseId: demoHouseId });
  });
}

/** The demo house's surfaces, openings and upgrades (db/seed-assessment.ts). */
export async function seedDemoAssessment(tx: SeedTx, demo: DemoRefs): Promise<void> {
  await seedDemoAssessmentRows(tx, demo);
}

if (isMainModule(import.meta.url)) {
  (async () => {
    await migrateDatabase(databaseUrl());
    await seedDatabase(getDb());
    console.log("Seeded Kestrel Bay Home Performance. Demo sign-ins (password for all: warmstead-demo):");
    for (const a of demoAccounts) console.log(`  ${a.role.padEnd(10)} ${a.email.padEnd(32)} ${a.name}`);
  })()
    .catch((error: unknown) => {
      console.error(error);
      process.exitCode = 1;
    })
    .finally(closeDb);
}
