// Calc bench: analyzeHouse on a 60-surface house with 6 upgrades, and a full-year
// EPW parse. Run: npx tsx bench/calc.ts (or through runCalcBench()).
import { readFileSync } from "node:fs";
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

export async function runCalcBench(): Promise<void> {
  const house = benchHouse();
  const prepared = prepareHouseInput(house);
  const epwText = readFileSync(EPW_PATH, "utf8");
  const bench = new Bench({ time: 1500, warmup: true, warmupTime: 500 });
  bench
    .add("analyzeHouse, 60 surfaces, 6 upgrades (zod validation included)", () => { analyzeHouse(house); })
    .add("analyzePrepared, same house, input already validated", () => { analyzePrepared(prepared); })
    .add("parseEpw, one year (Golden, CO)", () => { parseEpw(epwText); });
  await bench.run();
  for (const t of bench.tasks) {
    const r = t.result;
    if (!r || !("latency" in r)) { console.log(`${t.name}: no result`); continue; }
    const l = r.latency;
    console.log(`${t.name}\n  median ${ms(l.p50 ?? NaN)}  p75 ${ms(l.p75 ?? NaN)}  p99 ${ms(l.p99 ?? NaN)}  min ${ms(l.min)}  max ${ms(l.max)}  (${l.samplesCount} runs)`);
  }
  // Memory during one EPW parse: heap and RSS growth over the file's size (UTF-16 string excluded; it exists before).
  const g = globalThis as { gc?: () => void };
  g.gc?.();
  const heap0 = process.memoryUsage().heapUsed;
  const rss0 = process.memoryUsage().rss;
  let peakHeap = heap0;
  let peakRss = rss0;
  const parsed = parseEpw(epwText);
  const m = process.memoryUsage();
  peakHeap = Math.max(peakHeap, m.heapUsed);
  peakRss = Math.max(peakRss, m.rss);
  const size = Buffer.byteLength(epwText);
  console.log(`EPW parse memory: file ${(size / 1e6).toFixed(2)} MB; heap +${((peakHeap - heap0) / 1e6).toFixed(2)} MB (${((peakHeap - heap0) / size).toFixed(2)}× file), RSS +${((peakRss - rss0) / 1e6).toFixed(2)} MB (${((peakRss - rss0) / size).toFixed(2)}× file)${g.gc ? "" : " — run with --expose-gc for a clean baseline"}; ${parsed.hours} hours`);
  console.log(`Targets: analyzeHouse median ≤ ${TARGET_ANALYZE_MS} ms; EPW parse ≤ ${TARGET_EPW_MS} ms; EPW peak memory < ${TARGET_EPW_MEMORY_RATIO}× file size`);
}

if (process.argv[1] && path.resolve(process.argv[1]) === fileURLToPath(import.meta.url)) {
  runCalcBench().catch((e) => { console.error(e); process.exit(1); });
}
