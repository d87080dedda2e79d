"use client";

import type { HouseAnalysis } from "@/calc/analyze";
import { Cautions } from "./cautions";
import { DensePack } from "./dense-pack";
import * as f from "./format";
import { Headline } from "./headline";
import { HeatLoss } from "./heat-loss";
import { Leakage } from "./leakage";
import { LoadAndEnergy } from "./load-energy";
import { Moisture } from "./moisture";
import { InputErrors, SoftWarnings } from "./notices";
import { How, methodNote } from "./parts";
import { UpgradesTable } from "./upgrades-table";
import { Ventilation } from "./ventilation";

export type ResultsPanelProps = {
  /** analyzeHouse on the current input, computed by the caller in the browser; null while there is none. */
  analysis: HouseAnalysis | null;
  units: f.Units;
  /** Input issues (path and message); when present the panel lists them instead of results. */
  error?: { path: string; message: string }[];
};

/** The live results beside the assessment inputs (below them on a phone). Pure props: no fetching. */
export function ResultsPanel({ analysis, units, error }: ResultsPanelProps) {
  const invalid = Boolean(error && error.length > 0);
  return (
    <div className="@container w-full min-w-0 space-y-4 text-base text-charcoal [contain:content]" data-testid="results-panel">
      <h2 className="font-display text-2xl font-semibold text-spruce-900">Results</h2>
      <div aria-live="polite" className="contents">
        {invalid ? <InputErrors issues={error!} /> : null}
      </div>
      {!invalid && !analysis ? <p className="card text-ink-muted">Results appear here once the house has its facts, a surface and a blower-door reading.</p> : null}
      {!invalid && analysis ? <Results analysis={analysis} units={units} /> : null}
    </div>
  );
}

function Results({ analysis: a, units }: { analysis: HouseAnalysis; units: f.Units }) {
  const c = a.climate;
  const note = methodNote(a, "Climate");
  return (
    <>
      <div className="text-sm text-ink-muted">
        <p>
          {c.name} · {f.degreeDays(c.hdd65, units)} · design {f.temp(c.heatingDesignTempF, units)}
        </p>
        <How
          what="the climate"
          inputs={[
            ["Heating degree days", f.degreeDays(c.hdd65, units)],
            [`Heating design temperature (${c.designPercentile} %)`, f.temp(c.heatingDesignTempF, units)],
          ]}
          method={`${note.method}.`}
          sources={[c.degreeDaySource, c.designSource, note.source]}
        />
      </div>
      <SoftWarnings warnings={a.warnings} />
      <Headline analysis={a} units={units} />
      <LoadAndEnergy analysis={a} units={units} />
      <UpgradesTable analysis={a} units={units} />
      <HeatLoss analysis={a} units={units} />
      <Leakage analysis={a} units={units} />
      <Ventilation analysis={a} units={units} />
      <Moisture analysis={a} units={units} />
      <DensePack analysis={a} units={units} />
      <Cautions analysis={a} />
    </>
  );
}
