// `npm run demo`: migrate and seed the embedded SQLite file, build, and start on http://localhost:3000.
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

const port = process.env.PORT ?? "3000";
console.log(`\n== Starting Warmstead on http://localhost:${port}`);
const server = spawn(process.execPath, [path.join(root, "node_modules/next/dist/bin/next"), "start", "-p", port], {
  cwd: root,
  env,
  stdio: "inherit",
});
const stop = () => server.kill("SIGTERM");
process.on("SIGINT", stop);
process.on("SIGTERM", stop);
server.on("exit", (code) => process.exit(code ?? 0));
