// Every e-mail is written to mail_outbox before it is sent, so none is lost: a failed send keeps
// its error and attempt count, is retried with backoff, and after the last attempt shows as failed.
import { and, asc, eq, isNull, lte, or } from "drizzle-orm";
import { getDb } from "@/db";
import { mailOutbox } from "@/db/schema";
import { getTransport } from "./transport";

export type OutboxRow = typeof mailOutbox.$inferSelect;

export type OutgoingMail = {
  to: string;
  subject: string;
  text: string;
  html?: string | null;
  /** "invite", "sign-in-link", … — shown on the outbox page. */
  kind: string;
  companyId?: string | null;
  relatedJobId?: string | null;
};

export const mailRetryPolicy = {
  maxAttempts: 5,
  /** Wait after the 1st, 2nd, 3rd and 4th failed attempt. */
  delaysMs: [30_000, 2 * 60_000, 10 * 60_000, 30 * 60_000],
  /** A send in progress holds its row this long, so two workers never send the same message. */
  leaseMs: 2 * 60_000,
  batch: 20,
};

/** Kinds whose body carries a one-time link: the link is blanked in the stored copy once sent. */
const SECRET_KINDS = new Set(["invite", "sign-in-link"]);
const TOKEN_IN_TEXT = /(?<=\/)[A-Za-z0-9_-]{43}(?![A-Za-z0-9_-])/g;
export const REDACTED = "[link removed after sending]";
const redact = (s: string | null) => s?.replace(TOKEN_IN_TEXT, REDACTED) ?? null;

export function nextDelayMs(attempts: number): number | null {
  if (attempts >= mailRetryPolicy.maxAttempts) return null;
  return mailRetryPolicy.delaysMs[Math.min(attempts, mailRetryPolicy.delaysMs.length) - 1] ?? mailRetryPolicy.delaysMs.at(-1)!;
}

/** Takes the row for one attempt if it is due and nobody else holds it. */
async function claim(id: string, now: Date, force: boolean): Promise<OutboxRow | null> {
  const due = force ? eq(mailOutbox.status, "failed") : and(eq(mailOutbox.status, "queued"), or(isNull(mailOutbox.nextAttemptAt), lte(mailOutbox.nextAttemptAt, now)));
  const [row] = await getDb()
    .update(mailOutbox)
    .set({ status: "queued", nextAttemptAt: new Date(now.getTime() + mailRetryPolicy.leaseMs) })
    .where(and(eq(mailOutbox.id, id), due))
    .returning();
  return row ?? null;
}

/** One attempt at one message. `force` lets "retry now" take a failed message for one more try. */
export async function attemptSend(id: string, opts: { now?: Date; force?: boolean } = {}): Promise<OutboxRow | null> {
  const now = opts.now ?? new Date();
  const row = await claim(id, now, opts.force ?? false);
  if (!row) return null;
  const attempts = row.attempts + 1;
  try {
    const { transport, from } = getTransport();
    await transport.sendMail({ from, to: row.to, subject: row.subject, text: row.text, html: row.html ?? undefined });
    const secret = SECRET_KINDS.has(row.kind);
    const [sent] = await getDb()
      .update(mailOutbox)
      .set({ status: "sent", attempts, sentAt: new Date(), lastError: null, nextAttemptAt: null, ...(secret ? { text: redact(row.text)!, html: redact(row.html) } : {}) })
      .where(eq(mailOutbox.id, id))
      .returning();
    return sent;
  } catch (err) {
    const delay = opts.force ? null : nextDelayMs(attempts);
    const lastError = (err instanceof Error ? err.message : String(err)).slice(0, 500);
    console.warn(`mail ${id} to ${row.to}: attempt ${attempts} failed: ${lastError}`);
    const [failed] = await getDb()
      .update(mailOutbox)
      .set({ attempts, lastError, status: delay === null ? "failed" : "queued", nextAttemptAt: delay === null ? null : new Date(now.getTime() + delay) })
      .where(eq(mailOutbox.id, id))
      .returning();
    return failed;
  }
}

/** Resends every queued message whose time has come. Safe to run from several places at once. */
export async function retryDueMail(now = new Date()): Promise<{ tried: number; sent: number }> {
  const due = await getDb()
    .select({ id: mailOutbox.id })
    .from(mailOutbox)
    .where(and(eq(mailOutbox.status, "queued"), lte(mailOutbox.nextAttemptAt, now)))
    .orderBy(asc(mailOutbox.nextAttemptAt))
    .limit(mailRetryPolicy.batch);
  let sent = 0;
  for (const { id } of due) if ((await attemptSend(id, { now }))?.status === "sent") sent++;
  return { tried: due.length, sent };
}

/**
 * Records the message (status queued), then sends it. `wait: false` answers as soon as the row
 * is written and sends in the background (the sign-in-link request must not reveal by its timing
 * whether an address has an account). Each call also picks up other messages that are due.
 */
export async function queueMail(mail: OutgoingMail, opts: { wait?: boolean } = {}): Promise<OutboxRow> {
  ensureMailRetryLoop();
  const now = new Date();
  const [row] = await getDb()
    .insert(mailOutbox)
    .values({ ...mail, html: mail.html ?? null, companyId: mail.companyId ?? null, relatedJobId: mail.relatedJobId ?? null, status: "queued", nextAttemptAt: now, createdAt: now })
    .returning();
  const work = attemptSend(row.id, { now }).finally(() => void retryDueMail().catch(logLoopError));
  if (opts.wait === false) {
    work.catch(logLoopError);
    return row;
  }
  return (await work) ?? row;
}

const logLoopError = (err: unknown) => console.error("mail retry:", err);

const loop = globalThis as typeof globalThis & { __warmsteadMailLoop?: ReturnType<typeof setInterval> };

/**
 * The background retry: every MAIL_RETRY_INTERVAL_MS (default 30 s; "0" turns it off) in the
 * server process, started on first use of the mail module (a send, the outbox page, a welcome
 * page). Never during `next build`.
 */
export function ensureMailRetryLoop() {
  if (loop.__warmsteadMailLoop || process.env.NEXT_PHASE === "phase-production-build") return;
  const every = Number(process.env.MAIL_RETRY_INTERVAL_MS ?? 30_000);
  if (!Number.isFinite(every) || every <= 0) return;
  loop.__warmsteadMailLoop = setInterval(() => void retryDueMail().catch(logLoopError), every);
  loop.__warmsteadMailLoop.unref?.();
}
