// An in-process SMTP catcher for tests and tools: keeps every message it receives in memory.
// (scripts/mail-catcher.mjs is the stand-alone one that writes .eml files.)
import type { AddressInfo } from "node:net";
import { SMTPServer } from "smtp-server";

export type CaughtMail = { to: string[]; from: string; raw: string; subject: string; text: string };

export type TestCatcher = { port: number; messages: CaughtMail[]; close: () => Promise<void>; waitFor: (pred: (m: CaughtMail) => boolean, timeoutMs?: number) => Promise<CaughtMail> };

/** Undoes quoted-printable soft breaks and =XX escapes (nodemailer wraps long lines this way). */
export function decodeQuotedPrintable(s: string): string {
  const bytes = s.replace(/=\r?\n/g, "").replace(/=([0-9A-F]{2})/gi, (_, h: string) => String.fromCharCode(parseInt(h, 16)));
  return Buffer.from(bytes, "latin1").toString("utf8");
}

/** The text/plain part of a raw message, decoded. Enough for the messages Warmstead writes. */
export function plainText(raw: string): string {
  const part = raw.split(/\r?\n(?=--)/).find((p) => /content-type:\s*text\/plain/i.test(p)) ?? raw;
  const [head, ...body] = part.split(/\r?\n\r?\n/);
  const content = body.join("\n\n").replace(/\r?\n--[^\r\n]*--\s*$/, "");
  if (/content-transfer-encoding:\s*quoted-printable/i.test(head)) return decodeQuotedPrintable(content);
  if (/content-transfer-encoding:\s*base64/i.test(head)) return Buffer.from(content.replace(/\s+/g, ""), "base64").toString("utf8");
  return content;
}

export function subjectOf(raw: string): string {
  const head = raw.split(/\r?\n\r?\n/)[0].replace(/\r?\n[ \t]+/g, " ");
  return head.match(/^subject:\s*(.*)$/im)?.[1]?.trim() ?? "";
}

export async function startTestCatcher(port = 0): Promise<TestCatcher> {
  const messages: CaughtMail[] = [];
  const server = new SMTPServer({
    secure: false,
    disabledCommands: ["STARTTLS"],
    authOptional: true,
    allowInsecureAuth: true,
    logger: false,
    onAuth: (auth, _s, done) => done(null, { user: auth.username || "anyone" }),
    onData(stream, session, done) {
      const chunks: Buffer[] = [];
      stream.on("data", (c: Buffer) => chunks.push(c));
      stream.on("end", () => {
        const raw = Buffer.concat(chunks).toString("utf8");
        const from = session.envelope.mailFrom ? session.envelope.mailFrom.address : "";
        messages.push({ to: session.envelope.rcptTo.map((r) => r.address), from, raw, subject: subjectOf(raw), text: plainText(raw) });
        done();
      });
    },
  });
  await new Promise<void>((resolve, reject) => {
    server.once("error", reject);
    server.listen(port, "127.0.0.1", () => resolve());
  });
  const actual = (server.server.address() as AddressInfo).port;
  return {
    port: actual,
    messages,
    close: () => new Promise<void>((r) => server.close(() => r())),
    async waitFor(pred, timeoutMs = 5000) {
      const start = Date.now();
      while (Date.now() - start < timeoutMs) {
        const hit = messages.find(pred);
        if (hit) return hit;
        await new Promise((r) => setTimeout(r, 25));
      }
      throw new Error(`no matching mail within ${timeoutMs} ms (got ${messages.length})`);
    },
  };
}
