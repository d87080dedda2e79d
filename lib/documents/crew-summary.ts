// The crew log's summary, as a savings report freezes it. Pure: it takes what getCrewLog
// (lib/data/crew-log.ts) already worked out for the office and keeps only what the report shows.
import type { CrewLogView } from "@/lib/data/crew-log";
import type { CrewSummarySnapshot } from "./snapshot";

/** The summary to freeze, or undefined when the crew has logged nothing on the job yet. */
export function freezeCrewSummary(log: Pick<CrewLogView, "summary" | "walls" | "otherEntries" | "testOut">): CrewSummarySnapshot | undefined {
  const entries = log.walls.reduce((a, w) => a + w.logged.entries, 0) + log.otherEntries.length;
  if (entries === 0) return undefined;
  const s = log.summary;
  const t = log.testOut;
  return {
    entries,
    bags: { ...s.bags },
    holes: { ...s.holes },
    wallsFinished: s.wallsFinished,
    wallsTotal: s.wallsTotal,
    perWall: s.perWall.map((w) => ({ surfaceId: w.surfaceId, name: w.name, expectedBags: w.expectedBags, loggedBags: w.loggedBags, ratio: w.ratio, status: w.status, finished: w.finished })),
    warnings: s.warnings.map((w) => ({
      wall: w.wall, kind: w.kind, bagsAtRaise: w.bagsAtRaise, raisedAt: w.raisedAt, state: w.state,
      resolution: w.resolution ? { note: w.resolution.note, by: w.resolution.by, at: w.resolution.at } : null,
    })),
    testOut: t.testOut && t.measuredCfm50 !== null
      ? { testInCfm50: t.testInCfm50, predictedCfm50: t.predictedCfm50, measuredCfm50: t.measuredCfm50, measuredReductionPct: t.measuredReductionPct, testedAt: t.testOut.testedAt }
      : null,
  };
}

/** "as expected", "over", "under": the per-wall check in the report's words. */
export function wallCheckText(w: CrewSummarySnapshot["perWall"][number]): string {
  if (w.loggedBags === 0 && !w.finished) return "not started";
  if (w.status === "possible-bypass") return "over the estimate";
  if (w.status === "possible-voids-or-low-density") return w.finished ? "under the estimate" : "in progress";
  if (w.status === "no-estimate") return "no estimate";
  return "as expected";
}

/** How a warning ended, in the report's words. */
export function warningOutcomeText(w: CrewSummarySnapshot["warnings"][number]): string {
  if (w.state === "resolved" && w.resolution) return `resolved by ${w.resolution.by}: “${w.resolution.note}”`;
  if (w.state === "cleared") return "back within range after more work on the wall";
  return "still open when this report was issued";
}

/** Bags to one decimal, as the crew screens show them. */
export const bagsFigure = (n: number) => (Math.round(n * 10) / 10).toLocaleString("en-US", { maximumFractionDigits: 1 });
