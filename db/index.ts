// The one database client. Nothing connects at import time: `next build`
// imports route modules in a checkout that has no data/ folder yet.
import { createClient, type Client, type InStatement, type Transaction } from "@libsql/client";
import { drizzle, type LibSQLDatabase } from "drizzle-orm/libsql";
import { cachedReader, withCachedReads } from "./cached-reads";
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
  const timeout = 5000;
  const raw = createClient({ url, authToken, timeout });
  const file = sqliteFilePath(url);
  if (file === null) return drizzle({ client: raw, schema }) as Db;
  const ready = onceUntilDone(() => prepareFile(raw, url));
  const client = withCachedReads(oneWriterAtATime(gateUntilReady(raw, ready)), cachedReader(file, { timeout }), isRead, ready);
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

/** `setup` run once, shared by every caller; a failure lets the next call try again. */
function onceUntilDone(setup: () => Promise<void>): () => Promise<void> {
  let ready: Promise<void> | undefined;
  return () =>
    (ready ??= setup().catch((error: unknown) => {
      ready = undefined;
      throw error;
    }));
}

/** Delays the client's first statement until `whenReady` has resolved. */
function gateUntilReady(client: Client, whenReady: () => Promise<void>): Client {
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

/**
 * Lets one write (a transaction, a batch or a writing statement) run at a time in this process;
 * reads never wait.
 *
 * The local libSQL client runs SQLite synchronously on the event loop, with a connection per open
 * transaction. If a second write began while a transaction was open, its BEGIN (or INSERT) would
 * wait for SQLite's lock inside the synchronous call, for the whole busy timeout, while the
 * transaction holding the lock could not run its next statement: a frozen server and then
 * SQLITE_BUSY. Queuing writes here instead lets the open transaction finish first.
 */
export function oneWriterAtATime(client: Client, opts: { waitMs?: number } = {}): Client {
  const waitMs = opts.waitMs ?? 15_000;
  let tail: Promise<void> = Promise.resolve();
  /** Resolves with a release function once every earlier write has released. */
  const acquire = async (): Promise<() => void> => {
    let release!: () => void;
    const mine = new Promise<void>((r) => (release = r));
    const before = tail;
    tail = before.then(() => mine);
    let timer: ReturnType<typeof setTimeout> | undefined;
    const timedOut = new Promise<never>((_, reject) => {
      timer = setTimeout(() => reject(new Error(`A database write waited more than ${waitMs} ms for the one before it.`)), waitMs);
    });
    try {
      await Promise.race([before, timedOut]);
    } catch (error) {
      // Give up our turn without holding up the writes queued behind it.
      before.then(release, release);
      throw error;
    } finally {
      clearTimeout(timer);
    }
    let released = false;
    return () => {
      if (released) return;
      released = true;
      release();
    };
  };
  const whileHeld = async <T>(run: () => Promise<T>): Promise<T> => {
    const release = await acquire();
    try {
      return await run();
    } finally {
      release();
    }
  };

  return new Proxy(client, {
    get(target, property) {
      const value: unknown = Reflect.get(target, property, target);
      if (typeof value !== "function") return value;
      const fn = value as (...args: unknown[]) => Promise<unknown>;
      switch (property) {
        case "execute":
          return (stmt: InStatement, ...rest: unknown[]) => (isRead(stmt) ? fn.call(target, stmt, ...rest) : whileHeld(() => fn.call(target, stmt, ...rest)));
        case "batch":
        case "migrate":
        case "executeMultiple":
          return (...args: unknown[]) => whileHeld(() => fn.apply(target, args));
        case "transaction":
          return async (...args: unknown[]) => {
            // A read transaction takes no write lock, so it need not wait its turn.
            if (args[0] === "read") return fn.apply(target, args);
            const release = await acquire();
            let tx: Transaction;
            try {
              tx = (await fn.apply(target, args)) as Transaction;
            } catch (error) {
              release();
              throw error;
            }
            return releasingOnEnd(tx, release);
          };
        default:
          return fn.bind(target);
      }
    },
  });
}

/** The transaction, releasing the writer's turn once it commits, rolls back or closes. */
function releasingOnEnd(tx: Transaction, release: () => void): Transaction {
  return new Proxy(tx, {
    get(target, property) {
      const value: unknown = Reflect.get(target, property, target);
      if (typeof value !== "function") return value;
      if (property === "commit" || property === "rollback") {
        return async (...args: unknown[]) => {
          try {
            return await (value as (...a: unknown[]) => Promise<unknown>).apply(target, args);
          } finally {
            release();
          }
        };
      }
      if (property === "close") {
        return (...args: unknown[]) => {
          try {
            return (value as (...a: unknown[]) => unknown).apply(target, args);
          } finally {
            release();
          }
        };
      }
      return (value as (...a: unknown[]) => unknown).bind(target);
    },
  });
}

/** A statement that only reads: SELECT, EXPLAIN or WITH … SELECT (no write keyword), or a PRAGMA that sets nothing. */
function isRead(stmt: InStatement): boolean {
  const text = (typeof stmt === "string" ? stmt : stmt.sql).trimStart();
  if (/^(select|explain)\b/i.test(text)) return true;
  if (/^with\b/i.test(text)) return !/\b(insert|update|delete|replace)\b/i.test(text);
  return /^pragma\b/i.test(text) && !text.includes("=");
}
