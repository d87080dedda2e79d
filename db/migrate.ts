// Applies db/migrations. `npm run db:migrate`, or `migrateDatabase(url)` from scripts and tests.
import { mkdirSync } from "node:fs";
import { dirname, resolve } from "node:path";
import { fileURLToPath, pathToFileURL } from "node:url";
import { migrate } from "drizzle-orm/libsql/migrator";
import { createDb, databaseUrl, sqliteFilePath, type Db } from "./index";

export const migrationsFolder = fileURLToPath(new URL("./migrations", import.meta.url));

/**
 * Runs pending migrations on an open database. The libSQL client turns
 * foreign keys off around the migration transaction, so a generated table
 * rebuild (`__new_x`, DROP, RENAME) does not cascade-delete child rows; the
 * foreign-key check afterwards catches a migration that left orphans.
 */
export async function applyMigrations(db: Db): Promise<void> {
  await migrate(db, { migrationsFolder });
  const { rows } = await db.$client.execute("PRAGMA foreign_key_check");
  if (rows.length > 0) {
    throw new Error(`Migrations left ${rows.length} rows breaking foreign keys, first: ${JSON.stringify(rows[0])}`);
  }
}

/** Creates the folder of a `file:` database if needed, then migrates it. */
export async function migrateDatabase(url: string = databaseUrl()): Promise<void> {
  const file = sqliteFilePath(url);
  if (file !== null) mkdirSync(dirname(resolve(file)), { recursive: true });
  const db = createDb(url, process.env.DATABASE_AUTH_TOKEN || undefined);
  try {
    await applyMigrations(db);
  } finally {
    db.$client.close();
  }
}

export function isMainModule(moduleUrl: string): boolean {
  const entry = process.argv[1];
  return entry !== undefined && moduleUrl === pathToFileURL(resolve(entry)).href;
}

if (isMainModule(import.meta.url)) {
  const url = databaseUrl();
  migrateDatabase(url).then(
    () => console.log(`Migrated ${url.replace(/\/\/[^@/]*@/, "//")}`),
    (error: unknown) => {
      console.error(error);
      process.exitCode = 1;
    },
  );
}
