"use client";

import { DEFAULT_GRID_LB_PER_KWH, FUELS } from "@/calc/energy";
import * as f from "./format";
import { How, methodNote, rowHead, Section, tdNum, th, thNum, type SectionProps } from "./parts";

/** Design heat load, yearly fuel, cost and CO2, before and after the plan. */
export function LoadAndEnergy({ analysis: a, units }: SectionProps) {
  const b = a.baseline;
  const fin = a.final;
  const fuel = FUELS[a.input.heating.fuel];
  const eff = a.input.heating.efficiency;
  const dl = methodNote(a, "Design heat load");
  const heat = methodNote(a, "Annual heating");
  const rows: [string, string, string][] = [
    ["Design heat load", f.power(b.designLoad.totalBtuh, units), f.power(fin.designLoad.totalBtuh, units)],
    ["Fuel per year", f.fuel(b.energy.fuelUnits, b.energy.fuelUnit), f.fuel(fin.energy.fuelUnits, fin.energy.fuelUnit)],
    ["Heating cost per year", f.usd(b.energy.costUSD), f.usd(fin.energy.costUSD)],
    ["CO2 per year", f.co2(b.energy.co2Lb, units), f.co2(fin.energy.co2Lb, units)],
  ];
  const infMethod = b.infiltration.method === "n-factor" ? "N-factor" : "ASHRAE basic model";
  return (
    <Section title="Heat load and yearly energy">
      <table className="w-full text-sm">
        <caption className="sr-only">Heat load and yearly energy before and after the plan</caption>
        <thead>
          <tr className="border-b border-line">
            <th scope="col" className={th}><span className="sr-only">Figure</span></th>
            <th scope="col" className={thNum}>Before</th>
            <th scope="col" className={thNum}>After</th>
          </tr>
        </thead>
        <tbody>
          {rows.map(([label, before, after]) => (
            <tr key={label} className="border-b border-line/60 last:border-0">
              <th scope="row" className={rowHead}>{label}</th>
              <td className={tdNum}>{before}</td>
              <td className={`${tdNum} font-semibold text-spruce-800`}>{after}</td>
            </tr>
          ))}
        </tbody>
      </table>
      <div>
        <How
          what="the design heat load"
          inputs={[
            ["Indoor design temperature", f.temp(b.designLoad.indoorF, units)],
            ["Outdoor design temperature", `${f.temp(b.designLoad.outdoorF, units)} (${a.climate.designPercentile} %)`],
            ["Temperature difference", f.deltaT(b.designLoad.deltaTF, units)],
            ["Envelope UA before / after", `${f.ua(b.designLoad.envelopeUA, units)} / ${f.ua(fin.designLoad.envelopeUA, units)}`],
            [`Natural air flow (${infMethod}) before / after`, `${f.flow(b.designLoad.infiltrationCfm, units)} / ${f.flow(fin.designLoad.infiltrationCfm, units)}`],
            ["Envelope part before / after", `${f.powerExact(b.designLoad.envelopeBtuh, units)} / ${f.powerExact(fin.designLoad.envelopeBtuh, units)}`],
            ["Air leakage part before / after", `${f.powerExact(b.designLoad.infiltrationBtuh, units)} / ${f.powerExact(fin.designLoad.infiltrationBtuh, units)}`],
            ["Climate", a.climate.name],
          ]}
          method={<>{b.designLoad.formula} ({dl.source}).</>}
          sources={[a.climate.designSource]}
        />
        <How
          what="the yearly fuel, cost and CO2"
          inputs={[
            ["Heating degree days", f.degreeDays(a.climate.hdd65, units)],
            ["Heat loss coefficient before / after", `${f.ua(b.energy.heatLossCoefficient, units)} / ${f.ua(fin.energy.heatLossCoefficient, units)}`],
            ["Degree-day correction", f.num(b.energy.correctionFactor, 2)],
            [`Seasonal efficiency (${eff.kind.toUpperCase()} ${eff.value})`, f.num(b.energy.efficiency, 2)],
            ["Fuel bought before / after", `${f.energy(b.energy.mmbtu, units)} / ${f.energy(fin.energy.mmbtu, units)}`],
            ["Fuel price", `${f.usdCents(a.input.heating.pricePerUnitUSD)} per ${b.energy.fuelUnit}`],
            ...(fuel.co2KgPerMMBtu === undefined ? [["Grid CO2", `${f.num(a.input.gridLbPerKWh ?? DEFAULT_GRID_LB_PER_KWH, 2)} lb/kWh`] as [string, string]] : []),
          ]}
          method={<>{b.energy.formula}; fuel = heat ÷ efficiency ÷ the heat in one {b.energy.fuelUnit}; cost = fuel × price; CO2 from the fuel&apos;s emission factor.</>}
          sources={[heat.source, a.climate.degreeDaySource, fuel.source]}
        />
      </div>
    </Section>
  );
}
