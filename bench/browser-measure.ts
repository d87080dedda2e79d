// Measurements taken in Chromium on the assessment page, shared by the browser test
// (tests/browser/assessment-large.test.ts) and `npm run bench` (bench/browser.ts).
import { writeFileSync } from "node:fs";
import type { Locator, Page } from "playwright-core";

export type Summary = { n: number; median: number; p95: number; max: number };

export function summarise(values: number[]): Summary {
  const s = [...values].sort((a, b) => a - b);
  const at = (p: number) => s[Math.min(s.length - 1, Math.ceil(p * s.length) - 1)] ?? Number.NaN;
  return { n: s.length, median: at(0.5), p95: at(0.95), max: s.at(-1) ?? Number.NaN };
}

/**
 * Types into a number field `n` times (a digit, then Backspace, and so on), waiting after each
 * key until the page has painted results that reflect it (components/assessment/timings.ts),
 * and returns the page's own keystroke → painted-results figures in ms.
 */
export async function measureKeystrokes(page: Page, field: Locator, n: number, pauseMs = 40): Promise<number[]> {
  await field.focus();
  await page.keyboard.press("End");
  const start = await page.evaluate(() => (window.__warmsteadTimings ??= []).length);
  for (let i = 0; i < n; i++) {
    await page.keyboard.press(i % 2 === 0 ? "7" : "Backspace");
    await page.waitForFunction((want) => (window.__warmsteadTimings?.length ?? 0) >= want, start + i + 1, { timeout: 10_000 });
    await page.waitForTimeout(pauseMs);
  }
  return page.evaluate((from) => window.__warmsteadTimings!.slice(from), start);
}

/** Run before navigation: notes (performance.now) when the form and the results panel first appear. */
export async function watchPanels(page: Page) {
  // A string, not a function: tsx/esbuild may wrap named functions in helpers the page does not have.
  await page.addInitScript(`(() => {
    const seen = (window.__warmsteadSeen = {});
    const check = () => {
      for (const id of ["surface-list", "results-panel"]) if (!(id in seen) && document.querySelector('[data-testid="' + id + '"]')) seen[id] = performance.now();
      if (!("chart" in seen) && document.querySelector(".recharts-wrapper")) seen.chart = performance.now();
    };
    new MutationObserver(check).observe(document, { childList: true, subtree: true });
  })();`);
}

type ScriptEntry = { url: string; start: number; bytes: number; transfer: number };

/**
 * The JavaScript the assessment page loads before its chart code, and whether the chart code
 * (recharts, behind next/dynamic in components/assessment/results/heat-loss.tsx) waited for the
 * results panel: asked for only after the assessment document arrived (the panel renders from it)
 * and not named by the server's HTML. Call watchPanels before `page.goto`, then this.
 */
export async function firstLoad(page: Page) {
  await page.locator(".recharts-wrapper").first().waitFor({ timeout: 30_000 });
  await page.waitForLoadState("networkidle");
  const { seen, scripts, docArrived } = await page.evaluate(() => ({
    seen: (window as unknown as { __warmsteadSeen: Record<string, number> }).__warmsteadSeen,
    scripts: performance.getEntriesByType("resource").filter((e) => (e as PerformanceResourceTiming).initiatorType === "script" || e.name.endsWith(".js"))
      .map((e) => ({ url: e.name, start: e.startTime, bytes: (e as PerformanceResourceTiming).decodedBodySize, transfer: (e as PerformanceResourceTiming).transferSize })),
    // When the assessment document (which the form and the panel both wait for) had arrived.
    docArrived: Math.min(...performance.getEntriesByType("resource").filter((e) => /\/api\/jobs\/[^/]+\/assessment$/.test(new URL(e.name).pathname)).map((e) => (e as PerformanceResourceTiming).responseEnd)),
  }));
  // The server's own HTML for the page (the live DOM also holds the script tags added by dynamic imports).
  const html = await (await page.request.get(page.url())).text();
  const chart: ScriptEntry[] = [];
  for (const sc of scripts as ScriptEntry[]) {
    // recharts' own class names are string literals in its code, minified or not.
    if ((await (await page.request.get(sc.url)).text()).includes("recharts-wrapper")) chart.push(sc);
  }
  const panelAt = seen["results-panel"] ?? Number.NaN;
  const chartStart = Math.min(...chart.map((c) => c.start));
  const before = (scripts as ScriptEntry[]).filter((sc) => sc.start < chartStart && !chart.includes(sc));
  const sum = (l: ScriptEntry[], k: "bytes" | "transfer") => l.reduce((a, x) => a + x[k], 0);
  return {
    formAtMs: seen["surface-list"] ?? Number.NaN,
    panelAtMs: panelAt,
    chartAtMs: seen.chart ?? Number.NaN,
    docAtMs: docArrived,
    scriptsBeforeChart: before.length,
    bytesBeforeChart: sum(before, "bytes"),
    transferBeforeChart: sum(before, "transfer"),
    chartChunks: chart.map((c) => c.url),
    chartBytes: sum(chart, "bytes"),
    /** Every chart chunk was asked for only once the assessment had arrived and the panel was rendering. */
    chartAfterData: chart.length > 0 && chart.every((c) => c.start >= docArrived),
    /** No chart chunk is named by the server's HTML (it is a dynamic import). */
    chartInInitialHtml: chart.some((c) => html.includes(new URL(c.url).pathname)),
  };
}

type ProfileNode = { id: number; callFrame: { functionName: string; url: string; lineNumber: number; columnNumber: number }; children?: number[] };

/**
 * Starts Chromium's counters (Performance.getMetrics) and its CPU profiler on the page; `stop(n)`
 * prints, per keystroke over `n`, the script, style and layout time and the 25 functions with the
 * most self time (minified names, with their file and position); with BENCH_CPUPROFILE=<file> it
 * also writes the profile there.
 */
export async function startProfile(page: Page) {
  const cdp = await page.context().newCDPSession(page);
  await cdp.send("Performance.enable");
  await cdp.send("Profiler.enable");
  await cdp.send("Profiler.setSamplingInterval", { interval: 200 });
  const metrics = async () => Object.fromEntries((await cdp.send("Performance.getMetrics")).metrics.map((m) => [m.name, m.value])) as Record<string, number>;
  const before = await metrics();
  await cdp.send("Profiler.start");
  return {
    async stop(n: number) {
      const { profile } = (await cdp.send("Profiler.stop")) as unknown as { profile: { nodes: ProfileNode[]; samples: number[]; timeDeltas: number[] } };
      // BENCH_CPUPROFILE=<file>: the whole profile, for Chromium DevTools' Performance panel.
      if (process.env.BENCH_CPUPROFILE) writeFileSync(process.env.BENCH_CPUPROFILE, JSON.stringify(profile));
      const after = await metrics();
      const per = (k: string) => `${(((after[k] ?? 0) - (before[k] ?? 0)) * 1000 / n).toFixed(1)} ms`;
      console.log(`per keystroke: task ${per("TaskDuration")}, script ${per("ScriptDuration")}, style ${per("RecalcStyleDuration")}, layout ${per("LayoutDuration")}`);
      const byId = new Map(profile.nodes.map((x) => [x.id, x]));
      const self = new Map<string, number>();
      profile.samples.forEach((id, i) => {
        const f = byId.get(id)!.callFrame;
        const key = `${f.functionName || "(anonymous)"} ${f.url.split("/").pop()}:${f.lineNumber + 1}:${f.columnNumber + 1}`;
        self.set(key, (self.get(key) ?? 0) + (profile.timeDeltas[i] ?? 0) / 1000);
      });
      for (const [key, ms] of [...self].sort((a, b) => b[1] - a[1]).slice(0, 25)) console.log(`${(ms / n).toFixed(2).padStart(7)} ms/key  ${key}`);
      await cdp.detach();
    },
  };
}
