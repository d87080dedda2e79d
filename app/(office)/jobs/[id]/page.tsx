import type { Metadata } from "next";
import Link from "next/link";
import { notFound } from "next/navigation";
import { JobTabs } from "@/components/jobs/job-tabs";
import { StageBadge } from "@/components/jobs/stage-badge";
import { StageControl } from "@/components/jobs/stage-control";
import { can } from "@/lib/authz/permissions";
import { getJob } from "@/lib/data/jobs";
import { requireStaffPage } from "@/lib/session";
import { jobStageLabels } from "@/lib/stages";

export const metadata: Metadata = { title: "Job" };

const when = new Intl.DateTimeFormat("en-US", { dateStyle: "medium", timeStyle: "short", timeZone: "America/New_York" });
const n = (x: number) => x.toLocaleString("en-US");

export default async function JobPage({ params, searchParams }: { params: Promise<{ id: string }>; searchParams: Promise<{ created?: string }> }) {
  const user = await requireStaffPage("jobs:read");
  const { id } = await params;
  const job = await getJob(user, id);
  if (!job) notFound();
  const { created } = await searchParams;
  const h = job.house;
  const facts: [string, string][] = [
    ["Year built", String(h.yearBuilt)],
    ["Stories", String(h.stories)],
    ["Conditioned floor area", `${n(h.conditionedAreaFt2)} ft²`],
    ["Conditioned volume", `${n(h.volumeFt3)} ft³`],
    ["Bedrooms", String(h.bedrooms)],
    ["Foundation", h.foundation],
    ["Shielding", h.shielding],
    ["Climate station (WMO)", h.climateStationWmo ?? "not chosen"],
  ];
  return (
    <>
      <p className="mb-2 text-sm"><Link href="/jobs" className="text-spruce-700 underline">← All jobs</Link></p>
      {created ? <p role="status" className="mb-4 rounded-md bg-spruce-50 px-3 py-2 text-spruce-800">Job created.</p> : null}
      <div className="flex flex-wrap items-start justify-between gap-4">
        <div>
          <p className="text-sm font-semibold text-ember-700">Job #{job.number}</p>
          <h1 className="text-3xl font-bold text-spruce-900">{job.title}</h1>
          <p className="text-ink-muted">{h.street}, {h.city}, {h.state} {h.postalCode}</p>
        </div>
        <StageBadge stage={job.stage} />
      </div>
      <JobTabs jobId={job.id} active="overview" />

      <div className="mt-6 grid gap-6 lg:grid-cols-3">
        <section className="card lg:col-span-2" aria-labelledby="house-facts">
          <h2 id="house-facts" className="text-xl font-semibold text-spruce-800">House facts</h2>
          <dl className="mt-3 grid grid-cols-1 gap-x-6 gap-y-2 sm:grid-cols-2">
            {facts.map(([k, val]) => (
              <div key={k} className="flex justify-between gap-3 border-b border-line py-1.5">
                <dt className="text-ink-muted">{k}</dt>
                <dd className="font-semibold">{val}</dd>
              </div>
            ))}
          </dl>
        </section>

        <section className="card" aria-labelledby="client-heading">
          <h2 id="client-heading" className="text-xl font-semibold text-spruce-800">Client</h2>
          <p className="mt-2 font-semibold">{job.client.name}</p>
          {can(user.role, "prices:read") ? (
            <>
              {job.client.email ? <p className="text-ink-muted">{job.client.email}</p> : null}
              {job.client.phone ? <p className="text-ink-muted">{job.client.phone}</p> : null}
            </>
          ) : null}
          <h3 className="mt-4 font-semibold">People on this job</h3>
          <p className="text-ink-muted">Auditor: {job.auditor?.name ?? "not assigned"}</p>
          <p className="text-ink-muted">Crew: {job.crew.length ? job.crew.map((c) => c.name).join(", ") : "not assigned"}</p>
        </section>
      </div>

      <section className="card mt-6" aria-labelledby="stage-heading">
        <h2 id="stage-heading" className="text-xl font-semibold text-spruce-800">Stage</h2>
        {can(user.role, "jobs:stage") ? <StageControl jobId={job.id} stage={job.stage} version={job.version} /> : null}
        <h3 className="mt-5 font-semibold">History</h3>
        <ol className="mt-2 space-y-1" data-testid="stage-history">
          {job.history.map((e) => (
            <li key={e.id} className="text-ink-muted">
              <span className="font-semibold text-charcoal">{jobStageLabels[e.toStage]}</span>
              {e.fromStage ? ` (from ${jobStageLabels[e.fromStage]})` : ""} — {e.byName}, {when.format(e.at)}
              {e.note ? `: ${e.note}` : ""}
            </li>
          ))}
        </ol>
      </section>
    </>
  );
}
