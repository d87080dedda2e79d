import type { Metadata } from "next";
import Link from "next/link";
import { CrewLogScreen } from "@/components/crew/crew-log-screen";
import { JobTabs } from "@/components/jobs/job-tabs";
import { StageBadge } from "@/components/jobs/stage-badge";
import { can } from "@/lib/authz/permissions";
import { requireJobPage } from "@/lib/session";

export const metadata: Metadata = { title: "Crew log" };

export default async function CrewLogPage({ params }: { params: Promise<{ id: string }> }) {
  const { user, job } = await requireJobPage(params, "crewlog:read");
  const back = can(user.role, "crewlog:write") ? { href: "/today", label: "← Today" } : { href: `/jobs/${job.id}`, label: `← Job #${job.number}` };
  return (
    <>
      <p className="mb-2 text-sm"><Link href={back.href} className="inline-flex min-h-11 items-center text-spruce-700 underline">{back.label}</Link></p>
      <div className="mb-2 flex flex-wrap items-start justify-between gap-2">
        <div>
          <p className="text-sm font-semibold text-ember-700">Job #{job.number}</p>
          <h1 className="text-3xl font-bold text-spruce-900">Crew log</h1>
          <p className="text-ink-muted">{job.house.street}, {job.house.city}</p>
        </div>
        <StageBadge stage={job.stage} />
      </div>
      <JobTabs jobId={job.id} active="crew" />
      <div className="mx-auto max-w-2xl">
        <CrewLogScreen jobId={job.id} />
      </div>
    </>
  );
}
