import { and, eq, exists, sql, type SQL } from "drizzle-orm";
import type { Db } from "@/db";
import { clients, jobCrew, jobs } from "@/db/schema";
import type { AuthUser } from "@/lib/authz/guard";

/**
 * Which jobs a user may see at all: their company's, and within it only assigned jobs for an
 * installer and their own house's jobs for a homeowner. Every job query is built on this.
 */
export function jobScope(db: Db, user: AuthUser): SQL {
  const company = eq(jobs.companyId, user.companyId);
  switch (user.role) {
    case "owner":
    case "auditor":
      return company;
    case "installer":
      return and(company, exists(db.select({ one: sql`1` }).from(jobCrew).where(and(eq(jobCrew.jobId, jobs.id), eq(jobCrew.userId, user.id)))))!;
    case "homeowner":
      return and(company, exists(db.select({ one: sql`1` }).from(clients).where(and(eq(clients.id, jobs.clientId), eq(clients.userId, user.id)))))!;
  }
}
