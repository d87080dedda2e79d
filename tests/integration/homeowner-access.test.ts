// Homeowner access: staff invite a job's homeowner, the e-mail with a one-time link reaches a real
// SMTP catcher, the welcome link sets a password; homeowners can also sign in by an e-mailed link.
import bcrypt from "bcryptjs";
import { and, eq } from "drizzle-orm";
import { afterAll, beforeAll, beforeEach, describe, expect, it, vi } from "vitest";
import { authTokens, clients, mailOutbox, users } from "@/db/schema";
import { seedId } from "@/db/seed";
import { verifyCredentials } from "@/lib/auth/credentials";
import { checkAuthToken, consumeAuthToken, createAuthToken, hashToken, verifySignInToken } from "@/lib/auth/tokens";
import { startTestCatcher, type TestCatcher } from "@/lib/mail/catcher";
import { actAs, signIn } from "../support/auth-mock";
import { call, form } from "../support/route";
import { runAction } from "./matrix-support";
import { ids, seededDbForFile } from "./setup";

vi.mock("@/lib/auth", () => import("../support/auth-mock"));
// next-auth itself does not load outside Next; the actions only need its error class.
vi.mock("next-auth", () => ({ AuthError: class AuthError extends Error {} }));
vi.mock("next/cache", () => ({ revalidatePath: vi.fn() }));
vi.mock("next/headers", () => ({ headers: async () => new Headers({ host: "localhost:3000", "x-forwarded-for": "192.0.2.7" }) }));
process.env.MAIL_RETRY_INTERVAL_MS = "0";

const inviteRoute = await import("@/app/api/jobs/[id]/invite/route");
const welcome = await import("@/app/(auth)/welcome/actions");
const signInActions = await import("@/app/(auth)/sign-in/actions");
const { LINK_GONE, SIGN_IN_LINK_SENT } = await import("@/lib/validation/invite");

const ctx = seededDbForFile();
let catcher: TestCatcher;
const job = (n: number) => seedId(`job:${n}`);

beforeAll(async () => {
  catcher = await startTestCatcher();
  process.env.SMTP_HOST = "127.0.0.1";
  process.env.SMTP_PORT = String(catcher.port);
  delete process.env.APP_URL;
  delete process.env.AUTH_URL;
});
afterAll(async () => catcher?.close());
beforeEach(() => signIn.mockClear());

const linkIn = (text: string, kind: "welcome" | "link") => {
  const m = text.match(kind === "welcome" ? /http:\/\/localhost:3000\/welcome\/([A-Za-z0-9_-]{43})\b/ : /http:\/\/localhost:3000\/welcome\/link\/([A-Za-z0-9_-]{43})\b/);
  if (!m) throw new Error(`no ${kind} link in:\n${text}`);
  return m[1];
};

async function invite(jobId: string, body?: unknown, as: string = ids.auditor) {
  actAs(as);
  return call<{ invite?: { to: string; userId: string; created: boolean; expiresAt: number; mail: { status: string } }; error?: string; fields?: Record<string, string[]> }>(inviteRoute.POST as never, { method: "POST", params: { id: jobId }, body });
}

describe("inviting a homeowner", () => {
  it("creates the account (homeowner, no password, same company, linked) and e-mails a 7-day set-password link", async () => {
    const before = Date.now();
    const r = await invite(job(1005));
    expect(r.status).toBe(201);
    expect(r.json.invite).toMatchObject({ to: "wendell.marchbank@mail.example", created: true, mail: { status: "sent" } });
    const [user] = await ctx.t.db.select().from(users).where(eq(users.email, "wendell.marchbank@mail.example"));
    expect(user).toMatchObject({ role: "homeowner", passwordHash: null, companyId: seedId("company:kestrel-bay"), name: "Wendell Marchbank" });
    const [client] = await ctx.t.db.select().from(clients).where(eq(clients.id, seedId("client:oriel")));
    expect(client.userId).toBe(user.id);

    const mail = await catcher.waitFor((m) => m.to.includes("wendell.marchbank@mail.example"));
    expect(mail.subject).toBe("Kestrel Bay Home Performance: set up your Warmstead account");
    expect(mail.text).toContain("9 Oriel Crescent");
    const token = linkIn(mail.text, "welcome");

    // Only the SHA-256 of the token is stored; it expires in 7 days.
    const rows = await ctx.t.db.select().from(authTokens).where(eq(authTokens.userId, user.id));
    expect(rows).toHaveLength(1);
    expect(rows[0]).toMatchObject({ purpose: "invite", tokenHash: hashToken(token), usedAt: null });
    expect(JSON.stringify(rows)).not.toContain(token);
    const days = (rows[0].expiresAt.getTime() - before) / 86_400_000;
    expect(days).toBeGreaterThan(6.99);
    expect(days).toBeLessThan(7.01);
    // The outbox keeps the message, with the link blanked once sent.
    const [out] = await ctx.t.db.select().from(mailOutbox).where(eq(mailOutbox.to, "wendell.marchbank@mail.example"));
    expect(out).toMatchObject({ kind: "invite", status: "sent", relatedJobId: job(1005), companyId: seedId("company:kestrel-bay") });
    expect(out.text + out.html).not.toContain(token);
  });

  it("invites an existing homeowner account again; the newer link replaces the older one", async () => {
    const first = await invite(ids.demoJob);
    expect(first.status).toBe(201);
    expect(first.json.invite).toMatchObject({ to: "homeowner@kestrelbay.example", created: false, userId: ids.homeowner });
    const old = linkIn((await catcher.waitFor((m) => m.to.includes("homeowner@kestrelbay.example"))).text, "welcome");
    catcher.messages.length = 0;
    expect((await invite(ids.demoJob)).status).toBe(201);
    const fresh = linkIn((await catcher.waitFor((m) => m.to.includes("homeowner@kestrelbay.example"))).text, "welcome");
    expect(fresh).not.toBe(old);
    expect((await checkAuthToken(ctx.t.db, old, "invite")).status).toBe("used");
    expect((await checkAuthToken(ctx.t.db, fresh, "invite")).status).toBe("valid");
  });

  it("asks for an e-mail when the client has none, names the field when it is wrong, and refuses a taken one", async () => {
    const none = await invite(job(1007));
    expect(none.status).toBe(422);
    expect(none.json.fields?.email?.[0]).toMatch(/e-mail address/);
    const bad = await invite(job(1007), { email: "not-an-address" });
    expect(bad.status).toBe(422);
    expect(bad.json.fields?.email).toEqual(["Homeowner e-mail does not look like an e-mail address."]);
    const staff = await invite(job(1007), { email: "installer@kestrelbay.example" });
    expect(staff.status).toBe(409);
    expect(staff.json.fields?.email?.[0]).toMatch(/already belongs to another account/);
    const other = await invite(job(1007), { email: "boss@other.example" });
    expect(other.status).toBe(409);
    const ok = await invite(job(1007), { email: "Odile.Fenwright@mail.example" });
    expect(ok.status).toBe(201);
    expect(ok.json.invite).toMatchObject({ to: "odile.fenwright@mail.example", created: true });
    const [client] = await ctx.t.db.select().from(clients).where(eq(clients.id, seedId("client:wrenhaven")));
    expect(client.email).toBe("odile.fenwright@mail.example");
  });

  it("answers bad requests with 4xx, never 500", async () => {
    actAs(ids.auditor);
    expect((await call(inviteRoute.POST as never, { method: "POST", params: { id: ids.demoJob }, body: "{nope", headers: { "content-type": "application/json" } })).status).toBe(400);
    expect((await call(inviteRoute.POST as never, { method: "POST", params: { id: ids.demoJob }, body: "email=x", headers: { "content-type": "text/plain" } })).status).toBe(415);
    expect((await invite("no-such-job")).status).toBe(404);
    expect((await invite(ids.demoJob, { email: 42 })).status).toBe(422);
  });

  it("still answers 201 when the mail server is down; the message waits in the outbox as queued", async () => {
    const down = await startTestCatcher();
    await down.close(); // a port where nothing listens any more
    process.env.SMTP_PORT = String(down.port);
    try {
      const r = await invite(job(1004));
      expect(r.status).toBe(201);
      expect(r.json.invite?.mail.status).toBe("queued");
    } finally {
      process.env.SMTP_PORT = String(catcher.port);
    }
  });
});

describe("the welcome link", () => {
  async function freshInvite() {
    catcher.messages.length = 0;
    await invite(ids.demoJob);
    return linkIn((await catcher.waitFor((m) => m.to.includes("homeowner@kestrelbay.example"))).text, "welcome");
  }

  it("says what is wrong with the password, keeps no password in the form", async () => {
    const token = await freshInvite();
    const short = await welcome.setPasswordAction({}, form({ token, password: "short", confirm: "short" }));
    expect(short.fields?.password).toEqual(["Password must be at least 10 characters."]);
    expect(short.values).toEqual({});
    const mismatch = await welcome.setPasswordAction({}, form({ token, password: "a-long-new-password", confirm: "a-long-new-passwore" }));
    expect(mismatch.fields?.confirm).toEqual(["Confirm password does not match the password."]);
    const empty = await welcome.setPasswordAction({}, form({ token }));
    expect(empty.fields?.password).toEqual(["Enter a password."]);
    expect(empty.fields?.confirm).toEqual(["Type the password again."]);
    expect((await checkAuthToken(ctx.t.db, token, "invite")).status).toBe("valid");
  });

  it("sets the password, uses the link up, signs in and lands in the portal", async () => {
    const token = await freshInvite();
    const password = "tansyfield-attic-2026";
    expect(await runAction(welcome.setPasswordAction as never, form({ token, password, confirm: password }))).toBe(303);
    expect(signIn).toHaveBeenCalledWith("credentials", { email: "homeowner@kestrelbay.example", password, redirect: false });
    const [user] = await ctx.t.db.select().from(users).where(eq(users.id, ids.homeowner));
    expect(await bcrypt.compare(password, user.passwordHash!)).toBe(true);
    expect((await verifyCredentials(ctx.t.db, { email: "homeowner@kestrelbay.example", password, ip: null })).ok).toBe(true);
    // Single use.
    expect((await checkAuthToken(ctx.t.db, token, "invite")).status).toBe("used");
    const again = await welcome.setPasswordAction({}, form({ token, password: "another-password-1", confirm: "another-password-1" }));
    expect(again).toMatchObject({ ok: false, message: LINK_GONE });
  });

  it("expires after 7 days; unknown and malformed links are just unknown", async () => {
    const eightDaysAgo = new Date(Date.now() - 8 * 86_400_000);
    const { token } = await createAuthToken(ctx.t.db, ids.homeowner2, "invite", eightDaysAgo);
    expect((await checkAuthToken(ctx.t.db, token, "invite")).status).toBe("expired");
    expect(await consumeAuthToken(ctx.t.db, token, "invite")).toBeNull();
    expect((await checkAuthToken(ctx.t.db, "x".repeat(43), "invite")).status).toBe("unknown");
    expect((await checkAuthToken(ctx.t.db, "../../etc", "invite")).status).toBe("unknown");
    const r = await welcome.setPasswordAction({}, form({ token, password: "long-enough-pass", confirm: "long-enough-pass" }));
    expect(r.message).toBe(LINK_GONE);
  });

  it("an invite link does not work as a sign-in link, nor the other way round", async () => {
    const { token } = await createAuthToken(ctx.t.db, ids.homeowner2, "invite");
    expect(await consumeAuthToken(ctx.t.db, token, "sign-in")).toBeNull();
    expect((await checkAuthToken(ctx.t.db, token, "invite")).status).toBe("valid");
  });
});

describe("e-mailed sign-in links", () => {
  it("sends a 15-minute single-use link to a homeowner, and gives everyone the same answer", async () => {
    catcher.messages.length = 0;
    const before = Date.now();
    const r = await signInActions.requestSignInLinkAction({}, form({ email: "Homeowner2@KestrelBay.example" }));
    expect(r).toMatchObject({ ok: true, message: SIGN_IN_LINK_SENT, values: { email: "Homeowner2@KestrelBay.example" } });
    const mail = await catcher.waitFor((m) => m.to.includes("homeowner2@kestrelbay.example"));
    expect(mail.subject).toBe("Your Warmstead sign-in link");
    const token = linkIn(mail.text, "link");
    const [row] = await ctx.t.db.select().from(authTokens).where(eq(authTokens.tokenHash, hashToken(token)));
    expect(row.purpose).toBe("sign-in");
    expect((row.expiresAt.getTime() - before) / 60_000).toBeCloseTo(15, 0);

    for (const email of ["nobody@kestrelbay.example", "owner@kestrelbay.example"]) {
      expect(await signInActions.requestSignInLinkAction({}, form({ email }))).toMatchObject({ ok: true, message: SIGN_IN_LINK_SENT });
    }
    await new Promise((res) => setTimeout(res, 300));
    expect(catcher.messages.map((m) => m.to[0])).toEqual(["homeowner2@kestrelbay.example"]);

    const invalid = await signInActions.requestSignInLinkAction({}, form({ email: "nope" }));
    expect(invalid.fields?.email).toEqual(["E-mail does not look like an e-mail address."]);
    expect(invalid.values).toEqual({ email: "nope" });

    // The welcome page's button hands the token to the "token" provider, which uses it once.
    expect(await runAction(welcome.linkSignInAction as never, form({ token }))).toBe(303);
    expect(signIn).toHaveBeenCalledWith("token", { token, redirect: false });
    const user = await verifySignInToken(ctx.t.db, token, "192.0.2.7");
    expect(user?.id).toBe(ids.homeowner2);
    expect(await verifySignInToken(ctx.t.db, token, "192.0.2.7")).toBeNull();
  });

  it("expires after 15 minutes, and a disabled account cannot use one", async () => {
    const { token } = await createAuthToken(ctx.t.db, ids.homeowner2, "sign-in", new Date(Date.now() - 16 * 60_000));
    expect(await verifySignInToken(ctx.t.db, token, null)).toBeNull();
    const fresh = await createAuthToken(ctx.t.db, ids.homeowner2, "sign-in");
    await ctx.t.db.update(users).set({ disabled: true }).where(eq(users.id, ids.homeowner2));
    try {
      expect((await checkAuthToken(ctx.t.db, fresh.token, "sign-in")).status).toBe("disabled");
      expect(await verifySignInToken(ctx.t.db, fresh.token, null)).toBeNull();
    } finally {
      await ctx.t.db.update(users).set({ disabled: false }).where(eq(users.id, ids.homeowner2));
    }
  });

  it("sends at most three links per account in 15 minutes", async () => {
    catcher.messages.length = 0;
    await ctx.t.db.delete(authTokens).where(and(eq(authTokens.userId, seedId("user:homeowner3")), eq(authTokens.purpose, "sign-in")));
    for (let i = 0; i < 5; i++) await signInActions.requestSignInLinkAction({}, form({ email: "homeowner3@kestrelbay.example" }));
    await new Promise((res) => setTimeout(res, 500));
    expect(catcher.messages.filter((m) => m.to.includes("homeowner3@kestrelbay.example"))).toHaveLength(3);
  });
});
