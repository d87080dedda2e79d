// sessionUserId (lib/auth): the guard's reading of next-auth's session cookie. It must accept
// exactly the cookies next-auth itself issues, refuse tampered, foreign and expired ones, and
// decode a given cookie only once.
import { encode } from "next-auth/jwt";
import { beforeEach, describe, expect, it, vi } from "vitest";

const jar = new Map<string, string>();
vi.mock("next/headers", () => ({
  cookies: async () => ({
    get: (name: string) => (jar.has(name) ? { name, value: jar.get(name)! } : undefined),
    has: (name: string) => jar.has(name),
  }),
}));
const decodeSpy = vi.hoisted(() => ({ calls: 0 }));
vi.mock("next-auth/jwt", async (importOriginal) => {
  const real = await importOriginal<typeof import("next-auth/jwt")>();
  return { ...real, decode: (...args: Parameters<typeof real.decode>) => { decodeSpy.calls++; return real.decode(...args); } };
});

const SECRET = "unit-test-secret-0123456789abcdef0123";
process.env.AUTH_SECRET = SECRET;
const { sessionUserId, SESSION_COOKIE } = await import("@/lib/auth");

const issue = (claims: Record<string, unknown>, opts: { secret?: string; maxAge?: number } = {}) =>
  encode({ token: claims, secret: opts.secret ?? SECRET, salt: SESSION_COOKIE, maxAge: opts.maxAge ?? 3600 });

describe("sessionUserId", () => {
  beforeEach(() => {
    jar.clear();
    decodeSpy.calls = 0;
  });

  it("is null without a cookie", async () => {
    expect(await sessionUserId()).toBeNull();
  });

  it("reads the user id from a cookie next-auth would issue, and decodes it only once", async () => {
    jar.set(SESSION_COOKIE, await issue({ uid: "user-1", role: "owner", companyId: "c1" }));
    expect(await sessionUserId()).toBe("user-1");
    expect(await sessionUserId()).toBe("user-1");
    expect(decodeSpy.calls).toBe(1);
  });

  it("refuses a cookie encrypted with another secret", async () => {
    jar.set(SESSION_COOKIE, await issue({ uid: "user-2" }, { secret: "another-secret-0123456789abcdef0123" }));
    expect(await sessionUserId()).toBeNull();
  });

  it("refuses a tampered cookie", async () => {
    const token = await issue({ uid: "user-3" });
    const i = Math.floor(token.length / 2);
    jar.set(SESSION_COOKIE, token.slice(0, i) + (token[i] === "A" ? "B" : "A") + token.slice(i + 1));
    expect(await sessionUserId()).toBeNull();
  });

  it("refuses an expired cookie, also once it is cached", async () => {
    jar.set(SESSION_COOKIE, await issue({ uid: "user-4" }, { maxAge: -10 }));
    expect(await sessionUserId()).toBeNull();
    vi.useFakeTimers({ now: Date.now() });
    try {
      jar.set(SESSION_COOKIE, await issue({ uid: "user-5" }, { maxAge: 60 }));
      expect(await sessionUserId()).toBe("user-5");
      vi.setSystemTime(Date.now() + 61_000);
      expect(await sessionUserId()).toBeNull();
    } finally {
      vi.useRealTimers();
    }
  });

  it("refuses a cookie without a user id", async () => {
    jar.set(SESSION_COOKIE, await issue({ role: "owner" }));
    expect(await sessionUserId()).toBeNull();
  });
});
