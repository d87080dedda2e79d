// `npm run demo`: migrate and seed the embedded SQLite file, build, start the local mail catcher and
// then the app on http://localhost:3000.
import { spawn, spawnSync } from "node:child_process";
import path from "node:path";
import { localEnv, root } from "./env.mjs";

const env = localEnv();
const bin = (name) => path.join(root, "node_modules", ".bin", name);

function step(label, cmd, args) {
  console.log(`\n== ${label}`);
  const r = spawnSync(cmd, args, { cwd: root, env, stdio: "inherit" });
  if (r.status !== 0) {
    console.error(`\n${label} failed (exit ${r.status}).`);
    process.exit(r.status ?? 1);
  }
}

step("Migrating the database", bin("tsx"), ["db/migrate.ts"]);
step("Seeding the demo company", bin("tsx"), ["db/seed.ts"]);
if (!process.argv.includes("--no-build")) step("Building", bin("next"), ["build"]);

// Mail: with no SMTP_HOST of your own, the demo starts the local catcher (scripts/mail-catcher.mjs),
// so invitations land as .eml files in data/mail/ and nothing leaves the machine.
async function startCatcher() {
  if (process.env.SMTP_HOST) {
    console.log(`\n== Mail goes to ${process.env.SMTP_HOST}:${process.env.SMTP_PORT ?? 2525} (SMTP_HOST is set; no local catcher)`);
    return null;
  }
  const mailPort = process.env.MAIL_CATCHER_PORT ?? "2525";
  const dir = process.env.MAIL_CATCHER_DIR ?? path.join(root, "data", "mail");
  console.log(`\n== Starting the local mail catcher on 127.0.0.1:${mailPort}`);
  const child = spawn(process.execPath, [path.join(root, "scripts/mail-catcher.mjs"), "--port", mailPort, "--dir", dir], { cwd: root, env, stdio: ["ignore", "pipe", "inherit"] });
  child.stdout.pipe(process.stdout);
  const ready = await new Promise((resolve) => {
    child.stdout.on("data", (d) => d.toString().includes("listening") && resolve(true));
    child.on("exit", () => resolve(false));
  });
  if (!ready) {
    console.error(`The mail catcher could not start (is port ${mailPort} taken? set MAIL_CATCHER_PORT). Mail stays queued in the outbox until it can be sent.`);
    return null;
  }
  env.SMTP_HOST = "127.0.0.1";
  env.SMTP_PORT = mailPort;
  return child;
}

const catcher = await startCatcher();
const port = process.env.PORT ?? "3000";
console.log(`\n== Starting Warmstead on http://localhost:${port}`);
const server = spawn(process.execPath, [path.join(root, "node_modules/next/dist/bin/next"), "start", "-p", port], {
  cwd: root,
  env,
  stdio: "inherit",
});
const stop = () => {
  server.kill("SIGTERM");
  catcher?.kill("SIGTERM");
};
process.on("SIGINT", stop);
process.on("SIGTERM", stop);
server.on("exit", (code) => {
  catcher?.kill("SIGTERM");
  process.exit(code ?? 0);
});
