import { eq, inArray } from "drizzle-orm";
import type { Db } from "@/db";
import { signInAttempts } from "@/db/schema";

// The failure that reaches `freeFailures` inside the window locks; each further one doubles the lock.
// Values are ours (common practice for login throttling), chosen to stop guessing without locking out a typo.
export const limiterPolicy = {
  freeFailures: 5,
  windowMs: 15 * 60_000,
  firstLockMs: 30_000,
  maxLockMs: 15 * 60_000,
};

export type LimitKeys = { email: string; ip: string | null };
const keysOf = ({ email, ip }: LimitKeys) => [`email:${email.toLowerCase()}`, ...(ip ? [`ip:${ip}`] : [])];

/** Seconds until another attempt is allowed for this e-mail or address; 0 when not locked. */
export async function retryAfterSeconds(db: Db, keys: LimitKeys, now = Date.now()): Promise<number> {
  const rows = await db.select().from(signInAttempts).where(inArray(signInAttempts.key, keysOf(keys)));
  const until = Math.max(0, ...rows.map((r) => r.lockedUntil?.getTime() ?? 0));
  return until > now ? Math.ceil((until - now) / 1000) : 0;
}

export async function recordFailure(db: Db, keys: LimitKeys, now = Date.now()) {
  for (const key of keysOf(keys)) {
    const [row] = await db.select().from(signInAttempts).where(eq(signInAttempts.key, key));
    const fresh = !row || now - row.firstFailureAt.getTime() > limiterPolicy.windowMs;
    const failures = fresh ? 1 : row.failures + 1;
    const over = failures - limiterPolicy.freeFailures + 1; // the fifth failure starts the first lock
    const lockMs = over > 0 ? Math.min(limiterPolicy.firstLockMs * 2 ** (over - 1), limiterPolicy.maxLockMs) : 0;
    const values = {
      key,
      failures,
      firstFailureAt: fresh ? new Date(now) : row.firstFailureAt,
      lockedUntil: lockMs ? new Date(now + lockMs) : null,
    };
    await db.insert(signInAttempts).values(values).onConflictDoUpdate({ target: signInAttempts.key, set: values });
  }
}

export async function clearFailures(db: Db, email: string) {
  await db.delete(signInAttempts).where(eq(signInAttempts.key, `email:${email.toLowerCase()}`));
}
