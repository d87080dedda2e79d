import { and, eq, exists, sql, type Placeholder, type SQL } from "drizzle-orm";
import type { Db } from "@/db";
import { clients, jobCrew, jobs } from "@/db/schema";
import type { AuthUser } from "@/lib/authz/guard";
import type { RoleName } from "@/lib/authz/permissions";

type Value = string | Placeholder;

/**
 * The rule itself, for given values or placeholders. `companyIndexed: false` writes the company
 * test so SQLite will not drive the query from the company index (`+company_id = ?`): for a
 * search whose few matches should drive it instead.
 */
function scopeFor(db: Db, role: RoleName, companyId: Value, userId: Value, companyIndexed = true): SQL {
  const company = companyIndexed ? eq(jobs.companyId, companyId) : sql`+${jobs.companyId} = ${companyId}`;
  switch (role) {
    case "owner":
    case "auditor":
      return company;
    case "installer":
      return and(company, exists(db.select({ one: sql`1` }).from(jobCrew).where(and(eq(jobCrew.jobId, jobs.id), eq(jobCrew.userId, userId)))))!;
    case "homeowner":
      return and(company, exists(db.select({ one: sql`1` }).from(clients).where(and(eq(clients.id, jobs.clientId), eq(clients.userId, userId)))))!;
  }
}

/**
 * Which jobs a user may see at all: their company's, and within it only assigned jobs for an
 * installer and their own house's jobs for a homeowner. Every job query is built on this.
 */
export function jobScope(db: Db, user: AuthUser): SQL {
  return scopeFor(db, user.role, user.companyId, user.id);
}

/**
 * The same rule with placeholders, for a prepared statement reused across requests: run it with
 * `scopeParams(user)`. The statement must be prepared per role (the rule's shape depends on it).
 */
export function jobScopePrepared(db: Db, role: RoleName, opts: { companyIndexed?: boolean } = {}): SQL {
  return scopeFor(db, role, sql.placeholder("scopeCompanyId"), sql.placeholder("scopeUserId"), opts.companyIndexed ?? true);
}

/** Whether the role sees every job of its company (so company-wide figures, such as job counts, are theirs). */
export const seesWholeCompany = (role: RoleName) => role === "owner" || role === "auditor";

export const scopeParams = (user: AuthUser) => ({ scopeCompanyId: user.companyId, scopeUserId: user.id });
