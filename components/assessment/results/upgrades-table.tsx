"use client";

import * as f from "./format";
import { How, methodNote, Section, tdNum, th, thNum, type SectionProps } from "./parts";

/** Each upgrade's saving on the house the earlier ones left, with payback and SIR. */
export function UpgradesTable({ analysis: a, units }: SectionProps) {
  const econ = methodNote(a, "Economics");
  const pkg = a.package;
  const { discountRate, fuelEscalationRate } = a.input.economics;
  if (a.upgrades.length === 0) {
    return (
      <Section title="Upgrades, in order">
        <p className="text-ink-muted">No upgrades yet.</p>
      </Section>
    );
  }
  return (
    <Section title="Upgrades, in order">
      <p className="text-sm text-ink-muted">Each saving is counted on the house the earlier upgrades left, so the savings add up without double counting.</p>
      <div className="-mx-2 overflow-x-auto">
        <table className="w-full text-sm">
          <caption className="sr-only">Upgrades in order with their yearly saving, payback and savings-to-investment ratio</caption>
          <thead>
            <tr className="border-b border-line">
              <th scope="col" className={th}>Upgrade</th>
              <th scope="col" className={thNum}>Saving a year</th>
              <th scope="col" className={thNum}>Payback</th>
              <th scope="col" className={thNum}>SIR</th>
            </tr>
          </thead>
          <tbody>
            {a.upgrades.map((u) => (
              <tr key={u.index} className="border-b border-line/60 align-top" data-testid={`results-upgrade-${u.index}`}>
                <th scope="row" className="px-2 py-2 text-left font-normal">
                  <span className="font-semibold">{u.index + 1}. {u.name}</span>
                  <span className="block text-ink-muted">{f.usd(u.costUSD)} · {u.lifeYears}-year life</span>
                </th>
                <td className={tdNum}>
                  <span className="font-semibold text-spruce-800">{f.usd(u.savings.usd)}</span>
                  <span className="block text-ink-muted">{f.fuel(u.savings.fuelUnits, u.savings.fuelUnit)}</span>
                </td>
                <td className={tdNum}>
                  {u.simplePaybackYears === null ? "none" : f.num(u.simplePaybackYears, 1)}
                  <span className="block text-ink-muted">{u.simplePaybackYears === null ? "no saving" : "years"}</span>
                </td>
                <td className={tdNum}>
                  {f.sir(u.sir)}
                  {u.sir !== null && u.sir < 1 ? <span className="block text-warn">below 1</span> : null}
                </td>
              </tr>
            ))}
          </tbody>
          <tfoot>
            <tr className="align-top">
              <th scope="row" className="px-2 py-2 text-left">
                Whole plan<span className="block font-normal text-ink-muted">{f.usd(pkg.costUSD)}</span>
              </th>
              <td className={`${tdNum} font-semibold text-spruce-800`}>{f.usd(pkg.savings.usd)}</td>
              <td className={`${tdNum} font-semibold`}>
                {pkg.simplePaybackYears === null ? "none" : f.num(pkg.simplePaybackYears, 1)}
                <span className="block font-normal text-ink-muted">{pkg.simplePaybackYears === null ? "no saving" : "years"}</span>
              </td>
              <td className={`${tdNum} font-semibold`}>{f.sir(pkg.sir)}</td>
            </tr>
          </tfoot>
        </table>
      </div>
      <How
        what="each upgrade's saving, payback and SIR"
        inputs={[
          ["Discount rate", f.percent(discountRate, 1)],
          ["Fuel price escalation", f.percent(fuelEscalationRate, 1)],
        ]}
        groups={a.upgrades.map((u) => ({
          title: `${u.index + 1}. ${u.name}: ${u.description}`,
          inputs: [
            ["Heating cost before → after", `${f.usd(u.before.annualCostUSD)} → ${f.usd(u.after.annualCostUSD)}`],
            ["Fuel and CO2 saved a year", `${f.fuel(u.savings.fuelUnits, u.savings.fuelUnit)}, ${f.co2(u.savings.co2Lb, units)}`],
            ["Present-value factor (UPV*)", `${f.num(u.upvFactor, 2)} over ${u.lifeYears} years`],
          ],
        }))}
        method={<>Saving = heating cost before the upgrade − after it. Payback = cost ÷ saving. SIR = saving × UPV* ÷ cost; an upgrade with SIR of 1 or more repays its cost over its life. {econ.method}.</>}
        sources={[econ.source]}
      />
    </Section>
  );
}
