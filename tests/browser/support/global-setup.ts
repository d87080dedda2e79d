import { spawn, spawnSync, type ChildProcess } from "node:child_process";
import { mkdtempSync, rmSync } from "node:fs";
import os from "node:os";
import path from "node:path";
import type { TestProject } from "vitest/node";

declare module "vitest" {
  export interface ProvidedContext {
    baseURL: string;
    databaseUrl: string;
  }
}

const root = path.resolve(__dirname, "../../..");
let server: ChildProcess | undefined;
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

export default async function setup(project: TestProject) {
  dir = mkdtempSync(path.join(os.tmpdir(), "warmstead-browser-"));
  const databaseUrl = `file:${path.join(dir, "browser.db")}`;
  const port = Number(process.env.BROWSER_TEST_PORT ?? 3107);
  const env = {
    ...process.env,
    NODE_ENV: "production",
    NEXT_TELEMETRY_DISABLED: "1",
    DATABASE_URL: databaseUrl,
    AUTH_SECRET: "browser-tests-only-secret-0123456789abcdef",
    AUTH_TRUST_HOST: "true",
    WARMSTEAD_DATA_DIR: dir,
  } as NodeJS.ProcessEnv;

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

  return async () => {
    server?.kill("SIGTERM");
    if (dir) rmSync(dir, { recursive: true, force: true });
  };
}
