"use client";

import * as f from "./format";
import { How, methodNote, rowHead, Section, tdNum, th, thNum, type SectionProps } from "./parts";

/** Blower-door figures before and after, and natural air changes by both methods side by side. */
export function Leakage({ analysis: a, units }: SectionProps) {
  const b = a.baseline.infiltration;
  const fin = a.final.infiltration;
  const note = methodNote(a, "Air leakage");
  const used = b.method === "n-factor" ? "N-factor" : "ASHRAE basic";
  const rows: [string, string, string][] = [
    [units === "ip" ? "CFM50" : "Air flow at 50 Pa", f.cfm50(b.cfm50, units), f.cfm50(fin.cfm50, units)],
    ["ACH50", f.ach(b.ach50), f.ach(fin.ach50)],
    ["Leakage area (ELA at 4 Pa)", f.ela(b.ela.in2, b.ela.cm2, units), f.ela(fin.ela.in2, fin.ela.cm2, units)],
  ];
  const nat = [
    ["Before", b],
    ["After", fin],
  ] as const;
  return (
    <Section title="Air leakage">
      <table className="w-full text-sm">
        <caption className="sr-only">Blower-door figures before and after the plan</caption>
        <thead>
          <tr className="border-b border-line">
            <th scope="col" className={th}><span className="sr-only">Figure</span></th>
            <th scope="col" className={thNum}>Before</th>
            <th scope="col" className={thNum}>After</th>
          </tr>
        </thead>
        <tbody>
          {rows.map(([label, x, y]) => (
            <tr key={label} className="border-b border-line/60 last:border-0">
              <th scope="row" className={rowHead}>{label}</th>
              <td className={tdNum}>{x}</td>
              <td className={`${tdNum} font-semibold text-spruce-800`}>{y}</td>
            </tr>
          ))}
        </tbody>
      </table>
      <h4 className="pt-1 font-semibold text-charcoal">Natural air changes per hour</h4>
      <table className="w-full text-sm">
        <caption className="sr-only">Natural air changes per hour by the N-factor method and the ASHRAE basic model</caption>
        <thead>
          <tr className="border-b border-line">
            <th scope="col" className={th}><span className="sr-only">House</span></th>
            <th scope="col" className={thNum}>N-factor</th>
            <th scope="col" className={thNum}>ASHRAE basic</th>
          </tr>
        </thead>
        <tbody>
          {nat.map(([label, x]) => (
            <tr key={label} className="border-b border-line/60 last:border-0">
              <th scope="row" className={rowHead}>{label}</th>
              <td className={tdNum}>{f.achNatural(x.nFactor.achNat)}<span className="block text-ink-muted">{f.flow(x.nFactor.cfmNat, units)}</span></td>
              <td className={tdNum}>{f.achNatural(x.ashraeBasic.seasonal.ach)}<span className="block text-ink-muted">{f.flow(x.ashraeBasic.seasonal.cfm, units)}</span></td>
            </tr>
          ))}
        </tbody>
      </table>
      <p className="text-sm text-ink-muted">The {used} figure feeds the heat load and yearly energy. ASHRAE basic is shown for the heating season ({f.deltaT(b.ashraeBasic.seasonal.deltaTF, units)} indoor–outdoor difference, {f.speed(b.ashraeBasic.seasonal.windMph, units)} wind).</p>
      <How
        what="the leakage figures"
        inputs={[
          ["House volume", f.volume(b.volumeFt3, units)],
          ["Flow exponent", f.num(b.flowExponent, 2)],
          ["N-factor (zone × height × shielding)", `${f.num(b.nFactor.n, 1)} = ${f.num(b.nFactor.zoneFactor, 1)} × ${f.num(b.nFactor.heightFactor, 2)} × ${f.num(b.nFactor.shieldingFactor, 2)}${b.nFactor.overridden ? " (entered)" : ""}`],
          ["Shelter class (basic model)", String(b.ashraeBasic.shelterClass)],
          ["Stack coefficient Cs (SI)", f.num(b.ashraeBasic.csSI, 6)],
          ["Wind coefficient Cw (SI)", f.num(b.ashraeBasic.cwSI, 6)],
          ["At design: ASHRAE basic before / after", `${f.achNatural(b.ashraeBasic.design.ach)} / ${f.achNatural(fin.ashraeBasic.design.ach)} ACH`],
        ]}
        method={<>{note.method}. Natural ACH by N-factor = ACH50 ÷ N; by the basic model, Q = ELA × √(Cs × ΔT + Cw × wind²).</>}
        sources={[b.nFactor.source, b.ashraeBasic.source]}
      />
    </Section>
  );
}
