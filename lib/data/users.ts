import "server-only";
import bcrypt from "bcryptjs";
import { and, asc, count, eq, ne } from "drizzle-orm";
import { getDb } from "@/db";
import { users } from "@/db/schema";
import { ApiError, notFound } from "@/lib/api/errors";
import type { AuthUser } from "@/lib/authz/guard";
import type { RoleName } from "@/lib/authz/permissions";
import { logActivity } from "./activity";

export async function listCompanyUsers(user: AuthUser) {
  return getDb()
    .select({ id: users.id, name: users.name, email: users.email, role: users.role, disabled: users.disabled, lastSignInAt: users.lastSignInAt })
    .from(users)
    .where(eq(users.companyId, user.companyId))
    .orderBy(asc(users.role), asc(users.name));
}

export async function listStaff(user: AuthUser, role: "auditor" | "installer") {
  return getDb()
    .select({ id: users.id, name: users.name })
    .from(users)
    .where(and(eq(users.companyId, user.companyId), eq(users.role, role), eq(users.disabled, false)))
    .orderBy(asc(users.name));
}

export async function addUser(owner: AuthUser, input: { name: string; email: string; role: RoleName; password: string }) {
  const db = getDb();
  const [taken] = await db.select({ id: users.id }).from(users).where(eq(users.email, input.email));
  if (taken) throw new ApiError(409, "That e-mail already has an account.", { email: ["That e-mail already has an account."] });
  const passwordHash = await bcrypt.hash(input.password, 10);
  const [row] = await db.insert(users).values({ companyId: owner.companyId, name: input.name, email: input.email, role: input.role, passwordHash }).returning({ id: users.id });
  await logActivity(db, { companyId: owner.companyId, userId: owner.id, action: "user.create", entityType: "user", entityId: row.id, detail: { role: input.role } });
  return row.id;
}

async function companyUser(owner: AuthUser, userId: string) {
  const [row] = await getDb().select().from(users).where(and(eq(users.id, userId), eq(users.companyId, owner.companyId)));
  if (!row) throw notFound("User");
  return row;
}

/** The company must always keep one active owner, so nobody can lock the office out. */
async function assertAnotherOwner(owner: AuthUser, exceptId: string) {
  const [{ n }] = await getDb()
    .select({ n: count() })
    .from(users)
    .where(and(eq(users.companyId, owner.companyId), eq(users.role, "owner"), eq(users.disabled, false), ne(users.id, exceptId)));
  if (n === 0) throw new ApiError(409, "The company needs at least one active owner.");
}

export async function setUserRole(owner: AuthUser, userId: string, role: RoleName) {
  const target = await companyUser(owner, userId);
  if (target.role === "homeowner" || role === "homeowner") throw new ApiError(422, "Homeowner accounts are linked to a client and cannot change role.", { role: ["Choose a staff role."] });
  if (target.role === "owner" && role !== "owner") await assertAnotherOwner(owner, userId);
  await getDb().update(users).set({ role }).where(eq(users.id, userId));
  await logActivity(getDb(), { companyId: owner.companyId, userId: owner.id, action: "user.role", entityType: "user", entityId: userId, detail: { from: target.role, to: role } });
}

export async function setUserDisabled(owner: AuthUser, userId: string, disabled: boolean) {
  const target = await companyUser(owner, userId);
  if (disabled && target.id === owner.id) throw new ApiError(409, "You cannot disable your own account.");
  if (disabled && target.role === "owner") await assertAnotherOwner(owner, userId);
  await getDb().update(users).set({ disabled }).where(eq(users.id, userId));
  await logActivity(getDb(), { companyId: owner.companyId, userId: owner.id, action: disabled ? "user.disable" : "user.enable", entityType: "user", entityId: userId });
}
