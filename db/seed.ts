// Seeds the invented demo company (db/seed-scenario.ts). Idempotent: rows have
// fixed ids and are inserted with ON CONFLICT DO NOTHING, so a second run adds
// nothing and leaves edits made in the demo alone.
// `npm run db:seed` migrates first, then seeds DATABASE_URL (default data/warmstead.db).
import { hash } from "bcryptjs";
import { closeDb, databaseUrl, getDb, type Db } from "./index";
import { isMainModule, migrateDatabase } from "./migrate";
import * as t from "./schema";
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

/**
 * Hook for the assessment work: the demo house's assemblies, layers, surfaces
 * and upgrades (2x4 walls at 16 in. o.c., plaster on lath, bevel siding over
 * board sheathing, empty cavities except the north wall with fibre wedged
 * half-way down; upgrades: dense-pack walls, air-seal the attic floor, attic
 * insulation). Left empty until the calc material keys exist; use fixed ids
 * (`seedId`) and `onConflictDoNothing()` like the rows above.
 */
export const seedDemoAssessment: (tx: SeedTx, demo: DemoRefs) => Promise<void> = async () => {};

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
