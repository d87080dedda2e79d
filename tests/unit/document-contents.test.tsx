// The pure pieces behind what an issued document shows: how photos are laid out, what of the crew
// log is frozen, and the on-screen sections drawn from them.
import { renderToStaticMarkup } from "react-dom/server";
import { describe, expect, it } from "vitest";
import { ReportCrew } from "@/components/documents/report-crew";
import { ReportPhotos } from "@/components/documents/report-photos";
import { orderedChoice } from "@/components/documents/photo-picker";
import type { PhotoView } from "@/lib/data/photos";
import { freezeCrewSummary, wallCheckText, warningOutcomeText } from "@/lib/documents/crew-summary";
import { arrangePhotos, arrangedIds } from "@/lib/documents/photo-groups";
import type { CrewSummarySnapshot, SnapshotPhoto } from "@/lib/documents/snapshot";

const photo = (id: string, tag: SnapshotPhoto["tag"], surfaceId: string | null = null, caption: string | null = null): SnapshotPhoto => ({
  id, tag, caption, surfaceId, surfaceLabel: surfaceId ? `Wall ${surfaceId}` : null, takenAt: null, width: 480, height: 360,
});

describe("arrangePhotos", () => {
  it("pairs befores with afters per surface in order, and groups the rest by tag (before, during, after, thermal)", () => {
    const list = [photo("b1", "before", "n"), photo("t1", "thermal"), photo("a1", "after", "n"), photo("b2", "before", "n"), photo("d1", "during", "n"), photo("a2", "after", "s"), photo("b3", "before")];
    const { pairs, groups } = arrangePhotos(list);
    expect(pairs.map((p) => [p.label, p.before.id, p.after.id])).toEqual([["Wall n", "b1", "a1"]]);
    expect(groups.map((g) => [g.tag, g.photos.map((p) => p.id)])).toEqual([["before", ["b2", "b3"]], ["during", ["d1"]], ["after", ["a2"]], ["thermal", ["t1"]]]);
    expect(arrangedIds({ pairs, groups })).toEqual(["b1", "a1", "b2", "b3", "d1", "a2", "t1"]);
  });

  it("pairs a whole-house before and after (no surface) too", () => {
    const { pairs, groups } = arrangePhotos([photo("a", "after"), photo("b", "before")]);
    expect(pairs.map((p) => [p.label, p.before.id, p.after.id])).toEqual([["Whole house", "b", "a"]]);
    expect(groups).toEqual([]);
  });

  it("orders the picker's choice as the document shows it, leaving out what was not ticked", () => {
    const views = [photo("t", "thermal"), photo("a", "after", "n"), photo("b", "before", "n")] as unknown as PhotoView[];
    expect(orderedChoice(views, new Set(["t", "a", "b"]))).toEqual(["b", "a", "t"]);
    expect(orderedChoice(views, new Set(["t", "zzz"]))).toEqual(["t"]);
  });
});

const wall = (surfaceId: string, entries: number, bags: number) => ({ surfaceId, name: `Wall ${surfaceId}`, logged: { entries, bags } });
const summary = {
  bags: { expected: 40, logged: 31.5, ratio: 31.5 / 40 },
  holes: { expected: 30, logged: 28 },
  wallsFinished: 1,
  wallsTotal: 2,
  perWall: [
    { surfaceId: "n", name: "North wall", expectedBags: 20, loggedBags: 27.5, ratio: 1.375, status: "possible-bypass" as const, finished: true },
    { surfaceId: "s", name: "South wall", expectedBags: 20, loggedBags: 4, ratio: 0.2, status: "possible-voids-or-low-density" as const, finished: false },
  ],
  warnings: [
    { kind: "overfill" as const, message: "m", raisedAt: Date.UTC(2026, 10, 3), raisedByEntryId: "e1", bagsAtRaise: 26.5, state: "resolved" as const, resolution: { note: "Blocked an open chase", by: "Dario", at: 1, entryId: "e2" }, surfaceId: "n", wall: "North wall" },
  ],
  openWarnings: 0,
};
const noTest = { testOut: null, testInCfm50: 3900, predictedCfm50: 2400, measuredCfm50: null, measuredReductionPct: null, usesMeasuredLeakage: false, savings: { predicted: null, measured: null } };

describe("freezeCrewSummary", () => {
  it("is undefined while nobody has logged anything", () => {
    expect(freezeCrewSummary({ summary, walls: [wall("n", 0, 0)] as never, otherEntries: [], testOut: noTest as never })).toBeUndefined();
  });

  it("keeps bags in total and per wall, warnings with how they ended, and the test-out only when measured", () => {
    const frozen = freezeCrewSummary({ summary, walls: [wall("n", 3, 27.5), wall("s", 1, 4)] as never, otherEntries: [{}] as never, testOut: noTest as never })!;
    expect(frozen.entries).toBe(5);
    expect(frozen.bags).toEqual(summary.bags);
    expect(frozen.perWall.map((w) => [w.name, w.loggedBags, wallCheckText(w)])).toEqual([["North wall", 27.5, "over the estimate"], ["South wall", 4, "in progress"]]);
    expect(frozen.warnings).toEqual([{ wall: "North wall", kind: "overfill", bagsAtRaise: 26.5, raisedAt: Date.UTC(2026, 10, 3), state: "resolved", resolution: { note: "Blocked an open chase", by: "Dario", at: 1 } }]);
    expect(frozen.testOut).toBeNull();
    const measured = { ...noTest, measuredCfm50: 2310, measuredReductionPct: 40.8, testOut: { id: "t", cfm50: 2310, testedAt: 5, outdoorTempF: null, windMph: null, notes: null } };
    expect(freezeCrewSummary({ summary, walls: [wall("n", 1, 1)] as never, otherEntries: [], testOut: measured as never })!.testOut).toEqual({ testInCfm50: 3900, predictedCfm50: 2400, measuredCfm50: 2310, measuredReductionPct: 40.8, testedAt: 5 });
  });

  it("words each warning's outcome", () => {
    const w = { wall: "W", kind: "underfill" as const, bagsAtRaise: 3, raisedAt: 0, resolution: null };
    expect(warningOutcomeText({ ...w, state: "open" })).toBe("still open when this report was issued");
    expect(warningOutcomeText({ ...w, state: "cleared" })).toMatch(/back within range/);
  });
});

describe("on-screen sections", () => {
  it("'What the crew did' shows the bags figure, each wall and the resolution", () => {
    const crew: CrewSummarySnapshot = freezeCrewSummary({ summary, walls: [wall("n", 2, 27.5)] as never, otherEntries: [], testOut: noTest as never })!;
    const html = renderToStaticMarkup(<ReportCrew crew={crew} thresholds={{ high: 1.3, low: 0.8 }} />);
    expect(html).toContain("What the crew did");
    expect(html).toMatch(/data-testid="report-crew-bags">31\.5</);
    expect(html).toContain("of about 40 bags estimated");
    expect(html).toContain("North wall (finished)");
    expect(html).toContain("Blocked an open chase");
    expect(html).toContain("above 1.30 times");
  });

  it("the photos section draws thumbnails from the photo route with their captions", () => {
    const html = renderToStaticMarkup(<ReportPhotos photos={[photo("b", "before", "n", "Cracked plaster"), photo("a", "after", "n", "Patched")]} />);
    expect(html).toContain('src="/api/photos/b/thumbnail"');
    expect(html).toContain('src="/api/photos/a/thumbnail"');
    expect(html).toContain("Before · Wall n");
    expect(html).toContain("Wall n: Cracked plaster");
  });
});
