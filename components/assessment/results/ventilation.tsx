"use client";

import type { VentilationResult } from "@/calc/ventilation";
import * as f from "./format";
import { How, methodNote, Section, type SectionProps } from "./parts";
import type { Units } from "./format";

function verdict(v: VentilationResult, u: Units) {
  return v.needsFan ? `Fan needed: ${f.flow(v.fanCfm, u)} continuous` : "No fan needed";
}

/** ASHRAE 62.2-2016 whole-dwelling ventilation, before and after the plan. */
export function Ventilation({ analysis: a, units }: SectionProps) {
  const { before, after } = a.ventilation;
  const note = methodNote(a, "Ventilation");
  const i = after.inputs;
  return (
    <Section title="Ventilation">
      <dl className="grid grid-cols-1 gap-3 @sm:grid-cols-2">
        <div className={`rounded-md p-3 ${after.needsFan ? "bg-warn-bg" : "bg-spruce-50"}`}>
          <dt className="text-sm font-semibold text-ink-muted">After the plan</dt>
          <dd className={`font-display text-xl font-semibold ${after.needsFan ? "text-warn" : "text-spruce-800"}`} data-testid="results-ventilation-after">{verdict(after, units)}</dd>
          <dd className="text-sm text-charcoal">Needs {f.flow(after.qTotCfm, units, 1)}; leakage supplies about {f.flow(after.qInfCfm, units, 1)}.</dd>
        </div>
        <div className="rounded-md bg-paper p-3">
          <dt className="text-sm font-semibold text-ink-muted">As found</dt>
          <dd className="font-display text-xl font-semibold text-charcoal">{verdict(before, units)}</dd>
          <dd className="text-sm text-charcoal">Needs {f.flow(before.qTotCfm, units, 1)}; leakage supplies about {f.flow(before.qInfCfm, units, 1)}.</dd>
        </div>
      </dl>
      {after.needsFan && !before.needsFan ? (
        <p className="text-sm text-charcoal">Tightening the house takes it below the whole-dwelling rate: plan a continuous exhaust or balanced fan with the air sealing.</p>
      ) : null}
      <How
        what="the ventilation check"
        inputs={[
          ["Floor area", f.area(i.floorAreaFt2, units)],
          ["Bedrooms", String(i.bedrooms)],
          ["Height for the credit", f.heightFt(i.heightFt, units)],
          ["Weather and shielding factor (wsf)", f.num(i.wsf, 2)],
          ["Air flow at 50 Pa before / after", `${f.cfm50(before.inputs.cfm50, units)} / ${f.cfm50(i.cfm50, units)}`],
          ["Required Q_tot", f.flow(after.qTotCfm, units, 1)],
          ["Infiltration credit Q_inf before / after", `${f.flow(before.qInfCfm, units, 1)} / ${f.flow(after.qInfCfm, units, 1)}`],
          ["Φ before / after", `${f.num(before.phi, 2)} / ${f.num(after.phi, 2)}${i.balanced ? " (balanced fan)" : ""}`],
          ["Fan Q_fan before / after", `${f.flow(before.fanCfm, units, 1)} / ${f.flow(after.fanCfm, units, 1)}`],
        ]}
        method={<>{note.method}: {after.formula} (in cfm, ft² and ft).</>}
        sources={[note.source]}
      />
    </Section>
  );
}
