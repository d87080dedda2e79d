import { readdirSync, readFileSync } from "node:fs";
import path from "node:path";
import { inject } from "vitest";

export const decodeQp = (s: string) => Buffer.from(s.replace(/=\r?\n/g, "").replace(/=([0-9A-F]{2})/gi, (_, h: string) => String.fromCharCode(parseInt(h, 16))), "latin1").toString("utf8");

/** The .eml files the test's own SMTP catcher has written so far. */
export const mailFiles = () => new Set(readdirSync(inject("mailDir")).filter((f) => f.endsWith(".eml")));

/** The link matching `pattern` in a captured .eml to `to` that was not among `before`, waiting for it. */
export async function linkFromMail(to: string, pattern: RegExp, before: Set<string>): Promise<string> {
  const start = Date.now();
  while (Date.now() - start < 15_000) {
    for (const f of [...mailFiles()].filter((name) => !before.has(name))) {
      const raw = readFileSync(path.join(inject("mailDir"), f), "utf8");
      if (!raw.toLowerCase().includes(`to: ${to}`)) continue;
      const m = decodeQp(raw).match(pattern);
      if (m) return m[0];
    }
    await new Promise((r) => setTimeout(r, 200));
  }
  throw new Error(`no new mail to ${to} matching ${pattern}`);
}
