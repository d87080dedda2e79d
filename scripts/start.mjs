// `npm start`: apply migrations, then serve the production build (run `npm run build` first).
import { spawn, spawnSync } from "node:child_process";
import path from "node:path";
import { localEnv, root } from "./env.mjs";

const env = localEnv();
const migrate = spawnSync(path.join(root, "node_modules/.bin/tsx"), ["db/migrate.ts"], { cwd: root, env, stdio: "inherit" });
if (migrate.status !== 0) process.exit(migrate.status ?? 1);

const server = spawn(process.execPath, [path.join(root, "node_modules/next/dist/bin/next"), "start", "-p", process.env.PORT ?? "3000"], {
  cwd: root,
  env,
  stdio: "inherit",
});
const stop = () => server.kill("SIGTERM");
process.on("SIGINT", stop);
process.on("SIGTERM", stop);
server.on("exit", (code) => process.exit(code ?? 0));
