// Calc bench: analyzeHouse on a 60-surface house with 6 upgrades, and a full-year
// EPW parse. Run: npx tsx bench/calc.ts (or through runCalcBench()).
import { readFileSync } from "node:fs";
import os from "node:os";
import { PerformanceObserver } from "node:perf_hooks";
import v8 from "node:v8";
import vm from "node:vm";
import path from "node:path";
import { fileURLToPath } from "node:url";
import { Bench } from "tinybench";
import { analyzeHouse, analyzePrepared, demoHouseInput, parseEpw, prepareHouseInput, type HouseInput } from "../calc";

const here = path.dirname(fileURLToPath(import.meta.url));
const EPW_PATH = path.resolve(here, "../../shared/data/climate/epw/USA_CO_Golden-NREL.724666_TMY3.epw");
// Targets of issue 3 on this machine
const TARGET_ANALYZE_MS = 0.2;
const TARGET_EPW_MS = 150;
const TARGET_EPW_MEMORY_RATIO = 3;

/** The demo house scaled to 60 surfaces (each demo surface split in ten) with 6 upgrades. */
export function benchHouse(): HouseInput {
  const base: NonNullable<HouseInput["surfaces"]> = demoHouseInput.surfaces;
  const surfaces = base.flatMap((s) =>
    Array.from({ length: 10 }, (_, k) => ({
      ...s, id: `${s.id}-${k}`, name: `${s.name} ${k + 1}`, grossAreaFt2: s.grossAreaFt2 / 10,
      openings: (s.openings ?? []).map((o) => ({ ...o, count: 1, areaFt2: (o.areaFt2 * (o.count ?? 1)) / 10 })),
    })));
  return {
    ...demoHouseInput, surfaces,
    upgrades: [
      { type: "air-sealing", targetCfm50: 3000, costUSD: 1200 },
      { type: "air-sealing", targetCfm50: 2400, costUSD: 900 },
      { type: "attic-insulation", targetRIP: 49, costUSD: 2600 },
      { type: "dense-pack-walls", surfaceIds: surfaces.filter((s) => s.kind === "wall" && s.orientation !== "N").map((s) => s.id), costUSD: 3900 },
      { type: "dense-pack-walls", surfaceIds: surfaces.filter((s) => s.kind === "wall" && s.orientation === "N").map((s) => s.id), costUSD: 1300 },
      { type: "windows", uFactorIP: 0.3, costUSD: 14000 },
    ],
  };
}

const ms = (x: number) => `${x.toFixed(3)} ms`;
const mb = (x: number) => `${(x / 1e6).toFixed(2)} MB`;

/**
 * Memory of one EPW parse: after a full GC, the heap and RSS growth across the parse with no
 * collection in between (so every byte the parse allocated, kept or not, is counted: an upper
 * bound on its peak). The file's text already exists before the parse and is not counted.
 */
function epwMemory(text: string): string {
  v8.setFlagsFromString("--expose-gc");
  const gc = vm.runInNewContext("gc") as () => void;
  let gcs = 0;
  const obs = new PerformanceObserver((list) => { gcs += list.getEntries().length; });
  obs.observe({ entryTypes: ["gc"] });
  gc();
  gc();
  const before = process.memoryUsage();
  const parsed = parseEpw(text);
  const after = process.memoryUsage();
  obs.disconnect();
  const size = Buffer.byteLength(text);
  const heap = after.heapUsed - before.heapUsed + (after.arrayBuffers - before.arrayBuffers);
  const rss = after.rss - before.rss;
  return `EPW parse memory (${parsed.hours} hours): file ${mb(size)}; heap + array buffers grew ${mb(heap)} = ${(heap / size).toFixed(2)}× the file; RSS change ${mb(rss)} (page-level and lazily returned to the OS, so only a rough check); collections during the parse: ${gcs}`;
}

// What the analysis benches measure, printed with the figures.
const METHOD_NOTE = "Each timed analyzeHouse / analyzePrepared call gets a fresh deep copy of the bench house (structuredClone in tinybench's beforeEach, "
  + "or prepareHouseInput on such a copy for analyzePrepared; neither is timed), so nothing keyed on the input objects can carry over between calls. "
  + "Kept across calls: only what calc memoises per built-in assembly definition (module constants): its U-factor result, its upgraded variants and their nominal R.";

export async function runCalcBench(): Promise<void> {
  const house = benchHouse();
  const epwText = readFileSync(EPW_PATH, "utf8");
  const bench = new Bench({ time: 1500, warmup: true, warmupTime: 500 });
  let copy: unknown = house;
  let prepared = prepareHouseInput(structuredClone(house));
  bench
    .add("analyzeHouse, 60 surfaces, 6 upgrades (zod validation included)", () => { analyzeHouse(copy); }, { beforeEach: () => { copy = structuredClone(house); } })
    .add("analyzePrepared, same house, input already validated", () => { analyzePrepared(prepared); }, { beforeEach: () => { prepared = prepareHouseInput(structuredClone(house)); } })
    .add("parseEpw, one year (Golden, CO)", () => { parseEpw(epwText); });
  await bench.run();
  console.log(METHOD_NOTE);
  for (const t of bench.tasks) {
    const r = t.result;
    if (!r || !("latency" in r)) { console.log(`${t.name}: no result`); continue; }
    const l = r.latency;
    console.log(`${t.name}\n  median ${ms(l.p50 ?? NaN)}  p75 ${ms(l.p75 ?? NaN)}  p99 ${ms(l.p99 ?? NaN)}  min ${ms(l.min)}  max ${ms(l.max)}  (${l.samplesCount} runs)`);
  }
  // CPU time per call, less sensitive than wall time to other processes on a shared machine;
  // every call on its own deep copy, made in batches before each timed loop
  const cpu = <T>(make: () => T, f: (x: T) => void, n: number, batch = 10) => {
    let us = 0;
    for (let done = 0; done < n; done += batch) {
      const inputs = Array.from({ length: Math.min(batch, n - done) }, make);
      const t = process.cpuUsage();
      for (const x of inputs) f(x);
      const d = process.cpuUsage(t);
      us += d.user + d.system;
    }
    return us / 1000 / n;
  };
  const houseCpu = cpu(() => structuredClone(house), (x) => analyzeHouse(x), 2000);
  const preparedCpu = cpu(() => prepareHouseInput(structuredClone(house)), (x) => analyzePrepared(x), 2000);
  console.log(`CPU time per call: analyzeHouse ${ms(houseCpu)}, analyzePrepared ${ms(preparedCpu)}, parseEpw ${ms(cpu(() => epwText, (x) => parseEpw(x), 30, 30))}; load average ${os.loadavg()[0].toFixed(2)} on ${os.cpus().length} CPUs`);
  console.log(epwMemory(epwText));
  console.log(`Targets: analyzeHouse median ≤ ${TARGET_ANALYZE_MS} ms; EPW parse ≤ ${TARGET_EPW_MS} ms; EPW peak memory < ${TARGET_EPW_MEMORY_RATIO}× file size`);
}

if (process.argv[1] && path.resolve(process.argv[1]) === fileURLToPath(import.meta.url)) {
  runCalcBench().catch((e) => { console.error(e); process.exit(1); });
}
