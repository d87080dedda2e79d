// The mail and homeowner-access routes and actions, called as each kind of actor, with the exact answer each gets.
import { afterAll, beforeAll, describe, expect, it, vi } from "vitest";
import { mailOutbox } from "@/db/schema";
import { seedId } from "@/db/seed";
import { startTestCatcher, type TestCatcher } from "@/lib/mail/catcher";
import { actAs } from "../support/auth-mock";
import { call, form } from "../support/route";
import { actors, runAction, type Actor } from "./matrix-support";
import { ids, seededDbForFile } from "./setup";

vi.mock("@/lib/auth", () => import("../support/auth-mock"));
vi.mock("next-auth", () => ({ AuthError: class AuthError extends Error {} }));
vi.mock("next/cache", () => ({ revalidatePath: vi.fn() }));
vi.mock("next/headers", () => ({ headers: async () => new Headers({ host: "localhost:3000" }) }));
process.env.MAIL_RETRY_INTERVAL_MS = "0";

const inviteRoute = await import("@/app/api/jobs/[id]/invite/route");
const inviteActions = await import("@/app/api/jobs/[id]/invite/actions");
const outboxActions = await import("@/app/(office)/outbox/actions");
const welcome = await import("@/app/(auth)/welcome/actions");
const signInActions = await import("@/app/(auth)/sign-in/actions");

const ctx = seededDbForFile();
let catcher: TestCatcher;
beforeAll(async () => {
  catcher = await startTestCatcher();
  process.env.SMTP_HOST = "127.0.0.1";
  process.env.SMTP_PORT = String(catcher.port);
});
afterAll(async () => catcher?.close());

/** A Kestrel Bay message that failed for good, so "retry now" has something to retry. */
async function failedMessage() {
  const [row] = await ctx.t.db
    .insert(mailOutbox)
    .values({ companyId: seedId("company:kestrel-bay"), to: "x@mail.example", subject: "Failed earlier", text: "x", kind: "test", status: "failed", attempts: 5, lastError: "connect ECONNREFUSED" })
    .returning();
  return row.id;
}

const fakeToken = "Z".repeat(43);
const publicAnswer = (status: number): Record<Actor, number> => Object.fromEntries(Object.keys(actors).map((a) => [a, status])) as Record<Actor, number>;

const matrix: { name: string; expect: Record<Actor, number>; run: (as: string | null) => Promise<number> }[] = [
  {
    name: "POST /api/jobs/[id]/invite",
    expect: { anonymous: 401, "homeowner of the job": 403, "homeowner of another job": 403, "installer assigned": 403, "installer not assigned": 403, auditor: 201, owner: 201, "user of another company": 404 },
    run: async (as) => (actAs(as), await call(inviteRoute.POST as never, { method: "POST", params: { id: ids.demoJob } })).status,
  },
  {
    name: "action inviteHomeowner",
    expect: { anonymous: 401, "homeowner of the job": 403, "homeowner of another job": 403, "installer assigned": 403, "installer not assigned": 403, auditor: 200, owner: 200, "user of another company": 404 },
    run: (as) => (actAs(as), runAction(inviteActions.inviteHomeownerAction, form({ jobId: ids.demoJob }))),
  },
  {
    name: "action retryMail (a failed Kestrel Bay message)",
    expect: { anonymous: 401, "homeowner of the job": 403, "homeowner of another job": 403, "installer assigned": 403, "installer not assigned": 403, auditor: 200, owner: 200, "user of another company": 404 },
    run: async (as) => {
      const id = await failedMessage();
      actAs(as);
      return runAction(outboxActions.retryMailAction, form({ id }));
    },
  },
  {
    name: "action setPassword (public; an unknown link)",
    expect: publicAnswer(422),
    run: (as) => (actAs(as), runAction(welcome.setPasswordAction, form({ token: fakeToken, password: "long-enough-pw", confirm: "long-enough-pw" }))),
  },
  {
    name: "action linkSignIn (public; an unknown link)",
    expect: publicAnswer(422),
    run: (as) => (actAs(as), runAction(welcome.linkSignInAction, form({ token: fakeToken }))),
  },
  {
    name: "action requestSignInLink (public)",
    expect: publicAnswer(200),
    run: (as) => (actAs(as), runAction(signInActions.requestSignInLinkAction, form({ email: "nobody@kestrelbay.example" }))),
  },
];

describe.each(matrix)("$name", ({ expect: expected, run }) => {
  it.each(Object.keys(actors) as Actor[])("as %s", async (actor) => {
    void ctx;
    expect(await run(actors[actor])).toBe(expected[actor]);
  });
});

describe("the outbox page's data", () => {
  it("lists only the user's company's mail, without bodies", async () => {
    const { listOutbox } = await import("@/lib/data/outbox");
    const staff = (id: string, companyId: string) => ({ id, companyId, role: "owner" as const, name: "x", email: "x@x.example", unitSystem: "ip" as const });
    await failedMessage();
    const mine = await listOutbox(staff(ids.owner, seedId("company:kestrel-bay")));
    expect(mine.length).toBeGreaterThan(0);
    expect(mine[0]).not.toHaveProperty("text");
    expect(await listOutbox(staff(ids.otherOwner, ids.otherCompany))).toEqual([]);
  });
});
