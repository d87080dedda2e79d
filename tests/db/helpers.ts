import { getTableName, is } from "drizzle-orm";
import { SQLiteTable } from "drizzle-orm/sqlite-core";
import * as schema from "@/db/schema";

/** Every table declared in db/schema.ts. */
export const schemaTables: SQLiteTable[] = Object.values(schema as Record<string, unknown>).filter(
  (value): value is SQLiteTable => is(value, SQLiteTable),
);
export const schemaTableNames = schemaTables.map((table) => getTableName(table)).sort();

/** Drizzle wraps driver errors ("Failed query: ..."); SQLite's own message is in `cause`. */
export async function sqlErrorOf(statement: PromiseLike<unknown>): Promise<string> {
  try {
    await statement;
  } catch (error) {
    const messages: string[] = [];
    for (let e: unknown = error; e instanceof Error; e = e.cause) messages.push(e.message);
    return messages.join("\n");
  }
  throw new Error("expected the statement to fail, but it succeeded");
}
