"use client";

import { useState } from "react";
import { climateFromEpw, EpwParseError, parseEpw, stations } from "@/calc";
import type { AssessmentDoc } from "@/lib/assessment/doc";
import { setAt, useAssessmentCtx } from "./context";
import { ChoiceField, NumField, TextField } from "./fields";

type Climate = NonNullable<AssessmentDoc["house"]["climate"]>;
const presence = [{ value: "unknown", label: "Unknown" }, { value: "present", label: "Present" }, { value: "absent", label: "Absent" }] as const;
const fuels = [
  { value: "natural-gas", label: "Natural gas (therm)" }, { value: "oil", label: "No. 2 oil (gallon)" }, { value: "propane", label: "Propane (gallon)" },
  { value: "electric-resistance", label: "Electric resistance (kWh)" }, { value: "heat-pump", label: "Heat pump (kWh)" },
] as const;

export function HouseSection() {
  const { doc, update, readOnly, pricesVisible } = useAssessmentCtx();
  const h = doc.house;
  const set = (path: (string | number)[], v: unknown) => update((d) => setAt(d, path, v));
  const [epwMessage, setEpwMessage] = useState<string | null>(null);
  const climateKind = h.climate?.source ?? "";
  const ceiling = h.ceilingHeightFt ?? null;

  async function onEpw(file: File) {
    try {
      const epw = parseEpw(await file.text());
      set(["house", "climate"], climateFromEpw(epw) satisfies Climate);
      setEpwMessage(`Read ${file.name}: heating degree days and design temperatures from its hourly dry-bulb.`);
    } catch (err) {
      setEpwMessage(err instanceof EpwParseError ? `That weather file could not be read: ${err.message}` : "That file is not an EPW weather file.");
    }
  }

  return (
    <section aria-labelledby="house-h" className="card isolate space-y-5">
      <h2 id="house-h" className="text-xl font-semibold text-spruce-800">House</h2>
      <div className="grid gap-4 sm:grid-cols-2 lg:grid-cols-3">
        <NumField path="house.yearBuilt" label="Year built" value={h.yearBuilt} onValue={(n) => set(["house", "yearBuilt"], n ?? Number.NaN)} />
        <NumField path="house.stories" label="Stories" value={h.stories} onValue={(n) => set(["house", "stories"], n ?? Number.NaN)} />
        <NumField path="house.bedrooms" label="Bedrooms" value={h.bedrooms} onValue={(n) => set(["house", "bedrooms"], n ?? Number.NaN)} />
        <NumField path="house.floorAreaFt2" label="Conditioned floor area (ft²)" value={h.floorAreaFt2} onValue={(n) => set(["house", "floorAreaFt2"], n ?? Number.NaN)} />
        <NumField path="house.ceilingHeightFt" label="Average ceiling height (ft)" value={ceiling} onValue={(n) => set(["house", "ceilingHeightFt"], n)} />
        <div>
          <NumField path="house.volumeFt3" label="Conditioned volume (ft³)" value={h.volumeFt3} onValue={(n) => set(["house", "volumeFt3"], n ?? Number.NaN)} />
          {!readOnly && ceiling ? (
            <button type="button" className="mt-1 text-sm font-semibold text-spruce-700 underline" onClick={() => set(["house", "volumeFt3"], Math.round(h.floorAreaFt2 * ceiling))}>
              Use floor area × ceiling height = {Math.round(h.floorAreaFt2 * ceiling).toLocaleString("en-US")} ft³
            </button>
          ) : null}
        </div>
        <ChoiceField path="house.foundation" label="Foundation" value={h.foundation} onValue={(v) => set(["house", "foundation"], v)} options={[{ value: "basement", label: "Basement" }, { value: "crawlspace", label: "Crawlspace" }, { value: "slab", label: "Slab" }, { value: "other", label: "Other" }]} />
        <ChoiceField path="house.shielding" label="Shielding from wind" value={h.shielding} onValue={(v) => set(["house", "shielding"], v)} options={[{ value: "well-shielded", label: "Well shielded" }, { value: "normal", label: "Normal" }, { value: "exposed", label: "Exposed" }]} />
        <NumField path="house.indoorTempF" label="Indoor design temperature (°F)" value={h.indoorTempF} onValue={(n) => set(["house", "indoorTempF"], n ?? Number.NaN)} />
        <NumField path="house.indoorRH" label="Indoor relative humidity (%)" value={Math.round(h.indoorRH * 1000) / 10} onValue={(n) => set(["house", "indoorRH"], n == null ? Number.NaN : n / 100)} />
      </div>

      <fieldset className="space-y-3">
        <legend className="font-semibold">Climate</legend>
        <ChoiceField path="house.climate" label="Where the degree days come from" value={climateKind} onValue={(v) => set(["house", "climate"], v === "station" ? { source: "station", wmo: stations[0]!.wmo } : v === "manual" ? { source: "manual", hdd65: 5000, heatingDesignTempF: 10, sourceText: "" } : h.climate)} options={[{ value: "station", label: "A weather station from the table" }, { value: "manual", label: "Typed in, with its source" }, { value: "epw", label: "An EPW weather file" }]} />
        {h.climate?.source === "station" ? (
          <ChoiceField path="house.climate.wmo" label="Weather station" value={h.climate.wmo} onValue={(v) => set(["house", "climate", "wmo"], v)} options={stations.map((s) => ({ value: s.wmo, label: `${s.name}, ${s.state} (${s.wmo}) — ${Math.round(s.hdd65).toLocaleString("en-US")} HDD65` }))} />
        ) : null}
        {h.climate?.source === "manual" ? (
          <div className="grid gap-4 sm:grid-cols-3">
            <NumField path="house.climate.hdd65" label="Heating degree days (65 °F)" value={h.climate.hdd65} onValue={(n) => set(["house", "climate", "hdd65"], n ?? Number.NaN)} />
            <NumField path="house.climate.heatingDesignTempF" label="Heating design temperature (°F)" value={h.climate.heatingDesignTempF} onValue={(n) => set(["house", "climate", "heatingDesignTempF"], n ?? Number.NaN)} />
            <TextField path="house.climate.sourceText" label="Source of these figures" value={h.climate.sourceText} onValue={(v) => set(["house", "climate", "sourceText"], v)} />
          </div>
        ) : null}
        {climateKind === "epw" || !readOnly ? (
          <div>
            <label className="field-label" htmlFor="epw-file">EPW weather file for the location</label>
            <input id="epw-file" type="file" accept=".epw,text/plain" disabled={readOnly} className="block text-sm" onChange={(e) => e.target.files?.[0] && void onEpw(e.target.files[0])} />
            {h.climate?.source === "epw" ? <p className="mt-1 text-sm text-ink-muted">In use: {h.climate.name}, {Math.round(h.climate.hdd65).toLocaleString("en-US")} HDD65, 99 % design {h.climate.heatingDesign99F.toFixed(1)} °F (from this one file, not a long-term handbook value).</p> : null}
            {epwMessage ? <p role="status" className="mt-1 text-sm">{epwMessage}</p> : null}
          </div>
        ) : null}
      </fieldset>

      <fieldset className="space-y-3">
        <legend className="font-semibold">Heating system</legend>
        <div className="grid gap-4 sm:grid-cols-2 lg:grid-cols-4">
          <ChoiceField path="heating.fuel" label="Fuel" value={doc.heating.fuel} options={fuels} onValue={(v) => update((d) => ({ ...d, heating: { ...d.heating, fuel: v, efficiency: v === "heat-pump" ? { kind: "hspf", value: 8.5 } : v === "electric-resistance" ? { kind: "cop", value: 1 } : d.heating.efficiency.kind === "afue" ? d.heating.efficiency : { kind: "afue", value: 0.8 } } }))} />
          <NumField path="heating.efficiency.value" label={doc.heating.efficiency.kind === "afue" ? "AFUE (fraction, e.g. 0.78)" : doc.heating.efficiency.kind.toUpperCase()} value={doc.heating.efficiency.value} onValue={(n) => set(["heating", "efficiency", "value"], n ?? Number.NaN)} />
          {pricesVisible ? <NumField path="heating.pricePerUnitUSD" label="Fuel price ($ per unit)" value={doc.heating.pricePerUnitUSD} onValue={(n) => set(["heating", "pricePerUnitUSD"], n ?? Number.NaN)} /> : null}
        </div>
      </fieldset>

      <fieldset className="space-y-3">
        <legend className="font-semibold">Hazards found</legend>
        <div className="grid gap-4 sm:grid-cols-3">
          <ChoiceField path="house.hazards.knobAndTube" label="Knob-and-tube wiring" value={h.hazards.knobAndTube} options={presence} onValue={(v) => set(["house", "hazards", "knobAndTube"], v)} />
          <ChoiceField path="house.hazards.vermiculite" label="Vermiculite fill" value={h.hazards.vermiculite} options={presence} onValue={(v) => set(["house", "hazards", "vermiculite"], v)} />
          <TextField path="house.hazards.combustionAppliances" label="Combustion appliances (comma-separated)" value={h.hazards.combustionAppliances.join(", ")} onValue={(v) => set(["house", "hazards", "combustionAppliances"], v.split(",").map((x) => x.trim()).filter(Boolean))} />
        </div>
        <p className="text-sm text-ink-muted">Found a hazard? Stop and follow local codes and licensed practice: an electrician for live knob-and-tube, an asbestos professional for vermiculite, combustion-safety testing after air sealing.</p>
      </fieldset>
    </section>
  );
}
