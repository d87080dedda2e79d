// `npm run bench`: prints speed and memory figures against their targets. It never fails a build:
// figures depend on the machine and on what else runs on it, so read them, don't gate on them.
import { runBrowserBench } from "./browser";
import { runCalcBench } from "./calc";
import { runJobsBench } from "./jobs";
import { runPdfBench } from "./pdf";
import { runPhotosBench } from "./photos";

const only = process.argv[2];
const benches: [string, () => Promise<unknown>][] = [
  ["calc", runCalcBench],
  ["jobs", runJobsBench],
  ["photos", runPhotosBench],
  ["pdf", runPdfBench],
  ["browser", runBrowserBench],
];

console.log(`# Warmstead benchmarks — Node ${process.version}, ${(await import("node:os")).cpus().length} cores`);
for (const [name, run] of benches) {
  if (only && only !== name) continue;
  await run();
}
