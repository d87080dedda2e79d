"use client";

import type { MoistureScreen } from "@/calc/moisture";
import * as f from "./format";
import { How, methodNote, Section, type SectionProps } from "./parts";
import type { Units } from "./format";

/** Walls whose layer stack an upgrade changed, grouped by the stack they end with. */
function upgradedWalls(a: SectionProps["analysis"]) {
  const groups = new Map<string, string[]>();
  a.final.envelope.surfaces.forEach((s, i) => {
    if (s.kind !== "wall" || s.assemblyKey === a.baseline.envelope.surfaces[i]?.assemblyKey) return;
    groups.set(s.assemblyKey, [...(groups.get(s.assemblyKey) ?? []), s.name]);
  });
  return [...groups].map(([key, walls]) => ({ walls, screen: a.moisture.after.find((m) => m.assemblyKey === key) }))
    .filter((g): g is { walls: string[]; screen: MoistureScreen } => g.screen !== undefined);
}

function plainWords(m: MoistureScreen, u: Units) {
  if (m.atRisk.length === 0) return `No layer in the wall gets colder than the indoor dew point (${f.temp(m.dewPointF, u)}) on a design day. No condensation risk found.`;
  const faces = m.atRisk.map((x) => `the inside face of ${x.outerLayer} (${f.temp(x.tempF, u)})`).join(" and ");
  return `On a design day ${faces} ${m.atRisk.length > 1 ? "are" : "is"} colder than the indoor dew point (${f.temp(m.dewPointF, u)}). Indoor air that leaks into the wall could condense there: keep the inside airtight and let the outside dry.`;
}

export function Moisture({ analysis: a, units }: SectionProps) {
  const groups = upgradedWalls(a);
  const note = methodNote(a, "Moisture");
  return (
    <Section title="Moisture in upgraded walls">
      {groups.length === 0 ? <p className="text-ink-muted">No wall is upgraded in this plan.</p> : null}
      <ul className="space-y-4">
        {groups.map(({ walls, screen: m }) => (
          <li key={m.assemblyKey} className="space-y-1" data-testid="results-moisture-wall">
            <p className="font-semibold">
              {walls.join(", ")}
              <span className={`ml-2 inline-block rounded px-2 py-0.5 text-sm ${m.atRisk.length ? "bg-warn-bg text-warn" : "bg-spruce-50 text-spruce-800"}`}>
                {m.atRisk.length ? "Condensation possible" : "No risk found"}
              </span>
            </p>
            <p className="text-sm">{plainWords(m, units)}</p>
            <How
              what={`the moisture screen of ${walls.join(", ")}`}
              inputs={[
                ["Layer stack after the upgrade", m.assemblyName],
                ["Indoor", `${f.temp(m.indoorF, units)}, ${f.percent(m.indoorRH)} relative humidity`],
                ["Outdoor design", f.temp(m.outdoorF, units)],
                ["Indoor dew point", f.temp(m.dewPointF, units)],
                ...m.interfaces.map((x): [string, string] => [/air film/i.test(x.outerLayer) ? `Outer face of ${x.innerLayer}` : `Inside face of ${x.outerLayer}`, `${f.temp(x.tempF, units)}${x.belowDewPoint ? " (below dew point)" : ""}`]),
              ]}
              method={<>{note.method}: T = t_in − (t_in − t_out) × R from inside ÷ R total, through the cavity. This is a screening check at design conditions, not a hygrothermal simulation.</>}
              sources={[note.source]}
            />
          </li>
        ))}
      </ul>
    </Section>
  );
}
