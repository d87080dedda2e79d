"use client";

import * as f from "./format";
import { BigFigure, How, methodNote, Section, type SectionProps } from "./parts";

/** The three figures a homeowner asks about first: yearly saving, payback and the leakage cut. */
export function Headline({ analysis: a, units }: SectionProps) {
  const pkg = a.package;
  const econ = methodNote(a, "Economics");
  const leak = methodNote(a, "Air leakage");
  const before = a.baseline.cfm50;
  const after = a.final.cfm50;
  const cut = before > 0 ? (before - after) / before : 0;
  const sealing = a.upgrades.find((u) => u.type === "air-sealing");
  const basis = sealing ? String(sealing.details.basis ?? "target") : "no air sealing planned";
  return (
    <Section title="What the plan saves">
      {a.upgrades.length === 0 ? <p className="text-ink-muted">No upgrades are planned yet: add one to see its saving.</p> : null}
      <dl className="@container grid grid-cols-3 gap-3">
        <BigFigure label="Yearly saving" value={f.usd(pkg.savings.usd)} unit="a year" detail={f.fuel(pkg.savings.fuelUnits, pkg.savings.fuelUnit)} testId="results-yearly-saving" />
        <BigFigure label="Payback" value={pkg.simplePaybackYears === null ? "none" : f.num(pkg.simplePaybackYears, 1)} unit={pkg.simplePaybackYears === null ? "no saving" : "years"} detail={`on ${f.usd(pkg.costUSD)}`} testId="results-payback" />
        <BigFigure label="Leakage cut" value={f.percent(cut)} unit="less leakage" detail={f.cfm50Change(before, after, units)} testId="results-leakage-cut" />
      </dl>
      <p className="text-sm text-charcoal">
        Savings-to-investment ratio for the whole plan: <strong className="tabular-nums" data-testid="results-package-sir">{f.sir(pkg.sir)}</strong>
        {pkg.sir !== null ? (pkg.sir >= 1 ? " (1 or more: the plan pays for itself over its life)" : " (below 1: it does not repay its cost over its life)") : null}
      </p>
      <div>
        <How
          what="the yearly saving and payback"
          inputs={[
            ["Heating cost now", `${f.usd(a.baseline.energy.costUSD)} a year`],
            ["Heating cost after the plan", `${f.usd(a.final.energy.costUSD)} a year`],
            ["Fuel price", `${f.usdCents(a.input.heating.pricePerUnitUSD)} per ${pkg.savings.fuelUnit}`],
            ["Cost of the plan", f.usd(pkg.costUSD)],
            ["Present value of lifetime savings", f.usd(pkg.presentValueSavingsUSD)],
            ["Discount rate", f.percent(a.input.economics.discountRate, 1)],
            ["Fuel price escalation", f.percent(a.input.economics.fuelEscalationRate, 1)],
          ]}
          method={<>Yearly saving = cost now − cost after. Payback = plan cost ÷ yearly saving. SIR = present value of each upgrade&apos;s savings ÷ plan cost. {econ.method}.</>}
          sources={[econ.source]}
        />
        <How
          what="the leakage cut"
          inputs={[
            ["Test-in", f.cfm50(before, units)],
            ["After the plan", `${f.cfm50(after, units)} (${basis})`],
          ]}
          method="Leakage cut = (CFM50 before − CFM50 after) ÷ CFM50 before."
          sources={[leak.source]}
        />
      </div>
    </Section>
  );
}
