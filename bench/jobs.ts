// GET /api/jobs under load on the production server, beside a trivial handler on the same server.
// Seeds 10,000 jobs into a temporary database. Targets (issue 2): p95 ≤ 20 ms and at least half
// the trivial handler's throughput. Throughput is measured with 8 connections (the server
// saturated); latency with 1 connection, since with 8 at once it mostly measures the queue.
// Needs `npm run build` first. Prints figures; never fails.
import autocannon from "autocannon";
import { spawn } from "node:child_process";
import { mkdtempSync, readdirSync, readFileSync, rmSync } from "node:fs";
import os from "node:os";
import path from "node:path";
import { createDb } from "@/db";
import { applyMigrations } from "@/db/migrate";
import { clients, houses, jobs } from "@/db/schema";
import { demoCompanyId, demoPassword, seedDatabase, seedId } from "@/db/seed";
import { jobStages } from "@/lib/stages";
import { waitForServer } from "./server";

const root = path.resolve(import.meta.dirname, "..");
const PORT = 3190;
const base = `http://127.0.0.1:${PORT}`;

export async function seedManyJobs(url: string, n: number) {
  const db = createDb(url);
  await applyMigrations(db);
  await seedDatabase(db);
  const streets = ["Alder", "Birchwood", "Cinder", "Dovecote", "Elmstead", "Furrow", "Gable", "Hearth", "Ironbark", "Juniper"];
  // 50 × 97 invented name pairs, so a surname search matches about 1 % of jobs, as a real one would.
  const given = Array.from({ length: 50 }, (_, i) => `Given${i}`);
  const family = Array.from({ length: 97 }, (_, i) => `Famname${String.fromCharCode(97 + (i % 26))}${i}`);
  const batch = 500;
  for (let start = 0; start < n; start += batch) {
    await db.transaction(async (tx) => {
      for (let i = start; i < Math.min(n, start + batch); i++) {
        const clientId = seedId(`bench-client:${i}`);
        const houseId = seedId(`bench-house:${i}`);
        await tx.insert(clients).values({ id: clientId, companyId: demoCompanyId, name: `${given[i % 50]} ${family[i % 97]}` });
        await tx.insert(houses).values({
          id: houseId, companyId: demoCompanyId, clientId, street: `${i} ${streets[i % 10]} Road`, city: "Harrowmere", state: "NJ", postalCode: "07000",
          yearBuilt: 1900 + (i % 120), stories: 2, conditionedAreaFt2: 1500, volumeFt3: 12000, bedrooms: 3, foundation: "basement",
        });
        await tx.insert(jobs).values({
          id: seedId(`bench-job:${i}`), companyId: demoCompanyId, number: 2000 + i, houseId, clientId, title: `Bench job ${i}`,
          stage: jobStages[i % jobStages.length], createdById: seedId("user:owner"), updatedAt: new Date(Date.now() - i * 60_000),
        });
      }
    });
  }
  db.$client.close();
}

/** Signs in through next-auth's own endpoints and returns the session cookie. */
async function sessionCookie(email: string) {
  const csrfRes = await fetch(`${base}/api/auth/csrf`);
  const { csrfToken } = (await csrfRes.json()) as { csrfToken: string };
  const jar = csrfRes.headers.getSetCookie().map((c) => c.split(";")[0]).join("; ");
  const res = await fetch(`${base}/api/auth/callback/credentials`, {
    method: "POST",
    redirect: "manual",
    headers: { "content-type": "application/x-www-form-urlencoded", cookie: jar },
    body: new URLSearchParams({ csrfToken, email, password: demoPassword }),
  });
  const session = res.headers.getSetCookie().find((c) => c.includes("authjs.session-token="));
  if (!session) throw new Error("sign-in for the bench failed");
  return session.split(";")[0]!;
}

type Figures = { path: string; rps: number; p50: number; p95: number; p99: number; errors: number; cpuMs: number };

/**
 * CPU time (user + system, ms) used so far by a process and its children (`next start` serves
 * from a child process). Less sensitive than throughput to other work on a shared machine.
 */
function processTreeCpuMs(rootPid: number | undefined): number {
  if (rootPid === undefined) return NaN;
  const tick = 1000 / 100; // USER_HZ
  let total = 0;
  for (const entry of readdirSync("/proc")) {
    if (!/^\d+$/.test(entry)) continue;
    try {
      const fields = readFileSync(`/proc/${entry}/stat`, "utf8").split(") ")[1]!.split(" ");
      if (Number(entry) === rootPid || Number(fields[1]) === rootPid) total += (Number(fields[11]) + Number(fields[12])) * tick;
    } catch {
      // the process ended while we looked
    }
  }
  return total;
}

let serverPid: number | undefined;

async function load(pathAndQuery: string, cookie?: string, connections = 8): Promise<Figures> {
  const latencies: number[] = [];
  const cpuBefore = processTreeCpuMs(serverPid);
  const instance = autocannon({ url: `${base}${pathAndQuery}`, connections, duration: 6, headers: cookie ? { cookie } : {} });
  // autocannon's run object is both a promise of the result and an event emitter of each response.
  (instance as unknown as NodeJS.EventEmitter).on("response", (_client: unknown, _status: number, _bytes: number, ms: number) => latencies.push(ms));
  const result = await instance;
  const cpuMs = (processTreeCpuMs(serverPid) - cpuBefore) / result.requests.total;
  latencies.sort((a, b) => a - b);
  const at = (p: number) => latencies[Math.min(latencies.length - 1, Math.floor(p * latencies.length))] ?? NaN;
  return { path: pathAndQuery, rps: result.requests.average, p50: at(0.5), p95: at(0.95), p99: at(0.99), errors: result.non2xx + result.errors, cpuMs };
}

export async function runJobsBench() {
  const dir = mkdtempSync(path.join(os.tmpdir(), "warmstead-bench-"));
  const url = `file:${path.join(dir, "bench.db")}`;
  console.log("\n## GET /api/jobs with 10,000 jobs (autocannon, 6 s each, loopback)");
  const t0 = performance.now();
  await seedManyJobs(url, 10_000);
  console.log(`seeded 10,000 jobs in ${((performance.now() - t0) / 1000).toFixed(1)} s`);
  const server = spawn(process.execPath, [path.join(root, "node_modules/next/dist/bin/next"), "start", "-p", String(PORT)], {
    cwd: root,
    env: { ...process.env, NODE_ENV: "production", DATABASE_URL: url, AUTH_SECRET: "bench-secret-0123456789abcdef0123", AUTH_TRUST_HOST: "true", NEXT_TELEMETRY_DISABLED: "1" },
    stdio: "ignore",
  });
  serverPid = server.pid;
  try {
    await waitForServer(`${base}/api/health`);
    const cookie = await sessionCookie("owner@kestrelbay.example");
    // Warm-up: every route measured below, once, so none is measured while its code is still
    // being compiled and optimised (the first route measured used to pay for that alone).
    const jobsPaths = ["/api/jobs", "/api/jobs?q=Famnamef31", "/api/jobs?q=Dovecote", "/api/jobs?stage=installing"];
    await load("/api/health");
    for (const p of jobsPaths) await load(p, cookie);
    const trivialBefore = await load("/api/health");
    const measured: Figures[] = [];
    for (const p of jobsPaths) measured.push(await load(p, cookie));
    // The trivial route before and after the others, averaged, so a change in the machine's load
    // during the run weighs on both sides of each ratio alike.
    const trivialAfter = await load("/api/health");
    const trivial: Figures = { ...trivialBefore, rps: (trivialBefore.rps + trivialAfter.rps) / 2, cpuMs: (trivialBefore.cpuMs + trivialAfter.cpuMs) / 2, p50: Math.max(trivialBefore.p50, trivialAfter.p50), p95: Math.max(trivialBefore.p95, trivialAfter.p95), p99: Math.max(trivialBefore.p99, trivialAfter.p99), errors: trivialBefore.errors + trivialAfter.errors };
    const rows = [trivial, ...measured];
    console.log("Throughput: 8 connections, the server saturated (latency here is mostly queueing: 8 requests wait on one event loop).");
    console.log("Server CPU per request is the server's own CPU time over the run divided by the requests answered; the trivial route's over a route's is what its throughput ratio would be on an otherwise idle machine.");
    console.log("| route | req/s | p50 ms | p95 ms | p99 ms | non-2xx | throughput vs trivial | server CPU ms/request | CPU vs trivial |");
    console.log("| --- | --- | --- | --- | --- | --- | --- | --- | --- |");
    for (const r of rows) {
      console.log(`| ${r.path} | ${r.rps.toFixed(0)} | ${r.p50.toFixed(1)} | ${r.p95.toFixed(1)} | ${r.p99.toFixed(1)} | ${r.errors} | ${(r.rps / trivial.rps).toFixed(2)} | ${r.cpuMs.toFixed(2)} | ${(trivial.cpuMs / r.cpuMs).toFixed(2)} |`);
    }
    // The latency one user sees: one request at a time, nothing queued ahead of it.
    const single = [await load("/api/health", undefined, 1)];
    for (const p of jobsPaths) single.push(await load(p, cookie, 1));
    console.log("\nLatency: 1 connection, one request at a time.");
    console.log("| route | req/s | p50 ms | p95 ms | p99 ms | non-2xx |");
    console.log("| --- | --- | --- | --- | --- | --- |");
    for (const r of single) console.log(`| ${r.path} | ${r.rps.toFixed(0)} | ${r.p50.toFixed(1)} | ${r.p95.toFixed(1)} | ${r.p99.toFixed(1)} | ${r.errors} |`);
    const jobsRows = rows.slice(1);
    const worstP95 = Math.max(...single.slice(1).map((r) => r.p95));
    const worstRatio = Math.min(...jobsRows.map((r) => r.rps / trivial.rps));
    console.log(`target p95 ≤ 20 ms (1 connection): worst ${worstP95.toFixed(1)} ms → ${worstP95 <= 20 ? "met" : "NOT met"}`);
    console.log(`target ≥ 0.5 × trivial throughput (8 connections): worst ${worstRatio.toFixed(2)} → ${worstRatio >= 0.5 ? "met" : "NOT met"}`);
    console.log(`load average ${os.loadavg().map((x) => x.toFixed(2)).join(" ")} on ${os.cpus().length} CPUs (other work on the machine lowers every figure)`);
  } finally {
    server.kill("SIGTERM");
    rmSync(dir, { recursive: true, force: true });
  }
}

if (import.meta.url === `file://${process.argv[1]}`) await runJobsBench();
