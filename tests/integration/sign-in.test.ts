import { eq } from "drizzle-orm";
import { describe, expect, it } from "vitest";
import { activityLog } from "@/db/schema";
import { demoPassword } from "@/db/seed";
import { SIGN_IN_INVALID, lockedMessage, verifyCredentials } from "@/lib/auth/credentials";
import { limiterPolicy, recordFailure, retryAfterSeconds } from "@/lib/auth/limiter";
import { disableUser, ids, seededDbForFile } from "./setup";

const ctx = seededDbForFile();

describe("signing in with e-mail and password", () => {
  it("accepts the right password, case-insensitive e-mail, and logs the sign-in", async () => {
    const r = await verifyCredentials(ctx.t.db, { email: " Auditor@KestrelBay.example ", password: demoPassword, ip: "127.0.0.9" });
    expect(r.ok).toBe(true);
    const log = await ctx.t.db.select().from(activityLog).where(eq(activityLog.action, "sign-in"));
    expect(log.some((l) => l.userId === ids.auditor && l.ip === "127.0.0.9")).toBe(true);
  });

  it("answers a wrong password and an unknown e-mail the same way", async () => {
    const wrong = await verifyCredentials(ctx.t.db, { email: "owner@kestrelbay.example", password: "nope", ip: "127.0.0.10" });
    const unknown = await verifyCredentials(ctx.t.db, { email: "nobody@kestrelbay.example", password: "nope", ip: "127.0.0.11" });
    expect(wrong).toEqual({ ok: false, reason: "invalid" });
    expect(unknown).toEqual({ ok: false, reason: "invalid" });
    const failed = await ctx.t.db.select().from(activityLog).where(eq(activityLog.action, "sign-in-failed"));
    expect(failed.length).toBeGreaterThanOrEqual(2);
  });

  it("refuses a disabled account even with the right password", async () => {
    await disableUser(ctx.t, ids.installer2);
    expect(await verifyCredentials(ctx.t.db, { email: "installer2@kestrelbay.example", password: demoPassword, ip: null })).toEqual({ ok: false, reason: "invalid" });
    await disableUser(ctx.t, ids.installer2, false);
  });

  it("slows repeated failures for one account, then says how long to wait", async () => {
    const email = "homeowner3@kestrelbay.example";
    for (let i = 0; i < limiterPolicy.freeFailures - 1; i++) {
      expect((await verifyCredentials(ctx.t.db, { email, password: `guess${i}`, ip: `10.9.0.${i}` })).ok).toBe(false);
    }
    const locked = await verifyCredentials(ctx.t.db, { email, password: "guess-last", ip: "10.9.0.99" });
    expect(locked).toMatchObject({ ok: false, reason: "locked" });
    const wait = (locked as { retryAfterSeconds: number }).retryAfterSeconds;
    expect(wait).toBe(limiterPolicy.firstLockMs / 1000);
    // Even the right password waits until the lock ends.
    expect(await verifyCredentials(ctx.t.db, { email, password: demoPassword, ip: "10.9.0.100" })).toMatchObject({ reason: "locked" });
    expect(lockedMessage(wait)).toBe("Too many failed attempts. Try again in 30 seconds.");
    expect(SIGN_IN_INVALID).not.toMatch(/exist|unknown|no account/i);
  });

  it("slows one address trying many accounts, and doubles each further lock", async () => {
    const ip = "10.77.0.1";
    const now = Date.now();
    for (let i = 0; i < limiterPolicy.freeFailures; i++) await recordFailure(ctx.t.db, { email: `x${i}@spray.example`, ip }, now);
    expect(await retryAfterSeconds(ctx.t.db, { email: "fresh@spray.example", ip }, now)).toBe(30);
    await recordFailure(ctx.t.db, { email: "again@spray.example", ip }, now);
    expect(await retryAfterSeconds(ctx.t.db, { email: "fresh@spray.example", ip }, now)).toBe(60);
    expect(await retryAfterSeconds(ctx.t.db, { email: "fresh@spray.example", ip: "10.77.0.2" }, now)).toBe(0);
  });
});
