import type { CrewLogView } from "@/lib/data/crew-log";
import { bagsText, intText, whenText } from "./format";

const statusText: Record<string, string> = { "as-expected": "as expected", "possible-bypass": "over", "possible-voids-or-low-density": "under", "no-estimate": "no estimate" };

/** For the office: bags used against expected, in total and per wall, and every warning with how it was dealt with. */
export function CrewSummary({ log }: { log: CrewLogView }) {
  const s = log.summary;
  return (
    <section className="rounded-lg border border-line bg-white p-4 shadow-sm" aria-labelledby="summary-title" data-testid="crew-summary">
      <h2 id="summary-title" className="text-xl font-bold text-spruce-900">Crew-log summary</h2>
      <p className="mt-2 text-lg">
        <strong className="text-3xl tabular-nums" data-testid="summary-bags">{bagsText(s.bags.logged)}</strong> of about {bagsText(s.bags.expected)} bags
        {s.bags.ratio !== null ? ` (${s.bags.ratio.toFixed(2)}×)` : ""} · {intText(s.holes.logged)} of {intText(s.holes.expected)} holes · {s.wallsFinished} of {s.wallsTotal} walls finished
      </p>
      <div className="mt-3 overflow-x-auto">
        <table className="w-full text-left text-sm">
          <thead><tr className="border-b border-line"><th className="py-1 pr-2">Wall</th><th className="py-1 pr-2 text-right">Bags</th><th className="py-1 pr-2 text-right">Expected</th><th className="py-1">Check</th></tr></thead>
          <tbody>
            {s.perWall.map((w) => (
              <tr key={w.surfaceId} className="border-b border-line">
                <td className="py-1 pr-2">{w.name}{w.finished ? " ✓" : ""}</td>
                <td className="py-1 pr-2 text-right tabular-nums">{bagsText(w.loggedBags)}</td>
                <td className="py-1 pr-2 text-right tabular-nums">{bagsText(w.expectedBags)}</td>
                <td className={`py-1 ${w.status === "possible-bypass" || (w.finished && w.status === "possible-voids-or-low-density") ? "font-semibold text-danger" : ""}`}>{w.loggedBags === 0 && !w.finished ? "not started" : <>{w.ratio !== null ? `${w.ratio.toFixed(2)}× ` : ""}{w.status === "possible-voids-or-low-density" && !w.finished ? "in progress" : statusText[w.status]}</>}</td>
              </tr>
            ))}
          </tbody>
        </table>
      </div>
      <h3 className="mt-4 font-semibold">Warnings ({s.warnings.length}, {s.openWarnings} open)</h3>
      {s.warnings.length === 0 ? <p className="text-ink-muted">None raised.</p> : (
        <ul className="mt-1 space-y-1 text-sm">
          {s.warnings.map((w) => (
            <li key={w.raisedByEntryId + w.kind} className="rounded-md bg-paper-deep px-3 py-2">
              <strong>{w.wall}</strong>: {w.kind === "overfill" ? "overfill" : "underfill"} at {bagsText(w.bagsAtRaise)} bags ({whenText(w.raisedAt)}) —{" "}
              {w.state === "resolved" ? `resolved by ${w.resolution!.by}: “${w.resolution!.note}”` : w.state === "cleared" ? "back within range" : "open"}
            </li>
          ))}
        </ul>
      )}
      <h3 className="mt-4 font-semibold">Safety acknowledgements</h3>
      {log.safety.acknowledgements.length === 0 ? <p className="text-ink-muted">None yet.</p> : (
        <ul className="mt-1 text-sm">
          {log.safety.acknowledgements.slice(0, 10).map((a) => <li key={a.id}>{a.userName}, {whenText(a.acknowledgedAt)} ({a.cautionKeys.length} cautions)</li>)}
        </ul>
      )}
    </section>
  );
}
