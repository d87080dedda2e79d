// Assessment page in Chromium (playwright-core, /usr/bin/chromium) against the production build:
// a fresh seeded temporary database, `next start`, an auditor signs in, a 60-surface job
// (lib/assessment/large-house.ts, invented) is loaded, and a field is typed into N times.
// Prints keystroke → painted-results median and p95 against the 100 ms target (issue 4), the
// JavaScript the page loads before its chart code, and whether the recharts chunk waits for
// the results panel. Needs a production build (`npm run build`, or NEXT_DIST_DIR=<dir> npx next build);
// without one it says so and prints nothing else. Never fails on a missed target.
// Run: npx tsx bench/browser.ts (or through runBrowserBench()); BENCH_PROFILE=1 adds, per
// keystroke, Chromium's script / style / layout time and the functions with the most self time.
// BENCH_TRACE=<file> writes a Chromium trace of the measured keystrokes.
import { spawn } from "node:child_process";
import { existsSync, mkdtempSync, rmSync } from "node:fs";
import os from "node:os";
import path from "node:path";
import { pathToFileURL } from "node:url";
import { chromium } from "playwright-core";
import { createDb } from "@/db";
import { applyMigrations } from "@/db/migrate";
import { demoPassword, seedDatabase } from "@/db/seed";
import type { AssessmentDoc } from "@/lib/assessment/doc";
import { largeHouseDoc } from "@/lib/assessment/large-house";
import { firstLoad, measureKeystrokes, startProfile, summarise, watchPanels } from "./browser-measure";
import { waitForServer } from "./server";

const root = path.resolve(import.meta.dirname, "..");
const PORT = Number(process.env.BENCH_BROWSER_PORT ?? 3191);
const base = `http://127.0.0.1:${PORT}`;
const KEYSTROKES = Number(process.env.BENCH_KEYSTROKES ?? 40);
const TARGET_MS = 100;
const chromiumPath = process.env.CHROMIUM_PATH ?? "/usr/bin/chromium";

const TRACE_CATEGORIES = ["devtools.timeline", "disabled-by-default-devtools.timeline", "disabled-by-default-devtools.timeline.frame", "blink", "cc", "viz", "benchmark", "toplevel"];

const kib = (b: number) => `${(b / 1024).toFixed(0)} KiB`;

export async function runBrowserBench() {
  console.log(`\n## Assessment page in Chromium: 60-surface house, ${KEYSTROKES} keystrokes (production build)`);
  const distDir = process.env.NEXT_DIST_DIR ?? ".next";
  if (!existsSync(path.join(root, distDir, "BUILD_ID"))) {
    console.log(`no production build in ${distDir}/: run \`npm run build\` (or \`NEXT_DIST_DIR=${distDir} npx next build\`) first, then \`npm run bench browser\`. Skipped.`);
    return null;
  }
  if (!existsSync(chromiumPath)) {
    console.log(`no Chromium at ${chromiumPath} (set CHROMIUM_PATH). Skipped.`);
    return null;
  }
  const dir = mkdtempSync(path.join(os.tmpdir(), "warmstead-bench-browser-"));
  const url = `file:${path.join(dir, "bench.db")}`;
  const db = createDb(url);
  await applyMigrations(db);
  await seedDatabase(db);
  db.$client.close();
  const server = spawn(process.execPath, [path.join(root, "node_modules/next/dist/bin/next"), "start", "-p", String(PORT)], {
    cwd: root,
    env: { ...process.env, NODE_ENV: "production", NEXT_DIST_DIR: distDir, DATABASE_URL: url, WARMSTEAD_DATA_DIR: dir, AUTH_SECRET: "bench-secret-0123456789abcdef0123", AUTH_TRUST_HOST: "true", NEXT_TELEMETRY_DISABLED: "1" },
    stdio: "ignore",
  });
  const browser = await chromium.launch({ executablePath: chromiumPath, headless: true, args: ["--no-sandbox", "--disable-gpu", "--no-first-run", "--disable-background-networking"] });
  try {
    await waitForServer(`${base}/api/health`);
    const context = await browser.newContext({ baseURL: base, viewport: { width: 1280, height: 900 } });
    const page = await context.newPage();
    await page.goto("/sign-in");
    await page.getByLabel("E-mail").fill("auditor@kestrelbay.example");
    await page.getByLabel("Password").fill(demoPassword);
    await page.getByRole("button", { name: "Sign in" }).click();
    await page.waitForURL(/\/jobs$/);
    const headers = { origin: base };
    const created = await page.request.post("/api/jobs", {
      headers,
      data: { client: { name: "Bench Client" }, house: { street: "60 Bench Row", city: "Harrowmere", state: "NJ", postalCode: "07000", yearBuilt: 1912, stories: "3", conditionedAreaFt2: 2500, ceilingHeightFt: 8.5, bedrooms: 5, foundation: "basement", shielding: "normal" } },
    });
    if (created.status() !== 201) throw new Error(`creating the bench job answered ${created.status()}`);
    const { job } = (await created.json()) as { job: { id: string } };
    const current = (await (await page.request.get(`/api/jobs/${job.id}/assessment`)).json()) as { version: number; doc: AssessmentDoc };
    const put = await page.request.put(`/api/jobs/${job.id}/assessment`, { headers, data: { version: current.version, doc: largeHouseDoc(current.doc) } });
    if (put.status() !== 200) throw new Error(`saving the 60-surface house answered ${put.status()}: ${await put.text()}`);

    await watchPanels(page);
    await page.goto(`/jobs/${job.id}/assessment`);
    const load = await firstLoad(page);
    const field = page.getByTestId("surface-30").getByLabel("Gross area (ft²)");
    await measureKeystrokes(page, field, 4); // warm-up: first renders, JIT
    // BENCH_PROFILE=1: where the milliseconds go while typing (Chromium's own counters and a CPU profile).
    const profiling = process.env.BENCH_PROFILE === "1" ? await startProfile(page) : null;
    // BENCH_TRACE=<file>: a Chromium trace of the measured keystrokes (paint, raster, layers), for chrome://tracing or Perfetto.
    const tracePath = process.env.BENCH_TRACE;
    if (tracePath) await browser.startTracing(page, { path: tracePath, categories: TRACE_CATEGORIES });
    const s = summarise(await measureKeystrokes(page, field, KEYSTROKES));
    if (tracePath) await browser.stopTracing();
    if (profiling) await profiling.stop(KEYSTROKES);

    console.log("| figure | value | target |");
    console.log("| --- | --- | --- |");
    console.log(`| keystroke → painted results, median | ${s.median.toFixed(1)} ms | ≤ ${TARGET_MS} ms: ${s.median <= TARGET_MS ? "met" : "NOT met"} |`);
    console.log(`| keystroke → painted results, p95 | ${s.p95.toFixed(1)} ms | ≤ ${TARGET_MS} ms: ${s.p95 <= TARGET_MS ? "met" : "NOT met"} |`);
    console.log(`| keystroke → painted results, max | ${s.max.toFixed(1)} ms | |`);
    console.log(`| JavaScript loaded before the chart code | ${load.scriptsBeforeChart} files, ${kib(load.bytesBeforeChart)} (${kib(load.transferBeforeChart)} over the wire) | light |`);
    console.log(`| assessment data / form / results panel / chart on screen | ${load.docAtMs.toFixed(0)} / ${load.formAtMs.toFixed(0)} / ${load.panelAtMs.toFixed(0)} / ${load.chartAtMs.toFixed(0)} ms after navigation | |`);
    console.log(`| recharts chunk | ${load.chartChunks.length} file(s), ${kib(load.chartBytes)} | loaded with the panel |`);
    console.log(`| recharts asked for only once the assessment arrived (with the panel) | ${load.chartAfterData ? "yes" : "NO"} | yes |`);
    console.log(`| recharts named in the server's HTML | ${load.chartInInitialHtml ? "YES" : "no"} | no (dynamic import) |`);
    await context.close();
    return { keystrokes: s, load };
  } finally {
    await browser.close();
    server.kill("SIGTERM");
    rmSync(dir, { recursive: true, force: true });
  }
}

if (import.meta.url === pathToFileURL(process.argv[1] ?? "").href) await runBrowserBench();
