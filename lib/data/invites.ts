import "server-only";
import bcrypt from "bcryptjs";
import { and, count, eq, gt, isNull } from "drizzle-orm";
import { getDb } from "@/db";
import { authTokens, clients, companies, houses, jobs, users, type AuthTokenPurpose } from "@/db/schema";
import { ApiError, notFound } from "@/lib/api/errors";
import { clearFailures } from "@/lib/auth/limiter";
import { checkAuthToken, consumeAuthToken, createAuthToken, retireAuthTokens, tokenLifetimeMs } from "@/lib/auth/tokens";
import type { AuthUser } from "@/lib/authz/guard";
import { inviteMail, queueMail, signInLinkMail } from "@/lib/mail";
import { logActivity } from "./activity";
import { jobScope } from "./scope";

const TAKEN = "That e-mail address already belongs to another account. Use a different address for the homeowner.";

/** The homeowner account of a job's client: the linked one, or a new one (no password yet). */
async function homeownerAccount(user: AuthUser, client: typeof clients.$inferSelect, email?: string) {
  const db = getDb();
  if (client.userId) {
    const [account] = await db.select().from(users).where(eq(users.id, client.userId));
    if (account) {
      if (email && email !== account.email) throw new ApiError(422, "Some fields need attention.", { email: [`This homeowner already has an account under ${account.email}; the invitation goes there.`] });
      if (account.disabled) throw new ApiError(409, "This homeowner's account is disabled, so it cannot be invited.");
      return { account, created: false };
    }
  }
  const address = email ?? client.email?.trim().toLowerCase();
  if (!address) throw new ApiError(422, "Some fields need attention.", { email: ["Enter the homeowner's e-mail address: the client record has none."] });
  const [inserted] = await db
    .insert(users)
    .values({ companyId: user.companyId, email: address, name: client.name, role: "homeowner", passwordHash: null })
    .onConflictDoNothing({ target: users.email })
    .returning();
  const [account] = inserted ? [inserted] : await db.select().from(users).where(eq(users.email, address));
  // An existing account is reused only when it is a homeowner of this company (one person, two houses).
  if (!account || account.companyId !== user.companyId || account.role !== "homeowner") throw new ApiError(409, TAKEN, { email: [TAKEN] });
  if (account.disabled) throw new ApiError(409, "This homeowner's account is disabled, so it cannot be invited.");
  await db.update(clients).set({ userId: account.id, email: client.email ?? address }).where(and(eq(clients.id, client.id), isNull(clients.userId)));
  return { account, created: Boolean(inserted) };
}

/** Staff invite the homeowner of a job they can see: a 7-day, single-use set-password link by e-mail. */
export async function inviteHomeowner(user: AuthUser, jobId: string, input: { email?: string }, origin: string) {
  const db = getDb();
  const [row] = await db
    .select({ client: clients, street: houses.street, company: companies })
    .from(jobs)
    .innerJoin(clients, eq(clients.id, jobs.clientId))
    .innerJoin(houses, eq(houses.id, jobs.houseId))
    .innerJoin(companies, eq(companies.id, jobs.companyId))
    .where(and(eq(jobs.id, jobId), jobScope(db, user)));
  if (!row) throw notFound("Job");
  const { account, created } = await homeownerAccount(user, row.client, input.email);

  await retireAuthTokens(db, account.id, "invite");
  const { token, expiresAt } = await createAuthToken(db, account.id, "invite");
  const days = tokenLifetimeMs.invite / 86_400_000;
  const message = inviteMail({ homeownerName: account.name, company: row.company, street: row.street, link: `${origin}/welcome/${token}`, days });
  const mail = await queueMail({ ...message, to: account.email, kind: "invite", companyId: user.companyId, relatedJobId: jobId });
  await logActivity(db, { companyId: user.companyId, userId: user.id, action: "homeowner.invite", entityType: "client", entityId: row.client.id, detail: { jobId, to: account.email, created, outboxId: mail.id } });
  return { to: account.email, userId: account.id, created, expiresAt: expiresAt.getTime(), mail: { id: mail.id, status: mail.status, attempts: mail.attempts, lastError: mail.lastError } };
}

export type LinkState = { status: "valid"; name: string; email: string; companyName: string } | { status: "unknown" | "expired" | "used" | "disabled" };

/** What a welcome link would do, without using it up. */
export async function linkState(raw: string, purpose: AuthTokenPurpose): Promise<LinkState> {
  const db = getDb();
  const check = await checkAuthToken(db, raw, purpose);
  if (check.status !== "valid") return { status: check.status };
  const [company] = await db.select({ name: companies.name }).from(companies).where(eq(companies.id, check.user.companyId));
  return { status: "valid", name: check.user.name, email: check.user.email, companyName: company?.name ?? "" };
}

/** Uses the invitation: sets the password. Null when the link is unknown, used, expired or the account disabled. */
export async function acceptInvite(raw: string, password: string, ip: string | null) {
  const db = getDb();
  const passwordHash = await bcrypt.hash(password, 10);
  const user = await db.transaction(async (tx) => {
    const u = await consumeAuthToken(tx, raw, "invite");
    if (u) await tx.update(users).set({ passwordHash }).where(eq(users.id, u.id));
    return u;
  });
  if (!user) return null;
  await clearFailures(db, user.email);
  await logActivity(db, { companyId: user.companyId, userId: user.id, action: "password.set", entityType: "user", entityId: user.id, detail: { via: "invite" }, ip });
  return { email: user.email, role: user.role };
}

const MAX_LINKS_PER_WINDOW = 3;

/**
 * A homeowner asks for a one-time sign-in link. The answer never says whether the address has an
 * account, and the mail is sent in the background so the timing does not say it either.
 */
export async function requestSignInLink(email: string, origin: string, ip: string | null): Promise<void> {
  const db = getDb();
  const [user] = await db.select().from(users).where(eq(users.email, email));
  if (!user || user.disabled || user.role !== "homeowner") return;
  const since = new Date(Date.now() - tokenLifetimeMs["sign-in"]);
  const [{ recent }] = await db
    .select({ recent: count() })
    .from(authTokens)
    .where(and(eq(authTokens.userId, user.id), eq(authTokens.purpose, "sign-in"), gt(authTokens.createdAt, since)));
  if (recent >= MAX_LINKS_PER_WINDOW) return;
  await retireAuthTokens(db, user.id, "sign-in");
  const { token } = await createAuthToken(db, user.id, "sign-in");
  const [company] = await db.select({ name: companies.name }).from(companies).where(eq(companies.id, user.companyId));
  const message = signInLinkMail({ name: user.name, companyName: company?.name ?? "Warmstead", link: `${origin}/welcome/link/${token}`, minutes: tokenLifetimeMs["sign-in"] / 60_000 });
  await queueMail({ ...message, to: user.email, kind: "sign-in-link", companyId: user.companyId }, { wait: false });
  await logActivity(db, { companyId: user.companyId, userId: user.id, action: "sign-in-link.request", entityType: "user", entityId: user.id, ip });
}
