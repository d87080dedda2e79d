// The outbox: every message is recorded, sent over real SMTP to a catcher on 127.0.0.1, and a
// failed send is kept, retried with backoff and finally shown as failed.
import { spawn } from "node:child_process";
import { mkdtempSync, readdirSync, readFileSync, rmSync } from "node:fs";
import { createServer } from "node:net";
import { tmpdir } from "node:os";
import path from "node:path";
import { eq } from "drizzle-orm";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { mailOutbox } from "@/db/schema";
import { startTestCatcher, type TestCatcher } from "@/lib/mail/catcher";
import { mailConfig } from "@/lib/mail/config";
import { attemptSend, mailRetryPolicy, nextDelayMs, queueMail, REDACTED, retryDueMail } from "@/lib/mail/outbox";
import { seededDbForFile } from "./setup";

process.env.MAIL_RETRY_INTERVAL_MS = "0";
const ctx = seededDbForFile();
let catcher: TestCatcher;

async function freePort(): Promise<number> {
  const srv = createServer();
  await new Promise<void>((r) => srv.listen(0, "127.0.0.1", () => r()));
  const port = (srv.address() as { port: number }).port;
  await new Promise((r) => srv.close(r));
  return port;
}

const useSmtp = (port: number) => {
  process.env.SMTP_HOST = "127.0.0.1";
  process.env.SMTP_PORT = String(port);
};
const rowOf = async (id: string) => (await ctx.t.db.select().from(mailOutbox).where(eq(mailOutbox.id, id)))[0];
const mail = (subject: string, kind = "test") => ({ to: "someone@mail.example", subject, text: `Body of ${subject}`, kind });

beforeAll(async () => {
  catcher = await startTestCatcher();
  useSmtp(catcher.port);
});
afterAll(async () => {
  await catcher?.close();
});

describe("SMTP settings", () => {
  it("default to the local catcher on 127.0.0.1:2525, so nothing leaves the machine unconfigured", () => {
    expect(mailConfig({})).toMatchObject({ host: "127.0.0.1", port: 2525, secure: false, user: undefined });
    expect(mailConfig({ SMTP_HOST: "smtp.mail.example", SMTP_PORT: "465", SMTP_SECURE: "true", SMTP_USER: "u", SMTP_PASS: "p", MAIL_FROM: "X <x@mail.example>" })).toEqual({
      host: "smtp.mail.example",
      port: 465,
      secure: true,
      user: "u",
      pass: "p",
      from: "X <x@mail.example>",
    });
    expect(mailConfig({ SMTP_PORT: "not a port" }).port).toBe(2525);
  });
});

describe("queueMail", () => {
  it("records the message, sends it to the catcher and marks it sent", async () => {
    const row = await queueMail({ ...mail("Hello from the outbox"), companyId: null });
    expect(row).toMatchObject({ status: "sent", attempts: 1, lastError: null });
    expect(row.sentAt).toBeInstanceOf(Date);
    const got = await catcher.waitFor((m) => m.subject === "Hello from the outbox");
    expect(got.to).toEqual(["someone@mail.example"]);
    expect(got.text).toContain("Body of Hello from the outbox");
  });

  it("keeps a failed send (catcher down) with its error and attempts, then retries it after the backoff", async () => {
    const port = await freePort();
    useSmtp(port);
    const before = Date.now();
    const row = await queueMail(mail("Sent while the catcher was down"));
    expect(row.status).toBe("queued");
    expect(row.attempts).toBe(1);
    expect(row.lastError).toMatch(/ECONNREFUSED|connect/i);
    const wait = row.nextAttemptAt!.getTime() - before;
    expect(wait).toBeGreaterThanOrEqual(mailRetryPolicy.delaysMs[0] - 1000);
    expect(wait).toBeLessThan(mailRetryPolicy.delaysMs[0] + 5000);

    // Not yet due: nothing is tried.
    expect((await retryDueMail(new Date())).tried).toBe(0);

    // The catcher comes back on that port; after the wait the retry delivers it.
    const back = await startTestCatcher(port);
    try {
      const result = await retryDueMail(new Date(Date.now() + mailRetryPolicy.delaysMs[0] + 1000));
      expect(result.sent).toBeGreaterThanOrEqual(1);
      expect(await rowOf(row.id)).toMatchObject({ status: "sent", attempts: 2, lastError: null, nextAttemptAt: null });
      await back.waitFor((m) => m.subject === "Sent while the catcher was down");
    } finally {
      await back.close();
      useSmtp(catcher.port);
    }
  });

  it("after the last attempt shows the message as failed, never drops it; a forced retry sends it", async () => {
    useSmtp(await freePort());
    const row = await queueMail(mail("Never gets through"));
    let t = Date.now();
    for (let i = 1; i < mailRetryPolicy.maxAttempts; i++) {
      t += nextDelayMs(i)! + 1000;
      await retryDueMail(new Date(t));
    }
    const failed = await rowOf(row.id);
    expect(failed).toMatchObject({ status: "failed", attempts: mailRetryPolicy.maxAttempts, nextAttemptAt: null });
    expect(failed.lastError).toBeTruthy();
    // A failed message is not retried automatically any more.
    expect((await retryDueMail(new Date(t + 24 * 3600_000))).tried).toBe(0);

    useSmtp(catcher.port);
    const sent = await attemptSend(row.id, { force: true });
    expect(sent).toMatchObject({ status: "sent", attempts: mailRetryPolicy.maxAttempts + 1 });
    await catcher.waitFor((m) => m.subject === "Never gets through");
  });

  it("backs off 30 s, 2, 10, 30 minutes, then gives up", () => {
    expect([1, 2, 3, 4, 5].map(nextDelayMs)).toEqual([30_000, 120_000, 600_000, 1_800_000, null]);
  });

  it("sends a message once even when two workers try it at the same moment", async () => {
    const [row] = await ctx.t.db.insert(mailOutbox).values({ to: "twice@mail.example", subject: "Only once please", text: "x", kind: "test", nextAttemptAt: new Date() }).returning();
    const results = await Promise.all([attemptSend(row.id), attemptSend(row.id), retryDueMail()]);
    expect(results.filter((r) => r && "status" in r && r.status === "sent").length).toBe(1);
    await catcher.waitFor((m) => m.subject === "Only once please");
    await new Promise((r) => setTimeout(r, 200));
    expect(catcher.messages.filter((m) => m.subject === "Only once please").length).toBe(1);
  });

  it("blanks the one-time link in the stored copy once an invitation is sent", async () => {
    const token = "A".repeat(20) + "b_-".repeat(7) + "z".repeat(2);
    expect(token).toHaveLength(43);
    const row = await queueMail({ to: "h@mail.example", subject: "Link inside", text: `Open http://localhost:3000/welcome/${token}\n`, html: `<a href="http://localhost:3000/welcome/${token}">x</a>`, kind: "invite" });
    expect(row.status).toBe("sent");
    const stored = await rowOf(row.id);
    expect(stored.text).not.toContain(token);
    expect(stored.text).toContain(REDACTED);
    expect(stored.html).not.toContain(token);
    expect((await catcher.waitFor((m) => m.subject === "Link inside")).text).toContain(token);
  });
});

describe("scripts/mail-catcher.mjs", () => {
  it("listens on 127.0.0.1, stores each message as a .eml file and prints a one-line summary", async () => {
    const dir = mkdtempSync(path.join(tmpdir(), "warmstead-mail-"));
    const port = await freePort();
    const child = spawn(process.execPath, ["scripts/mail-catcher.mjs", "--port", String(port)], { env: { ...process.env, MAIL_CATCHER_DIR: dir }, stdio: ["ignore", "pipe", "inherit"] });
    let out = "";
    child.stdout.on("data", (d: Buffer) => (out += d.toString()));
    try {
      const start = Date.now();
      while (!out.includes("listening") && Date.now() - start < 10_000) await new Promise((r) => setTimeout(r, 50));
      expect(out).toContain(`listening on smtp://127.0.0.1:${port}`);
      useSmtp(port);
      const row = await queueMail(mail("Stored as a file"));
      expect(row.status).toBe("sent");
      while (!out.includes("Stored as a file") && Date.now() - start < 10_000) await new Promise((r) => setTimeout(r, 50));
      const files = readdirSync(dir).filter((f) => f.endsWith(".eml"));
      expect(files).toHaveLength(1);
      expect(readFileSync(path.join(dir, files[0]), "utf8")).toMatch(/^Subject: Stored as a file/m);
      expect(out).toMatch(/to someone@mail\.example "Stored as a file" → .*\.eml/);
    } finally {
      child.kill("SIGTERM");
      useSmtp(catcher.port);
      rmSync(dir, { recursive: true, force: true });
    }
  });
});
