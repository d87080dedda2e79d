// One-time links: invitations (set a password) and e-mailed sign-in links. The raw token travels
// only in the e-mail; the database keeps its SHA-256, so a copy of the database opens no account.
import { createHash, randomBytes } from "node:crypto";
import { and, eq, gt, isNull } from "drizzle-orm";
import type { Db } from "@/db";
import { authTokens, users, type AuthTokenPurpose } from "@/db/schema";
import { logActivity } from "@/lib/data/activity";

export const tokenLifetimeMs: Record<AuthTokenPurpose, number> = {
  invite: 7 * 24 * 60 * 60_000,
  "sign-in": 15 * 60_000,
  reset: 60 * 60_000,
};

/** 32 random bytes in base64url are always 43 characters of this alphabet. */
export const TOKEN_PATTERN = /^[A-Za-z0-9_-]{43}$/;

export const hashToken = (raw: string) => createHash("sha256").update(raw).digest("hex");

export async function createAuthToken(db: Db, userId: string, purpose: AuthTokenPurpose, now = new Date()): Promise<{ token: string; expiresAt: Date }> {
  const token = randomBytes(32).toString("base64url");
  const expiresAt = new Date(now.getTime() + tokenLifetimeMs[purpose]);
  await db.insert(authTokens).values({ userId, purpose, tokenHash: hashToken(token), expiresAt, createdAt: now });
  return { token, expiresAt };
}

export type TokenUser = typeof users.$inferSelect;
export type TokenCheck = { status: "valid"; user: TokenUser; expiresAt: Date } | { status: "unknown" | "expired" | "used" | "disabled" };

/** What a link would do, without using it up (the welcome pages show a form or a clear reason). */
export async function checkAuthToken(db: Db, raw: string, purpose: AuthTokenPurpose, now = new Date()): Promise<TokenCheck> {
  if (!TOKEN_PATTERN.test(raw)) return { status: "unknown" };
  const [row] = await db
    .select({ token: authTokens, user: users })
    .from(authTokens)
    .innerJoin(users, eq(users.id, authTokens.userId))
    .where(and(eq(authTokens.tokenHash, hashToken(raw)), eq(authTokens.purpose, purpose)));
  if (!row) return { status: "unknown" };
  if (row.token.usedAt) return { status: "used" };
  if (row.token.expiresAt.getTime() <= now.getTime()) return { status: "expired" };
  if (row.user.disabled) return { status: "disabled" };
  return { status: "valid", user: row.user, expiresAt: row.token.expiresAt };
}

type Runner = Pick<Db, "update" | "select">;

/**
 * Uses a token up, atomically: of two simultaneous requests with the same link only one gets the
 * user back. Returns null for an unknown, used, expired or wrong-purpose token, or a disabled user.
 */
export async function consumeAuthToken(db: Runner, raw: string, purpose: AuthTokenPurpose, now = new Date()): Promise<TokenUser | null> {
  if (!TOKEN_PATTERN.test(raw)) return null;
  const [used] = await db
    .update(authTokens)
    .set({ usedAt: now })
    .where(and(eq(authTokens.tokenHash, hashToken(raw)), eq(authTokens.purpose, purpose), isNull(authTokens.usedAt), gt(authTokens.expiresAt, now)))
    .returning({ userId: authTokens.userId });
  if (!used) return null;
  const [user] = await db.select().from(users).where(eq(users.id, used.userId));
  return user && !user.disabled ? user : null;
}

/** Older unused links of the same kind stop working when a new one is sent. */
export async function retireAuthTokens(db: Db, userId: string, purpose: AuthTokenPurpose, now = new Date()) {
  await db
    .update(authTokens)
    .set({ usedAt: now })
    .where(and(eq(authTokens.userId, userId), eq(authTokens.purpose, purpose), isNull(authTokens.usedAt)));
}

/** The token provider's check: uses up a sign-in link and records the sign-in, or returns null. */
export async function verifySignInToken(db: Db, raw: string, ip: string | null, now = new Date()): Promise<TokenUser | null> {
  const user = await consumeAuthToken(db, raw, "sign-in", now);
  if (!user) {
    await logActivity(db, { companyId: null, userId: null, action: "sign-in-failed", entityType: "user", entityId: null, detail: { via: "link" }, ip });
    return null;
  }
  await db.update(users).set({ lastSignInAt: now }).where(eq(users.id, user.id));
  await logActivity(db, { companyId: user.companyId, userId: user.id, action: "sign-in", entityType: "user", entityId: user.id, detail: { via: "link" }, ip });
  return user;
}
