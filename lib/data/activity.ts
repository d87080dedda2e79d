import { desc, eq } from "drizzle-orm";
import type { Db } from "@/db";
import { activityLog, users } from "@/db/schema";

export type ActivityEntry = {
  companyId: string | null;
  userId: string | null;
  action: string;
  entityType: string;
  entityId: string | null;
  detail?: Record<string, unknown>;
  ip?: string | null;
};

/** The activity log: sign-ins, failed sign-ins and every change, with who and when. */
export async function logActivity(db: Db, entry: ActivityEntry) {
  await db.insert(activityLog).values({ ...entry, detail: entry.detail ?? {}, ip: entry.ip ?? null });
}

export async function listActivity(db: Db, companyId: string, limit = 100) {
  return db
    .select({ id: activityLog.id, action: activityLog.action, entityType: activityLog.entityType, entityId: activityLog.entityId, at: activityLog.at, ip: activityLog.ip, detail: activityLog.detail, userName: users.name })
    .from(activityLog)
    .leftJoin(users, eq(users.id, activityLog.userId))
    .where(eq(activityLog.companyId, companyId))
    .orderBy(desc(activityLog.at))
    .limit(limit);
}
