// Reads of a local database file through statements prepared once. The libSQL file client
// prepares every statement again on each execute, asks for its columns twice and builds each row
// with two defineProperty calls per column; on a list request that was most of the database
// time (bench/jobs.ts). Here a read is prepared once per SQL text on a connection of its own and
// its rows are built from one shared prototype per statement. Results have the client's shape
// (`ResultSet`, rows indexed and named, integers as numbers), so Drizzle cannot tell the two apart
// (tests/db/cached-reads.test.ts runs the same statements both ways and compares).
import Database from "libsql";
import type { Client, InStatement, InValue, ResultSet, Row } from "@libsql/client";

type Statement = ReturnType<InstanceType<typeof Database>["prepare"]>;
type Prepared = { stmt: Statement; columns: string[]; columnTypes: string[]; proto: object; named: [string, number][] };

const RAW = Symbol("raw row");
const MIN_SAFE = BigInt(Number.MIN_SAFE_INTEGER);
const MAX_SAFE = BigInt(Number.MAX_SAFE_INTEGER);
/** Distinct SQL texts kept prepared; the least recently used is finalised past this. */
export const CACHED_STATEMENTS = 300;

/**
 * The rows' shared prototype for one column list: `row[i]` and `length` read the raw values, as
 * the client's rows allow (Drizzle reads a row with `Array.prototype.slice.call`); the names are
 * the rows' own enumerable properties, the first column of a name winning, as in the client.
 */
function rowPrototype(columns: string[]): object {
  const proto: PropertyDescriptorMap = { length: { value: columns.length } };
  columns.forEach((_, i) => {
    proto[i] = { get(this: { [RAW]: unknown[] }) { return this[RAW][i]; } };
  });
  return Object.create(Object.prototype, proto);
}

function fromSql(value: unknown): unknown {
  if (typeof value === "bigint") {
    if (value < MIN_SAFE || value > MAX_SAFE) throw new RangeError("Received integer which cannot be safely represented as a JavaScript number");
    return Number(value);
  }
  if (value instanceof Buffer) return value.buffer;
  return value;
}

function toSql(value: InValue): unknown {
  if (typeof value === "number") {
    if (!Number.isFinite(value)) throw new RangeError("Only finite numbers (not Infinity or NaN) can be passed as arguments");
    return value;
  }
  if (typeof value === "boolean") return value ? 1 : 0;
  if (value instanceof Date) return value.valueOf();
  if (value instanceof ArrayBuffer) return Buffer.from(value);
  if (value === undefined) throw new TypeError("undefined cannot be passed as argument to the database");
  return value;
}

/** Positional arguments as an array, named ones as an object without their prefix, as the client binds them. */
function bindArgs(args: InValue[] | Record<string, InValue> | undefined): unknown[] | Record<string, unknown> {
  if (!args) return [];
  if (Array.isArray(args)) return args.map(toSql);
  const named: Record<string, unknown> = {};
  for (const name in args) named[/^[@$:]/.test(name) ? name.slice(1) : name] = toSql(args[name]);
  return named;
}

/**
 * The row's own enumerable properties and the column each is read from, worked out once per
 * statement by following the client's own steps (it defines `length`, then for each column its
 * index and, unless the row already has it, its name; redefining an index keeps it enumerable).
 * Indices that stay non-enumerable are served by the prototype.
 */
function enumerableKeys(columns: string[]): [string, number][] {
  const keys = new Map<string, { column: number; enumerable: boolean }>([["length", { column: -1, enumerable: false }]]);
  columns.forEach((name, i) => {
    const index = keys.get(String(i));
    if (index) index.column = i;
    else keys.set(String(i), { column: i, enumerable: false });
    if (!keys.has(name)) keys.set(name, { column: i, enumerable: true });
  });
  return [...keys].filter(([, k]) => k.enumerable).map(([name, k]) => [name, k.column]);
}

export type CachedReader = {
  /** Runs a read on the cached path; null when the statement is not one it takes (then use the client). */
  read(stmt: InStatement): ResultSet | null;
  close(): void;
};

/** A reader for the database file at `path`, opened on first use with the client's busy timeout. */
export function cachedReader(path: string, opts: { timeout?: number } = {}): CachedReader {
  let db: InstanceType<typeof Database> | null = null;
  const cache = new Map<string, Prepared>();

  const prepare = (sql: string): Prepared | null => {
    const hit = cache.get(sql);
    if (hit) {
      // keep the Map in use order: the first key is the least recently used
      cache.delete(sql);
      cache.set(sql, hit);
      return hit;
    }
    db ??= new Database(path, { timeout: opts.timeout });
    const stmt = db.prepare(sql);
    if (!stmt.reader) return null; // writes stay with the client (and its one-writer queue)
    stmt.raw(true);
    stmt.safeIntegers(true);
    const cols = stmt.columns();
    const columns = cols.map((c) => c.name);
    const prepared = { stmt, columns, columnTypes: cols.map((c) => c.type ?? ""), proto: rowPrototype(columns), named: enumerableKeys(columns) };
    cache.set(sql, prepared);
    if (cache.size > CACHED_STATEMENTS) cache.delete(cache.keys().next().value!);
    return prepared;
  };

  const close = () => {
    cache.clear();
    db?.close();
    db = null;
  };

  return {
    read(input) {
      const sql = typeof input === "string" ? input : input.sql;
      const prepared = prepare(sql);
      if (!prepared) return null;
      const { stmt, columns, columnTypes, proto, named } = prepared;
      let raw: unknown[][];
      try {
        raw = stmt.all(bindArgs(typeof input === "string" ? undefined : input.args)) as unknown[][];
      } catch (error) {
        // A statement stopped part-way could keep this connection's read snapshot open and later
        // reads would see old data: drop the connection and every statement, and start afresh.
        close();
        throw error;
      }
      const n = columns.length;
      const rows: Row[] = new Array(raw.length);
      for (let r = 0; r < raw.length; r++) {
        const values = raw[r];
        for (let i = 0; i < n; i++) values[i] = fromSql(values[i]);
        const row = Object.create(proto) as Record<string | symbol, unknown>;
        Object.defineProperty(row, RAW, { value: values });
        for (const [name, i] of named) {
          // an index, or `__proto__`, cannot be assigned past the prototype: define it
          if (name in proto || name === "__proto__") Object.defineProperty(row, name, { value: values[i], enumerable: true, configurable: true, writable: true });
          else row[name] = values[i];
        }
        rows[r] = row as unknown as Row;
      }
      return resultSet(columns, columnTypes, rows);
    },
    close,
  };
}

function resultSet(columns: string[], columnTypes: string[], rows: Row[]): ResultSet {
  return {
    columns,
    columnTypes,
    rows,
    rowsAffected: 0,
    lastInsertRowid: undefined,
    toJSON() {
      return { columns, columnTypes, rows: rows.map((row) => Array.prototype.slice.call(row)), rowsAffected: 0, lastInsertRowid: null };
    },
  };
}

/**
 * The client with its plain reads (`execute` of a SELECT outside a transaction) answered by a
 * cached reader. `ready` runs first (the file's WAL and foreign-key set-up); anything the reader
 * does not take, or fails on, goes to the client, so errors keep the client's types and messages.
 */
export function withCachedReads(client: Client, reader: CachedReader, isRead: (stmt: InStatement) => boolean, ready: () => Promise<void>): Client {
  return new Proxy(client, {
    get(target, property) {
      const value: unknown = Reflect.get(target, property, target);
      if (typeof value !== "function") return value;
      const fn = value as (...args: unknown[]) => unknown;
      if (property === "execute") {
        return async (stmtOrSql: InStatement, args?: InValue[]) => {
          const stmt: InStatement = typeof stmtOrSql === "string" && args ? { sql: stmtOrSql, args } : stmtOrSql;
          if (isRead(stmt)) {
            await ready();
            let result: ResultSet | null = null;
            try {
              result = reader.read(stmt);
            } catch {
              result = null; // let the client run it and report the error its own way
            }
            if (result) return result;
          }
          return fn.call(target, stmt);
        };
      }
      if (property === "close") {
        return () => {
          reader.close();
          return fn.call(target);
        };
      }
      return fn.bind(target);
    },
  });
}
