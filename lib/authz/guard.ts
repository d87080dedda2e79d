import "server-only";
import { eq, sql } from "drizzle-orm";
import type { NextRequest } from "next/server";
import { getDb, type Db } from "@/db";
import { users } from "@/db/schema";
import { ApiError, forbidden, unauthorized } from "@/lib/api/errors";
import { errorResponse } from "@/lib/api/respond";
import { sessionUserId } from "@/lib/auth";
import { can, type Permission, type RoleName } from "./permissions";

export type AuthUser = {
  id: string;
  companyId: string;
  role: RoleName;
  name: string;
  email: string;
  unitSystem: "ip" | "si";
};

const buildUserById = (db: Db) =>
  db
    .select({ id: users.id, companyId: users.companyId, role: users.role, name: users.name, email: users.email, unitSystem: users.unitSystem, disabled: users.disabled })
    .from(users).where(eq(users.id, sql.placeholder("id"))).prepare();
// Prepared once per database: this runs on every request.
const userStatements = new WeakMap<Db, ReturnType<typeof buildUserById>>();
function userById(db: Db) {
  let st = userStatements.get(db);
  if (!st) userStatements.set(db, (st = buildUserById(db)));
  return st;
}

/**
 * The signed-in user, read fresh from the database on every request: a disabled account or a
 * changed role takes effect on the next request, whatever the session cookie still says.
 */
export async function getSessionUser(): Promise<AuthUser | null> {
  const id = await sessionUserId();
  if (!id) return null;
  const [row] = await userById(getDb()).execute({ id });
  if (!row || row.disabled) return null;
  return { id: row.id, companyId: row.companyId, role: row.role, name: row.name, email: row.email, unitSystem: row.unitSystem };
}

export async function requireUser(permission?: Permission): Promise<AuthUser> {
  const user = await getSessionUser();
  if (!user) throw unauthorized();
  if (permission && !can(user.role, permission)) throw forbidden();
  return user;
}

const MUTATING = new Set(["POST", "PUT", "PATCH", "DELETE"]);

/** Refuses a data-changing request sent from another site (a browser always names its Origin). */
export function assertSameOrigin(req: Request) {
  if (!MUTATING.has(req.method)) return;
  const origin = req.headers.get("origin");
  if (!origin) return;
  const host = req.headers.get("x-forwarded-host") ?? req.headers.get("host");
  let originHost: string | null = null;
  try {
    originHost = new URL(origin).host;
  } catch {
    // a malformed Origin is treated as foreign
  }
  if (!host || originHost !== host) throw new ApiError(403, "Cross-site request refused.");
}

type RouteCtx<P> = { params: Promise<P> };
type Handler<P> = (req: NextRequest, ctx: { user: AuthUser; params: P }) => Promise<Response>;

/** Every route handler goes through here: session, permission, origin; errors become JSON. */
export function withAuth<P = Record<string, never>>(handler: Handler<P>, opts: { permission: Permission }) {
  return async (req: NextRequest, ctx: RouteCtx<P>) => {
    try {
      assertSameOrigin(req);
      const user = await requireUser(opts.permission);
      return await handler(req, { user, params: await ctx.params });
    } catch (err) {
      return errorResponse(err);
    }
  };
}
