// A fresh SQLite file built from the committed migrations, one per call.
import { mkdtempSync, rmSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { createDb, type Db } from "@/db";
import { applyMigrations } from "@/db/migrate";

export type TestDb = { db: Db; url: string; cleanup: () => void };

export async function createTestDb(): Promise<TestDb> {
  const dir = mkdtempSync(join(tmpdir(), "warmstead-test-"));
  const url = `file:${join(dir, "test.db")}`;
  const db = createDb(url);
  try {
    await applyMigrations(db);
  } catch (error) {
    db.$client.close();
    rmSync(dir, { recursive: true, force: true });
    throw error;
  }
  const cleanup = () => {
    db.$client.close();
    rmSync(dir, { recursive: true, force: true });
  };
  return { db, url, cleanup };
}
