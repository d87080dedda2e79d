import { ResultsPanel } from "@/components/assessment/results";
import { costBasisNote, type ReportSnapshot } from "@/lib/documents/snapshot";
import { ProposalView } from "./proposal-view";
import { ReportCrew } from "./report-crew";
import { ReportPhotos } from "./report-photos";

const day = new Intl.DateTimeFormat("en-US", { dateStyle: "long" });

/** An issued document on screen, drawn from its frozen snapshot only (the PDF uses the same one). */
export function ReportView({ snapshot }: { snapshot: ReportSnapshot }) {
  const s = snapshot;
  return (
    <article className="space-y-6">
      <header>
        <p className="text-sm font-semibold text-ember-700">{s.kind === "proposal" ? "Proposal" : "Savings report"} · version {s.version} · issued {day.format(s.issuedAt)} by {s.issuedByName}</p>
        <h1 className="text-3xl font-bold text-spruce-900">{s.house.street}, {s.house.city}</h1>
        <p className="text-ink-muted">Prepared for {s.client.name} by {s.company.name}{s.company.phone ? ` · ${s.company.phone}` : ""}</p>
        {s.leakageBasis === "measured" ? <p className="mt-2 rounded-md bg-spruce-50 px-3 py-2 text-spruce-800">Leakage figures are measured: this report uses the blower-door reading taken at test-out.</p> : null}
      </header>
      {s.kind === "proposal" ? <ProposalView snapshot={s} /> : null}
      <div className="max-w-2xl">
        <ResultsPanel analysis={s.analysis} units="ip" />
      </div>
      {s.crewSummary ? <ReportCrew crew={s.crewSummary} thresholds={{ high: s.analysis.input.densePack.highRatio, low: s.analysis.input.densePack.lowRatio }} /> : null}
      {s.photos?.length ? <ReportPhotos photos={s.photos} /> : null}
      <p className="rounded-md bg-paper-deep px-3 py-2 text-sm">
        These figures are estimates from published methods and the measurements taken at your house; actual savings depend on weather, fuel prices and how the house is used. All work follows local codes and licensed practice.{costBasisNote(s) ? ` ${costBasisNote(s)}` : ""}
      </p>
    </article>
  );
}
