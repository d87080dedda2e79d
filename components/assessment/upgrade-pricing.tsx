"use client";

// An upgrade's priced lines, built from the company price book by the same function the proposal
// uses (lib/documents/proposal-lines.ts), with this job's changes: a quantity or a unit price per
// line, or the whole installed cost with a reason. Shown only to roles that may see prices.
import type { AssessmentDoc, AssessmentUpgrade } from "@/lib/assessment/doc";
import { DEFAULT_BAGS_PER_CREW_HOUR, DEFAULT_CFM50_CUT_PER_CREW_HOUR, type JobPricing, type PricedLine, type UpgradePrice } from "@/lib/documents/proposal-lines";
import { formatDollars } from "@/lib/money";
import { setAt, useAssessmentCtx } from "./context";
import { NumField, TextField } from "./fields";

type Pricing = AssessmentUpgrade["pricing"];

/** Why a line's quantity is what it is, for the hint under it. */
const quantityHint: Record<string, string> = {
  bags: "The dense-pack estimate, rounded up to whole bags.",
  holes: "From the dense-pack estimate.",
  labour: `Bags ÷ ${DEFAULT_BAGS_PER_CREW_HOUR} per crew hour (an invented demo figure; set your crew's own).`,
  area: "The ceilings this upgrade covers.",
  hours: `1 crew hour per ${DEFAULT_CFM50_CUT_PER_CREW_HOUR} CFM50 taken out (an invented demo figure): change it for this house.`,
  item: "Windows this upgrade replaces.",
};

function setPricing(d: AssessmentDoc, i: number, change: (p: NonNullable<Pricing>) => NonNullable<Pricing>): AssessmentDoc {
  const next = change({ ...(d.upgrades[i]?.pricing ?? {}) });
  const empty = !next.totalOverride && (!next.lines || Object.keys(next.lines).length === 0);
  return setAt(d, ["upgrades", i, "pricing"], empty ? null : next);
}

function setLine(d: AssessmentDoc, i: number, key: string, field: "quantity" | "unitPriceCents", value: number | undefined): AssessmentDoc {
  return setPricing(d, i, (p) => {
    const lines = { ...(p.lines ?? {}) };
    const line = { ...(lines[key] ?? {}) };
    if (value === undefined) delete line[field];
    else line[field] = value;
    if (Object.keys(line).length) lines[key] = line;
    else delete lines[key];
    return { ...p, lines };
  });
}

function LineRow({ i, line }: { i: number; line: PricedLine }) {
  const { update, readOnly } = useAssessmentCtx();
  const base = `upgrades.${i}.pricing.lines.${line.key}`;
  const changed = line.overridden.quantity || line.overridden.unitPrice;
  return (
    <li className="border-t border-line py-2" data-testid={`upgrade-${i}-line-${line.key}`}>
      <div className="min-w-0">
        <p className="font-medium">{line.description}</p>
        <p className="text-sm text-ink-muted">
          {line.code ? `Price book ${line.code}` : "Not in the price book"}
          {changed ? <> · <span className="font-semibold text-ember-700">changed for this job</span></> : null}
        </p>
        {line.missingCode ? <p className="text-sm text-warn" role="note">Your price book has no active {line.missingCode} item, so this line is $0 until you type a unit price (or the owner adds the item).</p> : null}
        {changed && !readOnly ? (
          <button type="button" className="btn-ghost mt-1 text-sm" onClick={() => update((d) => setLine(setLine(d, i, line.key, "quantity", undefined), i, line.key, "unitPriceCents", undefined))}>
            Back to the price book ({line.computed.quantity.toLocaleString("en-US")} × {formatDollars(line.computed.unitPriceCents)})
          </button>
        ) : null}
      </div>
      <div className="mt-1 grid grid-cols-2 items-start gap-2 sm:grid-cols-[minmax(0,1fr)_minmax(0,1fr)_auto]">
      <NumField path={`${base}.quantity`} label={`Quantity (${line.unit})`} hint={quantityHint[line.key]} value={line.quantity} onValue={(n) => update((d) => setLine(d, i, line.key, "quantity", n === null ? undefined : n))} />
      <NumField path={`${base}.unitPriceCents`} label="Unit price ($)" value={line.unitPriceCents / 100} onValue={(n) => update((d) => setLine(d, i, line.key, "unitPriceCents", n === null ? undefined : Math.round(n * 100)))} />
      <p className="col-span-2 text-right tabular-nums sm:col-span-1 sm:min-w-[6rem] sm:pt-8"><span className="text-sm text-ink-muted sm:sr-only">Line total </span><span data-testid={`upgrade-${i}-line-${line.key}-total`}>{formatDollars(line.totalCents)}</span></p>
      </div>
    </li>
  );
}

export function UpgradePricingPanel({ i, price }: { i: number; price: UpgradePrice | null }) {
  const { doc, update, readOnly, issues } = useAssessmentCtx();
  const u = doc.upgrades[i]!;
  const over = u.pricing?.totalOverride ?? null;
  const costIssues = issues.get(`upgrades.${i}.costUSD`) ?? [];
  if (!price) {
    return (
      <div className="mt-3 rounded-md bg-paper-deep px-3 py-2 text-sm" data-testid={`upgrade-${i}-pricing`}>
        <p className="font-semibold">Installed cost: {Number.isFinite(u.costUSD) ? formatDollars(Math.round(u.costUSD * 100)) : "not priced yet"}</p>
        <p className="text-ink-muted">The lines are priced from the price book once the assessment is complete enough for results.</p>
      </div>
    );
  }
  return (
    <div className="mt-3 rounded-md border border-line px-3 py-2" data-testid={`upgrade-${i}-pricing`}>
      <h3 className="text-sm font-semibold">Priced lines (price book, this job&apos;s changes marked)</h3>
      <ul>{price.lines.map((l) => <LineRow key={l.key} i={i} line={l} />)}</ul>
      {price.lines.length === 0 ? <p className="text-sm text-ink-muted">Nothing to price yet: this upgrade changes no surface.</p> : null}
      <div className="mt-2 flex flex-wrap items-baseline justify-between gap-2 border-t border-line pt-2">
        <p>
          <span className="font-semibold">Installed cost </span>
          <span className="text-sm text-ink-muted">{over ? `(overridden; the lines add up to ${formatDollars(price.linesCents)})` : "(the lines above)"}, before sales tax</span>
        </p>
        <p className="text-lg font-bold tabular-nums" data-testid={`upgrade-${i}-cost`}>{formatDollars(price.costCents)}</p>
      </div>
      {costIssues.length ? <p className="field-error" role="alert">The installed cost {costIssues.join(" ")}: check the quantities and prices above.</p> : null}
      <label className="mt-2 flex min-h-11 items-center gap-2 text-sm">
        <input type="checkbox" className="h-5 w-5" checked={!!over} disabled={readOnly} onChange={(e) => update((d) => setPricing(d, i, (p) => ({ ...p, totalOverride: e.target.checked ? { cents: price.linesCents, reason: "" } : null })))} />
        Override this upgrade&apos;s installed cost for this job
      </label>
      {over ? (
        <div className="grid gap-3 sm:grid-cols-2">
          <NumField path={`upgrades.${i}.pricing.totalOverride.cents`} label="Installed cost for this job ($)" value={over.cents / 100} onValue={(n) => (n === null ? undefined : update((d) => setPricing(d, i, (p) => ({ ...p, totalOverride: { reason: p.totalOverride?.reason ?? "", cents: Math.round(n * 100) } }))))} />
          <TextField path={`upgrades.${i}.pricing.totalOverride.reason`} label="Reason for the override (shown on the proposal)" value={over.reason} onValue={(v) => update((d) => setPricing(d, i, (p) => ({ ...p, totalOverride: { cents: p.totalOverride?.cents ?? price.linesCents, reason: v } })))} />
          {over.reason.trim() === "" ? <p className="text-sm text-danger sm:col-span-2" role="note" data-testid={`upgrade-${i}-reason-needed`}>Say why the total is overridden: the assessment does not save until it has a reason.</p> : null}
        </div>
      ) : null}
    </div>
  );
}

/** The job-level lines (the permit) and the upgrades' total, under the list. */
export function PricingSummary({ pricing }: { pricing: JobPricing | null }) {
  if (!pricing) return null;
  return (
    <div className="rounded-md bg-paper-deep px-3 py-2 text-sm" data-testid="upgrades-priced-total">
      <p>
        <span className="font-semibold">Upgrades, priced: {formatDollars(pricing.upgradesCents)}</span> before sales tax. The savings report uses these costs, and the proposal prices the same lines
        {pricing.jobLines.length ? `, plus ${pricing.jobLines.map((l) => `${l.description.toLowerCase()} (${formatDollars(l.totalCents)})`).join(", ")}` : ""} and the company&apos;s sales tax.
      </p>
    </div>
  );
}
