// Shared by the demo and start scripts: the local defaults a fresh machine needs.
import { randomBytes } from "node:crypto";
import { existsSync, mkdirSync, readFileSync, writeFileSync } from "node:fs";
import path from "node:path";

export const root = path.resolve(path.dirname(new URL(import.meta.url).pathname), "..");

/** A stable AUTH_SECRET for local runs, kept in data/ (never committed). Production sets its own. */
export function localAuthSecret() {
  if (process.env.AUTH_SECRET) return process.env.AUTH_SECRET;
  const dir = path.join(root, "data");
  const file = path.join(dir, ".auth-secret");
  mkdirSync(dir, { recursive: true });
  if (!existsSync(file)) writeFileSync(file, randomBytes(32).toString("base64url"), { mode: 0o600 });
  return readFileSync(file, "utf8").trim();
}

export function localEnv(extra = {}) {
  return {
    ...process.env,
    NEXT_TELEMETRY_DISABLED: "1",
    AUTH_SECRET: localAuthSecret(),
    AUTH_TRUST_HOST: process.env.AUTH_TRUST_HOST ?? "true",
    ...extra,
  };
}
