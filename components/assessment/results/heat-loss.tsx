"use client";

import dynamic from "next/dynamic";
import type { HouseEvaluation } from "@/calc/analyze";
import * as f from "./format";
import type { HeatLossRow } from "./heat-loss-chart";
import { How, methodNote, rowHead, Section, tdNum, th, thNum, type SectionProps } from "./parts";

// The chart (recharts) loads in the browser with the panel, never on the server or before the form.
const HeatLossChart = dynamic(() => import("./heat-loss-chart"), {
  ssr: false,
  loading: () => <div className="h-[320px] rounded-md bg-paper" aria-hidden="true" />,
});

const COMPONENTS = [
  ["walls", "Walls"], ["ceilings", "Ceilings"], ["floors", "Floors"], ["windows", "Windows"], ["doors", "Doors"],
] as const;

/** Heat loss at design conditions per component: UA × ΔT, and 1.08 × CFM_nat × ΔT for air leakage. */
function byComponent(e: HouseEvaluation): { label: string; btuh: number; ua: number }[] {
  const dT = e.designLoad.deltaTF;
  return [
    ...COMPONENTS.map(([k, label]) => ({ label, btuh: e.envelope.ua[k] * dT, ua: e.envelope.ua[k] })),
    { label: "Air leakage", btuh: e.designLoad.infiltrationBtuh, ua: e.designLoad.infiltrationUA },
  ];
}

export function HeatLoss({ analysis: a, units }: SectionProps) {
  const before = byComponent(a.baseline);
  const after = byComponent(a.final);
  const rows: HeatLossRow[] = before.map((b, i) => ({ component: b.label, before: f.powerValue(b.btuh, units), after: f.powerValue(after[i].btuh, units) }));
  const unit = f.powerUnit(units);
  const dl = methodNote(a, "Design heat load");
  const uf = methodNote(a, "U-factors");
  return (
    <Section title="Where the heat goes">
      <figure aria-label={`Bar chart of heat loss by component at design conditions, before and after the plan, in ${unit}`} className="space-y-2">
        <HeatLossChart rows={rows} unit={unit} digits={units === "ip" ? 0 : 1} />
        <figcaption className="text-sm text-ink-muted">Heat loss at the outdoor design temperature, {unit}. The table below gives the same figures.</figcaption>
      </figure>
      <table className="w-full text-sm">
        <caption className="sr-only">Heat loss by component at design conditions, before and after</caption>
        <thead>
          <tr className="border-b border-line">
            <th scope="col" className={th}>Component</th>
            <th scope="col" className={thNum}>Before</th>
            <th scope="col" className={thNum}>After</th>
          </tr>
        </thead>
        <tbody>
          {before.map((b, i) => (
            <tr key={b.label} className="border-b border-line/60">
              <th scope="row" className={rowHead}>{b.label}</th>
              <td className={tdNum}>{f.power(b.btuh, units)}</td>
              <td className={tdNum}>{f.power(after[i].btuh, units)}</td>
            </tr>
          ))}
        </tbody>
        <tfoot>
          <tr>
            <th scope="row" className="px-2 py-1.5 text-left">Total</th>
            <td className={`${tdNum} font-semibold`}>{f.power(a.baseline.designLoad.totalBtuh, units)}</td>
            <td className={`${tdNum} font-semibold text-spruce-800`}>{f.power(a.final.designLoad.totalBtuh, units)}</td>
          </tr>
        </tfoot>
      </table>
      <How
        what="the heat loss by component"
        inputs={[
          ...before.map((b, i): [string, string] => [`${b.label} UA before / after`, `${f.ua(b.ua, units)} / ${f.ua(after[i].ua, units)}`]),
          ["Temperature difference", f.deltaT(a.baseline.designLoad.deltaTF, units)],
        ]}
        method={<>Each component: UA × (t_in − t_design); air leakage: 1.08 × CFM_nat × (t_in − t_design). U-factors: {uf.method}.</>}
        sources={[uf.source, dl.source]}
      />
    </Section>
  );
}
