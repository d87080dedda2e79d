// The one database client. Nothing connects at import time: `next build`
// imports route modules in a checkout that has no data/ folder yet.
import { createClient, type Client } from "@libsql/client";
import { drizzle, type LibSQLDatabase } from "drizzle-orm/libsql";
import * as schema from "./schema";

export const DEFAULT_DATABASE_URL = "file:./data/warmstead.db";

export type Schema = typeof schema;
export type Db = LibSQLDatabase<Schema> & { $client: Client };

export function databaseUrl(env: NodeJS.ProcessEnv = process.env): string {
  return env.DATABASE_URL?.trim() || DEFAULT_DATABASE_URL;
}

/** The filesystem path of a `file:` URL, or null for in-memory and remote URLs. */
export function sqliteFilePath(url: string): string | null {
  if (!url.startsWith("file:")) return null;
  let path = url.slice("file:".length).split("?")[0];
  if (path.startsWith("//")) path = path.slice(2).replace(/^localhost(?=\/)/, "");
  if (path === "" || path === ":memory:") return null;
  return decodeURIComponent(path);
}

/**
 * Opens a database. For a file it switches the file to WAL (the setting is
 * stored in the file) and checks that foreign keys are enforced.
 *
 * The libSQL file client keeps a pool of connections, so a PRAGMA run through
 * it reaches only one of them. Busy waits therefore go through `timeout`, which
 * every pooled connection is opened with; foreign keys are on for every new
 * connection because libSQL is built with SQLITE_DEFAULT_FOREIGN_KEYS=1. The
 * check below fails loudly if a build ever ships without it
 * (tests/db/connection.test.ts holds several connections at once and checks each).
 */
export function createDb(url: string = databaseUrl(), authToken?: string): Db {
  const raw = createClient({ url, authToken, timeout: 5000 });
  const client = sqliteFilePath(url) === null ? raw : gateUntilReady(raw, () => prepareFile(raw, url));
  return drizzle({ client, schema }) as Db;
}

// On globalThis so that `next dev`, which re-evaluates modules on edits, keeps one client per process.
const holder = globalThis as typeof globalThis & { __warmsteadDb?: Db };

/** The process-wide database, created on first use. */
export function getDb(): Db {
  holder.__warmsteadDb ??= createDb(databaseUrl(), process.env.DATABASE_AUTH_TOKEN || undefined);
  return holder.__warmsteadDb;
}

/** Closes the process-wide database (scripts call it before exiting). */
export function closeDb(): void {
  holder.__warmsteadDb?.$client.close();
  holder.__warmsteadDb = undefined;
}

async function prepareFile(client: Client, url: string): Promise<void> {
  await client.execute("PRAGMA journal_mode=WAL");
  await client.execute("PRAGMA foreign_keys=ON");
  const { rows } = await client.execute("PRAGMA foreign_keys");
  if (Number(rows[0]?.foreign_keys) !== 1) {
    throw new Error(`Foreign keys are not enforced on ${url}; refusing to use it.`);
  }
}

const gatedMethods = new Set<PropertyKey>(["execute", "batch", "migrate", "transaction", "executeMultiple"]);

/** Delays the client's first statement until `setup` has run once on it. */
function gateUntilReady(client: Client, setup: () => Promise<void>): Client {
  let ready: Promise<void> | undefined;
  const whenReady = () =>
    (ready ??= setup().catch((error: unknown) => {
      ready = undefined; // let the next call try again
      throw error;
    }));
  return new Proxy(client, {
    get(target, property) {
      const value: unknown = Reflect.get(target, property, target);
      if (typeof value !== "function") return value;
      if (!gatedMethods.has(property)) return value.bind(target);
      return async (...args: unknown[]) => {
        await whenReady();
        return value.apply(target, args);
      };
    },
  });
}
