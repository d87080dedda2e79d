import { spawn, spawnSync, type ChildProcess } from "node:child_process";
import { mkdirSync, mkdtempSync, rmSync } from "node:fs";
import { createServer } from "node:net";
import os from "node:os";
import path from "node:path";
import type { TestProject } from "vitest/node";

declare module "vitest" {
  export interface ProvidedContext {
    baseURL: string;
    databaseUrl: string;
    /** Where the test mail catcher stores each captured message as a .eml file. */
    mailDir: string;
  }
}

const root = path.resolve(__dirname, "../../..");
let server: ChildProcess | undefined;
let catcher: ChildProcess | undefined;
let dir: string | undefined;

async function waitFor(url: string, timeoutMs: number) {
  const start = Date.now();
  while (Date.now() - start < timeoutMs) {
    try {
      const res = await fetch(url);
      if (res.status < 500) return;
    } catch {
      // not up yet
    }
    await new Promise((r) => setTimeout(r, 250));
  }
  throw new Error(`server did not answer at ${url} within ${timeoutMs} ms`);
}

async function freePort(): Promise<number> {
  const srv = createServer();
  await new Promise<void>((r) => srv.listen(0, "127.0.0.1", () => r()));
  const port = (srv.address() as { port: number }).port;
  await new Promise((r) => srv.close(r));
  return port;
}

/** The project's own SMTP catcher (scripts/mail-catcher.mjs) on a free port, writing .eml files to `mailDir`. */
async function startCatcher(mailDir: string): Promise<number> {
  mkdirSync(mailDir, { recursive: true });
  const port = await freePort();
  catcher = spawn(process.execPath, [path.join(root, "scripts/mail-catcher.mjs"), "--port", String(port), "--dir", mailDir], { cwd: root, stdio: ["ignore", "pipe", "inherit"] });
  process.once("exit", () => catcher?.kill("SIGTERM")); // also when a later setup step fails
  await new Promise<void>((resolve, reject) => {
    catcher!.stdout!.on("data", (d: Buffer) => d.toString().includes("listening") && resolve());
    catcher!.on("exit", (code) => reject(new Error(`mail catcher exited (${code})`)));
  });
  return port;
}

export default async function setup(project: TestProject) {
  dir = mkdtempSync(path.join(os.tmpdir(), "warmstead-browser-"));
  const databaseUrl = `file:${path.join(dir, "browser.db")}`;
  const port = Number(process.env.BROWSER_TEST_PORT ?? 3107);
  const mailDir = path.join(dir, "mail");
  const smtpPort = await startCatcher(mailDir);
  const env = {
    ...process.env,
    NODE_ENV: "production",
    NEXT_TELEMETRY_DISABLED: "1",
    DATABASE_URL: databaseUrl,
    AUTH_SECRET: "browser-tests-only-secret-0123456789abcdef",
    AUTH_TRUST_HOST: "true",
    WARMSTEAD_DATA_DIR: dir,
    SMTP_HOST: "127.0.0.1",
    SMTP_PORT: String(smtpPort),
    SMTP_SECURE: "false",
  } as NodeJS.ProcessEnv;
  delete env.SMTP_USER;
  delete env.SMTP_PASS;
  delete env.APP_URL;

  for (const script of ["db/migrate.ts", "db/seed.ts"]) {
    const r = spawnSync(path.join(root, "node_modules/.bin/tsx"), [script], { cwd: root, env, encoding: "utf8" });
    if (r.status !== 0) throw new Error(`${script} failed:\n${r.stdout}\n${r.stderr}`);
  }

  server = spawn(process.execPath, [path.join(root, "node_modules/next/dist/bin/next"), "start", "-p", String(port)], {
    cwd: root,
    env,
    stdio: ["ignore", "inherit", "inherit"],
  });
  const baseURL = `http://127.0.0.1:${port}`;
  await waitFor(baseURL, 60_000);
  project.provide("baseURL", baseURL);
  project.provide("databaseUrl", databaseUrl);
  project.provide("mailDir", mailDir);

  return async () => {
    server?.kill("SIGTERM");
    catcher?.kill("SIGTERM");
    if (dir) rmSync(dir, { recursive: true, force: true });
  };
}
