import bcrypt from "bcryptjs";
import { eq } from "drizzle-orm";
import { z } from "zod";
import type { Db } from "@/db";
import { users } from "@/db/schema";
import { logActivity } from "@/lib/data/activity";
import { clearFailures, recordFailure, retryAfterSeconds } from "./limiter";

export const signInSchema = z.object({
  email: z.string().trim().min(1, "Enter your e-mail address.").email("That does not look like an e-mail address."),
  password: z.string().min(1, "Enter your password."),
});

// Compared against when the e-mail is unknown, so a miss costs the same time as a wrong password.
const DUMMY_HASH = "$2b$10$fUGmxZaplmbiZTRkj/CfcenHWzCdn8Uz9OQ5GIdWWr4VGYUZ2ZnhW";

export type SignInResult =
  | { ok: true; user: typeof users.$inferSelect }
  | { ok: false; reason: "invalid" }
  | { ok: false; reason: "locked"; retryAfterSeconds: number };

export const SIGN_IN_INVALID = "That e-mail and password do not match an active account. Check both and try again.";
export const lockedMessage = (s: number) => `Too many failed attempts. Try again in ${s} second${s === 1 ? "" : "s"}.`;

export async function verifyCredentials(db: Db, input: { email: string; password: string; ip: string | null }): Promise<SignInResult> {
  const email = input.email.trim().toLowerCase();
  const keys = { email, ip: input.ip };
  const wait = await retryAfterSeconds(db, keys);
  if (wait > 0) return { ok: false, reason: "locked", retryAfterSeconds: wait };

  const [user] = await db.select().from(users).where(eq(users.email, email));
  const matches = await bcrypt.compare(input.password, user?.passwordHash ?? DUMMY_HASH);
  if (!user || !user.passwordHash || !matches || user.disabled) {
    await recordFailure(db, keys);
    await logActivity(db, { companyId: user?.companyId ?? null, userId: user?.id ?? null, action: "sign-in-failed", entityType: "user", entityId: user?.id ?? null, detail: { email }, ip: input.ip });
    const after = await retryAfterSeconds(db, keys);
    return after > 0 ? { ok: false, reason: "locked", retryAfterSeconds: after } : { ok: false, reason: "invalid" };
  }
  await clearFailures(db, email);
  await db.update(users).set({ lastSignInAt: new Date() }).where(eq(users.id, user.id));
  await logActivity(db, { companyId: user.companyId, userId: user.id, action: "sign-in", entityType: "user", entityId: user.id, ip: input.ip });
  return { ok: true, user };
}
