import "server-only";
import { and, asc, desc, eq, ne } from "drizzle-orm";
import { getDb, type Db } from "@/db";
import { companies, priceBookItems, type PriceBookKind, type PriceBookUnit } from "@/db/schema";
import { ApiError, notFound } from "@/lib/api/errors";
import type { AuthUser } from "@/lib/authz/guard";
import type { NewPriceBookItemInput, PriceBookPatch, PriceBookQuery } from "@/lib/validation/price-book";
import { logActivity } from "./activity";

// The price book belongs to a company, not to a job, so its scope is the user's company: every
// query below carries `companyId = user.companyId`, and an item of another company answers 404.
// Items are never deleted: deactivating one hides it from new work while proposals that already
// priced a line with it keep their reference.

/** An item as the API sends it: money in integer cents, timestamps in milliseconds. */
export type PriceBookItem = {
  id: string;
  code: string;
  name: string;
  description: string | null;
  kind: PriceBookKind;
  unit: PriceBookUnit;
  unitPriceCents: number;
  taxable: boolean;
  active: boolean;
  createdAt: number;
  updatedAt: number;
};

type Row = typeof priceBookItems.$inferSelect;

function toItem(row: Row): PriceBookItem {
  return {
    id: row.id,
    code: row.code,
    name: row.name,
    description: row.description,
    kind: row.kind,
    unit: row.unit,
    unitPriceCents: row.unitPriceCents,
    taxable: row.taxable,
    active: row.active,
    createdAt: row.createdAt.getTime(),
    updatedAt: row.updatedAt.getTime(),
  };
}

const inCompany = (user: AuthUser) => eq(priceBookItems.companyId, user.companyId);

export async function listPriceBook(user: AuthUser, query: PriceBookQuery = { active: "all" }): Promise<PriceBookItem[]> {
  const conditions = [inCompany(user)];
  if (query.active !== "all") conditions.push(eq(priceBookItems.active, query.active === "true"));
  const rows = await getDb()
    .select()
    .from(priceBookItems)
    .where(and(...conditions))
    .orderBy(desc(priceBookItems.active), asc(priceBookItems.code));
  return rows.map(toItem);
}

async function findRow(db: Db, user: AuthUser, id: string): Promise<Row | undefined> {
  const [row] = await db.select().from(priceBookItems).where(and(eq(priceBookItems.id, id), inCompany(user)));
  return row;
}

export async function getPriceBookItem(user: AuthUser, id: string): Promise<PriceBookItem | null> {
  const row = await findRow(getDb(), user, id);
  return row ? toItem(row) : null;
}

function duplicateCode(code: string, holder?: string) {
  const message = holder ? `Code ${code} is already used by “${holder}”. Choose another code.` : `Code ${code} is already used in your price book. Choose another code.`;
  return new ApiError(409, "Another item already has that code.", { code: [message] });
}

async function assertCodeFree(db: Db, user: AuthUser, code: string, exceptId?: string) {
  const conditions = [inCompany(user), eq(priceBookItems.code, code)];
  if (exceptId) conditions.push(ne(priceBookItems.id, exceptId));
  const [taken] = await db.select({ name: priceBookItems.name }).from(priceBookItems).where(and(...conditions));
  if (taken) throw duplicateCode(code, taken.name);
}

/** Two requests racing past the check above still meet the unique index; answer that as the same 409. */
function isUniqueViolation(err: unknown): boolean {
  for (let e: unknown = err; e instanceof Error; e = (e as { cause?: unknown }).cause) {
    if (/UNIQUE constraint failed/i.test(e.message) || (e as { code?: string }).code === "SQLITE_CONSTRAINT_UNIQUE") return true;
  }
  return false;
}

export async function createPriceBookItem(user: AuthUser, input: NewPriceBookItemInput): Promise<PriceBookItem> {
  const db = getDb();
  await assertCodeFree(db, user, input.code);
  let row: Row;
  try {
    [row] = await db
      .insert(priceBookItems)
      .values({
        companyId: user.companyId,
        code: input.code,
        name: input.name,
        description: input.description,
        kind: input.kind,
        unit: input.unit,
        unitPriceCents: input.unitPriceCents,
        taxable: input.taxable,
        active: true,
      })
      .returning();
  } catch (err) {
    if (isUniqueViolation(err)) throw duplicateCode(input.code);
    throw err;
  }
  await logActivity(db, {
    companyId: user.companyId,
    userId: user.id,
    action: "pricebook.create",
    entityType: "price_book_item",
    entityId: row.id,
    detail: { code: row.code, unitPriceCents: row.unitPriceCents, unit: row.unit },
  });
  return toItem(row);
}

const editable = ["code", "name", "description", "kind", "unit", "unitPriceCents", "taxable", "active"] as const;

/**
 * Applies a patch to one item of the user's company. With `updatedAt`, the change applies only if
 * the item has not changed since; a stale edit gets 409 with `current`, the item as it is now.
 */
export async function updatePriceBookItem(user: AuthUser, id: string, patch: PriceBookPatch): Promise<PriceBookItem> {
  const db = getDb();
  const current = await findRow(db, user, id);
  if (!current) throw notFound("Price book item");
  const stale = () =>
    new ApiError(409, "Someone else changed this item since you opened it. Review the current version and apply your change again.", undefined, {
      current: toItem(current),
    });
  if (patch.updatedAt !== undefined && patch.updatedAt !== current.updatedAt.getTime()) throw stale();
  if (patch.code !== undefined && patch.code !== current.code) await assertCodeFree(db, user, patch.code, id);

  const changes: Record<string, { from: unknown; to: unknown }> = {};
  const set: Partial<typeof priceBookItems.$inferInsert> = {};
  for (const key of editable) {
    const value = patch[key];
    if (value === undefined || value === current[key]) continue;
    changes[key] = { from: current[key], to: value };
    Object.assign(set, { [key]: value });
  }
  if (Object.keys(changes).length === 0) return toItem(current);

  // Milliseconds can repeat: the new stamp is always later than the one the editor saw.
  set.updatedAt = new Date(Math.max(Date.now(), current.updatedAt.getTime() + 1));
  let rows: Row[];
  try {
    rows = await db
      .update(priceBookItems)
      .set(set)
      .where(and(eq(priceBookItems.id, id), inCompany(user), eq(priceBookItems.updatedAt, current.updatedAt)))
      .returning();
  } catch (err) {
    if (isUniqueViolation(err)) throw duplicateCode(patch.code ?? current.code);
    throw err;
  }
  if (rows.length === 0) {
    // Changed between our read and our write: answer with what is there now.
    const now = await findRow(db, user, id);
    if (!now) throw notFound("Price book item");
    throw new ApiError(409, "Someone else changed this item since you opened it. Review the current version and apply your change again.", undefined, { current: toItem(now) });
  }
  const row = rows[0]!;
  const onlyActive = Object.keys(changes).length === 1 && "active" in changes;
  await logActivity(db, {
    companyId: user.companyId,
    userId: user.id,
    action: onlyActive ? (row.active ? "pricebook.reactivate" : "pricebook.deactivate") : "pricebook.update",
    entityType: "price_book_item",
    entityId: id,
    detail: { code: row.code, changes },
  });
  return toItem(row);
}

/** The company's sales tax rate, in parts per million (6.625 % is 66 250). */
export async function getTaxRate(user: AuthUser): Promise<{ taxRatePpm: number }> {
  const [row] = await getDb().select({ taxRatePpm: companies.taxRatePpm }).from(companies).where(eq(companies.id, user.companyId));
  if (!row) throw notFound("Company");
  return row;
}

/** Sets the rate new proposals are taxed at; issued proposals keep the rate they were issued with. */
export async function setTaxRate(user: AuthUser, taxRatePpm: number): Promise<{ taxRatePpm: number }> {
  const db = getDb();
  const before = await getTaxRate(user);
  if (before.taxRatePpm === taxRatePpm) return before;
  await db.update(companies).set({ taxRatePpm, updatedAt: new Date() }).where(eq(companies.id, user.companyId));
  await logActivity(db, { companyId: user.companyId, userId: user.id, action: "company.tax-rate", entityType: "company", entityId: user.companyId, detail: { from: before.taxRatePpm, to: taxRatePpm } });
  return { taxRatePpm };
}
