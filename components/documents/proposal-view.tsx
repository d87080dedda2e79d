import { taxRateLabel, taxRatePpmOf, type ReportSnapshot } from "@/lib/documents/snapshot";
import { formatDollars } from "@/lib/money";

const day = new Intl.DateTimeFormat("en-US", { dateStyle: "long" });

export function ProposalView({ snapshot }: { snapshot: ReportSnapshot }) {
  const p = snapshot.proposal;
  if (!p) return null;
  return (
    <section aria-labelledby="proposal-h" className="card space-y-4">
      <h2 id="proposal-h" className="text-2xl font-bold text-spruce-900">Proposal</h2>
      <div className="overflow-x-auto">
        <table className="w-full min-w-[520px] text-left">
          <thead className="bg-paper-deep text-sm">
            <tr><th scope="col" className="px-3 py-2">Item</th><th scope="col" className="px-3 py-2 text-right">Quantity</th><th scope="col" className="px-3 py-2 text-right">Unit price</th><th scope="col" className="px-3 py-2 text-right">Total</th></tr>
          </thead>
          <tbody data-testid="proposal-lines">
            {p.lines.map((l, i) => (
              <tr key={i} className="border-t border-line">
                <td className="px-3 py-2">{l.description}</td>
                <td className="px-3 py-2 text-right tabular-nums">{l.quantity.toLocaleString("en-US")} {l.unit}</td>
                <td className="px-3 py-2 text-right tabular-nums">{formatDollars(l.unitPriceCents)}</td>
                <td className="px-3 py-2 text-right tabular-nums">{formatDollars(l.totalCents)}</td>
              </tr>
            ))}
          </tbody>
          <tfoot className="text-right">
            <tr className="border-t border-line"><th scope="row" colSpan={3} className="px-3 py-1 font-normal">Subtotal</th><td className="px-3 py-1 tabular-nums">{formatDollars(p.subtotalCents)}</td></tr>
            <tr><th scope="row" colSpan={3} className="px-3 py-1 font-normal">Sales tax ({taxRateLabel(taxRatePpmOf(p))})</th><td className="px-3 py-1 tabular-nums">{formatDollars(p.taxCents)}</td></tr>
            <tr className="text-lg font-bold"><th scope="row" colSpan={3} className="px-3 py-1">Total</th><td className="px-3 py-1 tabular-nums" data-testid="proposal-total">{formatDollars(p.totalCents)}</td></tr>
            <tr><th scope="row" colSpan={3} className="px-3 py-1 font-normal">Deposit due on acceptance</th><td className="px-3 py-1 tabular-nums">{formatDollars(p.depositCents)}</td></tr>
          </tfoot>
        </table>
      </div>
      {p.upgradesCents !== undefined ? <p className="text-sm" data-testid="proposal-upgrades-subtotal">The upgrade lines add up to {formatDollars(p.upgradesCents)} before tax: the same cost the savings report uses for payback and SIR.</p> : null}
      <p className="text-sm text-ink-muted">Valid until {day.format(p.validUntil)}. {p.terms}</p>
      <p className="text-sm text-ink-muted">{[snapshot.company.licenseLine, snapshot.company.insuranceLine].filter(Boolean).join(" · ")}</p>
    </section>
  );
}
