import { bagsFigure, wallCheckText, warningOutcomeText } from "@/lib/documents/crew-summary";
import type { CrewSummarySnapshot } from "@/lib/documents/snapshot";

const day = new Intl.DateTimeFormat("en-US", { dateStyle: "medium" });
const n = (x: number, digits = 0) => x.toLocaleString("en-US", { minimumFractionDigits: digits, maximumFractionDigits: digits });

/** "What the crew did": the crew log as it stood when the report was issued (the PDF shows the same). */
export function ReportCrew({ crew, thresholds }: { crew: CrewSummarySnapshot; thresholds: { high: number; low: number } }) {
  const b = crew.bags;
  const to = crew.testOut;
  return (
    <section aria-labelledby="report-crew-h" className="space-y-3" data-testid="report-crew">
      <h2 id="report-crew-h" className="text-2xl font-bold text-spruce-900">What the crew did</h2>
      <p className="text-ink-muted">From the crew&rsquo;s log of {crew.entries} {crew.entries === 1 ? "entry" : "entries"}, as it stood when this report was issued.</p>
      <div className="flex flex-wrap gap-3">
        <div className="min-w-56 flex-1 rounded-lg bg-spruce-50 p-4">
          <p className="text-xs font-bold uppercase tracking-wide text-ink-muted">Insulation blown</p>
          <p className="text-4xl font-bold text-spruce-800 tabular-nums" data-testid="report-crew-bags">{bagsFigure(b.logged)}</p>
          <p className="font-semibold text-spruce-800">of about {bagsFigure(b.expected)} bags estimated</p>
          <p className="text-sm">{b.ratio !== null ? `${n(b.ratio, 2)} times the estimate · ` : ""}{crew.wallsFinished} of {crew.wallsTotal} walls finished</p>
        </div>
        {to ? (
          <div className="min-w-56 flex-1 rounded-lg bg-ember-50 p-4">
            <p className="text-xs font-bold uppercase tracking-wide text-ink-muted">Air leakage at test-out</p>
            <p className="text-4xl font-bold text-ember-700 tabular-nums">{n(to.measuredCfm50)}</p>
            <p className="font-semibold text-ember-700">CFM50 measured</p>
            <p className="text-sm">
              {to.predictedCfm50 !== null ? `Predicted ${n(to.predictedCfm50)} CFM50` : "No prediction"}
              {to.testInCfm50 !== null ? `; ${n(to.testInCfm50)} CFM50 at test-in` : ""}
              {to.measuredReductionPct !== null ? `, ${n(to.measuredReductionPct)}\u00a0% less` : ""}. Tested {day.format(to.testedAt)}.
            </p>
          </div>
        ) : null}
      </div>
      <div className="overflow-x-auto">
        <table className="w-full max-w-2xl text-left text-sm">
          <thead className="bg-paper-deep">
            <tr><th scope="col" className="px-3 py-2">Wall</th><th scope="col" className="px-3 py-2 text-right">Bags blown</th><th scope="col" className="px-3 py-2 text-right">Estimate</th><th scope="col" className="px-3 py-2">Check</th></tr>
          </thead>
          <tbody>
            {crew.perWall.map((w) => (
              <tr key={w.surfaceId} className="border-t border-line">
                <td className="px-3 py-2">{w.name}{w.finished ? " (finished)" : ""}</td>
                <td className="px-3 py-2 text-right tabular-nums">{bagsFigure(w.loggedBags)}</td>
                <td className="px-3 py-2 text-right tabular-nums">{bagsFigure(w.expectedBags)}</td>
                <td className="px-3 py-2">{w.ratio !== null && w.loggedBags > 0 ? `${n(w.ratio, 2)}×, ` : ""}{wallCheckText(w)}</td>
              </tr>
            ))}
          </tbody>
          <tfoot>
            <tr className="border-t-2 border-charcoal font-bold"><td className="px-3 py-2">All walls</td><td className="px-3 py-2 text-right tabular-nums">{bagsFigure(b.logged)}</td><td className="px-3 py-2 text-right tabular-nums">{bagsFigure(b.expected)}</td><td className="px-3 py-2">{b.ratio !== null ? `${n(b.ratio, 2)}×` : ""}</td></tr>
          </tfoot>
        </table>
      </div>
      <h3 className="font-semibold">Warnings raised ({crew.warnings.length})</h3>
      {crew.warnings.length === 0 ? <p>None: every wall stayed within the expected range.</p> : (
        <ul className="space-y-1 text-sm">
          {crew.warnings.map((w, i) => (
            <li key={i} className={`border-l-4 py-1 pl-3 ${w.state === "open" ? "border-ember-600" : "border-spruce-500"}`}>
              <strong>{w.wall}: {w.kind === "overfill" ? "more material than expected" : "less material than expected"}</strong> at {bagsFigure(w.bagsAtRaise)} bags, {day.format(w.raisedAt)} — {warningOutcomeText(w)}.
            </li>
          ))}
        </ul>
      )}
      <p className="text-sm text-ink-muted">
        A wall that takes much more than its estimate may be losing material into an attic, chase, soffit or basement; one that finishes well under may have voids or low density. The crew stops, looks, and probes or re-blows. The checks flag a wall above {n(thresholds.high, 2)} times or, once finished, below {n(thresholds.low, 2)} times its estimate (common practice).
      </p>
    </section>
  );
}
