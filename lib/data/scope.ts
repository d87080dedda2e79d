import { and, eq, exists, sql, type Placeholder, type SQL } from "drizzle-orm";
import type { Db } from "@/db";
import { clients, jobCrew, jobs } from "@/db/schema";
import type { AuthUser } from "@/lib/authz/guard";
import type { RoleName } from "@/lib/authz/permissions";

type Value = string | Placeholder;

/** The rule itself, for given values or placeholders. */
function scopeFor(db: Db, role: RoleName, companyId: Value, userId: Value): SQL {
  const company = eq(jobs.companyId, companyId);
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
export function jobScopePrepared(db: Db, role: RoleName): SQL {
  return scopeFor(db, role, sql.placeholder("scopeCompanyId"), sql.placeholder("scopeUserId"));
}

export const scopeParams = (user: AuthUser) => ({ scopeCompanyId: user.companyId, scopeUserId: user.id });
