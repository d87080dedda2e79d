"use client";

import * as f from "./format";
import { How, methodNote, rowHead, Section, tdNum, th, thNum, type SectionProps } from "./parts";

/** Dense-pack material and holes per wall, on the walls as they were found. */
export function DensePack({ analysis: a, units }: SectionProps) {
  const walls = a.densePack;
  const note = methodNote(a, "Dense-pack");
  const total = walls.reduce((t, w) => ({ lb: t.lb + w.pounds, bags: t.bags + w.bagsRoundedUp, holes: t.holes + w.holes }), { lb: 0, bags: 0, holes: 0 });
  const dp = a.input.densePack;
  return (
    <Section title="Dense-pack estimate">
      {walls.length === 0 ? (
        <p className="text-ink-muted">No dense-pack upgrade in this plan.</p>
      ) : (
        <>
          <table className="w-full text-sm">
            <caption className="sr-only">Dense-pack cellulose per wall: weight, bags and holes</caption>
            <thead>
              <tr className="border-b border-line">
                <th scope="col" className={th}>Wall</th>
                <th scope="col" className={thNum}>Cellulose ({f.massUnit(units)})</th>
                <th scope="col" className={thNum}>Bags</th>
                <th scope="col" className={thNum}>Holes</th>
              </tr>
            </thead>
            <tbody>
              {walls.map((w) => (
                <tr key={w.surfaceId} className="border-b border-line/60" data-testid={`results-dense-pack-${w.surfaceId}`}>
                  <th scope="row" className={rowHead}>{w.surfaceName}</th>
                  <td className={tdNum}>{f.massValue(w.pounds, units)}</td>
                  <td className={tdNum}>{w.bagsRoundedUp}</td>
                  <td className={tdNum}>{w.holes}</td>
                </tr>
              ))}
            </tbody>
            <tfoot>
              <tr>
                <th scope="row" className="px-2 py-1.5 text-left">Total</th>
                <td className={`${tdNum} font-semibold`}>{f.massValue(total.lb, units)}</td>
                <td className={`${tdNum} font-semibold`}>{total.bags}</td>
                <td className={`${tdNum} font-semibold`}>{total.holes}</td>
              </tr>
            </tfoot>
          </table>
          <p className="text-sm text-ink-muted">
            Bags are {f.mass(dp.bagWeightLb, units)} each, rounded up per wall, at {f.density(dp.densityLbFt3, units)} installed. One hole per bay, two in a bay blocked part-way.
          </p>
          <How
            what="the dense-pack estimate"
            inputs={[
              ["Installed density", f.density(dp.densityLbFt3, units)],
              ["Bag weight", f.mass(dp.bagWeightLb, units)],
            ]}
            groups={walls.map((w) => ({
              title: w.surfaceName,
              inputs: [
                ["Net area (gross)", `${f.area(w.inputs.netAreaFt2, units)} (${f.area(w.inputs.grossAreaFt2, units)})`],
                ["Cavity depth", f.length(w.inputs.cavityDepthIn, units)],
                ["Framing fraction", f.num(w.inputs.framingFraction, 2)],
                ["Stud spacing", `${f.length(w.inputs.spacingIn, units)} o.c.`],
                ["Cavity volume", f.volume(w.cavityVolumeFt3, units, 1)],
                ["Weight and bags, exact", `${f.mass(w.pounds, units)}, ${f.num(w.bags, 1)} bags`],
                ["Bays, of them blocked", `${w.bays}, ${w.blockedBays}`],
                ["Per bay", `${f.mass(w.perBay.pounds, units, 1)}, ${f.num(w.perBay.bags, 2)} bags`],
              ],
            }))}
            method={<>{walls[0].formula}. Bays across = wall length ÷ stud spacing; bays up = wall height ÷ storey height.</>}
            sources={[note.source]}
          />
        </>
      )}
    </Section>
  );
}
