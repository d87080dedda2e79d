import "server-only";
import { and, desc, eq } from "drizzle-orm";
import { getDb } from "@/db";
import { mailOutbox, type MailStatus } from "@/db/schema";
import { ApiError, notFound } from "@/lib/api/errors";
import type { AuthUser } from "@/lib/authz/guard";
import { attemptSend, ensureMailRetryLoop } from "@/lib/mail";
import { logActivity } from "./activity";

export type OutboxEntry = {
  id: string;
  to: string;
  subject: string;
  kind: string;
  status: MailStatus;
  attempts: number;
  lastError: string | null;
  createdAt: number;
  sentAt: number | null;
  nextAttemptAt: number | null;
};

/** The company's mail, newest first. Bodies are not listed: they may carry a one-time link. */
export async function listOutbox(user: AuthUser, limit = 200): Promise<OutboxEntry[]> {
  ensureMailRetryLoop();
  const rows = await getDb()
    .select({
      id: mailOutbox.id,
      to: mailOutbox.to,
      subject: mailOutbox.subject,
      kind: mailOutbox.kind,
      status: mailOutbox.status,
      attempts: mailOutbox.attempts,
      lastError: mailOutbox.lastError,
      createdAt: mailOutbox.createdAt,
      sentAt: mailOutbox.sentAt,
      nextAttemptAt: mailOutbox.nextAttemptAt,
    })
    .from(mailOutbox)
    .where(eq(mailOutbox.companyId, user.companyId))
    .orderBy(desc(mailOutbox.createdAt))
    .limit(limit);
  return rows.map((r) => ({ ...r, createdAt: r.createdAt.getTime(), sentAt: r.sentAt?.getTime() ?? null, nextAttemptAt: r.nextAttemptAt?.getTime() ?? null }));
}

/** "Retry now" on a failed message of the user's company: one more attempt, at once. */
export async function retryMailNow(user: AuthUser, id: string) {
  const db = getDb();
  const [row] = await db.select({ status: mailOutbox.status }).from(mailOutbox).where(and(eq(mailOutbox.id, id), eq(mailOutbox.companyId, user.companyId)));
  if (!row) throw notFound("Message");
  if (row.status !== "failed") throw new ApiError(409, row.status === "sent" ? "That message was already sent." : "That message is still queued; it is retried automatically.");
  const after = await attemptSend(id, { force: true });
  if (!after) throw new ApiError(409, "That message is being sent right now.");
  await logActivity(db, { companyId: user.companyId, userId: user.id, action: "mail.retry", entityType: "mail", entityId: id, detail: { status: after.status } });
  return after;
}
