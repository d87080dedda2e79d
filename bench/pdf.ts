// PDF bench: render time of the demo savings report against a plain React-PDF document of the
// same page count (the same registered fonts, text only), in the same run, and resident memory
// after 50 consecutive renders against after the first 5. Prints figures beside the targets of
// issue 5 and never throws on a missed target: figures depend on the machine and its load.
// Run: npx tsx bench/pdf.ts (or through runPdfBench()).
import { loadavg } from "node:os";
import { pathToFileURL } from "node:url";
import { Document, Page, renderToBuffer, Text, View } from "@react-pdf/renderer";
import { createElement as h } from "react";
import { BODY, registerFonts } from "../reports/parts/fonts";
import { renderSnapshotPdf } from "../reports/render";
import { demoSnapshot } from "../tests/support/demo-snapshot";

const TARGET_RATIO = 1.5;
const TARGET_MEDIAN_MS = 600;
const TARGET_RSS_RATIO = 1.2;
const WARMUP = 3;
const RUNS = 10;
const CREEP_RUNS = 50;
const CREEP_BASE = 5;

const LOREM =
  "The house was measured at test-in and each wall, ceiling and floor entered with its layer stack. " +
  "Handbook methods turn the layers into U-factors and the blower-door reading into natural air changes. ";

/** A plain document: `pages` Letter pages of body text in the report's body face, no charts or tables. */
function plainDocument(pages: number) {
  registerFonts();
  return h(
    Document,
    null,
    Array.from({ length: pages }, (_, i) =>
      h(
        Page,
        { key: i, size: "LETTER", style: { fontFamily: BODY, fontSize: 10, padding: 48 } },
        h(Text, { style: { fontSize: 18, marginBottom: 8 } }, `Page ${i + 1}`),
        ...Array.from({ length: 8 }, (_, j) => h(View, { key: j, style: { marginBottom: 6 } }, h(Text, null, LOREM.repeat(3)))),
      ),
    ),
  );
}

const median = (xs: number[]) => {
  const s = [...xs].sort((a, b) => a - b);
  const m = Math.floor(s.length / 2);
  return s.length % 2 ? s[m] : (s[m - 1] + s[m]) / 2;
};

async function timeRuns(fn: () => Promise<unknown>, runs: number) {
  const out: number[] = [];
  for (let i = 0; i < runs; i++) {
    const t0 = performance.now();
    await fn();
    out.push(performance.now() - t0);
  }
  return out;
}

const gc = (globalThis as { gc?: () => void }).gc;
/** Lets pending tasks (finalizers among them) run; with --expose-gc and `collect`, collects first. */
async function settle(collect: boolean) {
  for (let k = 0; k < (collect ? 3 : 1); k++) {
    if (collect) gc?.();
    await new Promise((r) => setImmediate(r));
  }
}

const pageCount = (buf: Buffer) => (buf.toString("latin1").match(/\/Type\s*\/Page[^s]/g) ?? []).length;
const mb = (b: number) => `${(b / 1024 / 1024).toFixed(1)} MB`;
const ok = (pass: boolean) => (pass ? "ok" : "MISSED");

export async function runPdfBench() {
  const snapshot = demoSnapshot("savings-report");
  console.log("\n## PDF: demo savings report vs a plain React-PDF document of the same page count");
  // The server renders PDFs with React's production build; `npm run bench` sets NODE_ENV for that.
  console.log(`React build: ${process.env.NODE_ENV === "production" ? "production" : "development (slower: run through npm run bench, or NODE_ENV=production)"}`);
  const load = () => loadavg().map((x) => x.toFixed(2)).join(", ");
  console.log(`load average at start: ${load()}`);

  const t0 = performance.now();
  const first = await renderSnapshotPdf(snapshot);
  const coldMs = performance.now() - t0;
  const pages = pageCount(first);
  const plain = plainDocument(pages);
  const plainPages = pageCount(await renderToBuffer(plain));
  console.log(`report: ${pages} pages, ${(first.length / 1024).toFixed(0)} KB, cold render ${coldMs.toFixed(0)} ms; plain document: ${plainPages} pages`);

  // Warm: a few renders of each first, then alternate so load on the machine hits both alike.
  await timeRuns(() => renderSnapshotPdf(snapshot), WARMUP);
  await timeRuns(() => renderToBuffer(plain), WARMUP);
  const report: number[] = [];
  const base: number[] = [];
  for (let i = 0; i < RUNS; i++) {
    report.push(...(await timeRuns(() => renderSnapshotPdf(snapshot), 1)));
    base.push(...(await timeRuns(() => renderToBuffer(plain), 1)));
  }
  const mReport = median(report);
  const mPlain = median(base);
  const ratio = mReport / mPlain;
  console.log(`warm median of ${RUNS}: report ${mReport.toFixed(0)} ms (target <= ${TARGET_MEDIAN_MS} ms: ${ok(mReport <= TARGET_MEDIAN_MS)}), plain ${mPlain.toFixed(0)} ms`);
  console.log(`ratio report / plain: ${ratio.toFixed(2)}x (target <= ${TARGET_RATIO}x: ${ok(ratio <= TARGET_RATIO)})`);
  console.log(`  report runs (ms): ${report.map((x) => x.toFixed(0)).join(" ")}`);
  console.log(`  plain runs (ms):  ${base.map((x) => x.toFixed(0)).join(" ")}`);
  console.log(`load average after the timed runs: ${load()} (other work on the machine slows both documents, not always alike)`);

  // Memory creep: resident size after the first 5 of 50 consecutive renders, and after all 50.
  // Between renders the event loop turns once, as it does between requests in a server: Yoga's
  // layout nodes are released by a FinalizationRegistry, whose callbacks run only as tasks, so a
  // loop of renders chained on promises alone would hold every render's nodes until it ended.
  let rssAfterBase = 0;
  for (let i = 1; i <= CREEP_RUNS; i++) {
    await renderSnapshotPdf(snapshot);
    await settle(i === CREEP_BASE);
    if (i === CREEP_BASE) rssAfterBase = process.memoryUsage().rss;
  }
  await settle(true);
  const rssAfterAll = process.memoryUsage().rss;
  const rssRatio = rssAfterAll / rssAfterBase;
  console.log(`RSS after ${CREEP_BASE} renders: ${mb(rssAfterBase)}; after ${CREEP_RUNS}: ${mb(rssAfterAll)}`);
  console.log(`RSS ratio: ${rssRatio.toFixed(2)} (target <= ${TARGET_RSS_RATIO}: ${ok(rssRatio <= TARGET_RSS_RATIO)})${gc ? "" : " (run with --expose-gc to collect before each reading)"}`);
  return { pages, coldMs, medianReportMs: mReport, medianPlainMs: mPlain, ratio, rssAfterBase, rssAfterAll, rssRatio };
}

if (import.meta.url === pathToFileURL(process.argv[1] ?? "").href) {
  await runPdfBench();
}
