import type { Metadata } from "next";
import Link from "next/link";
import { StageBadge } from "@/components/jobs/stage-badge";
import { listTodayJobs } from "@/lib/data/crew-log";
import { requireStaffPage } from "@/lib/session";

export const metadata: Metadata = { title: "Today" };

const when = new Intl.DateTimeFormat("en-US", { month: "short", day: "numeric", hour: "numeric", minute: "2-digit", timeZone: "America/New_York" });

export default async function TodayPage() {
  const user = await requireStaffPage("crewlog:write");
  const jobs = await listTodayJobs(user);
  return (
    <>
      <h1 className="text-3xl font-bold text-spruce-900">Today</h1>
      <p className="text-ink-muted">Your jobs that are approved or being installed. Open one to log walls.</p>
      {jobs.length === 0 ? (
        <p className="mt-6 rounded-lg border border-line bg-white p-5 text-lg">No approved or installing jobs are assigned to you. The office assigns crews on the job page.</p>
      ) : (
        <ul className="mt-4 grid gap-3 sm:grid-cols-2" data-testid="today-jobs">
          {jobs.map((j) => (
            <li key={j.id}>
              <Link href={`/jobs/${j.id}/crew`} className="block min-h-24 rounded-lg border-2 border-line bg-white p-4 shadow-sm hover:border-spruce-600 focus-visible:border-spruce-600" data-testid="today-job">
                <span className="flex items-start justify-between gap-2">
                  <span className="text-sm font-semibold text-ember-700">Job #{j.number}</span>
                  <StageBadge stage={j.stage} />
                </span>
                <span className="mt-1 block text-xl font-bold text-spruce-900">{j.street}, {j.city}</span>
                <span className="block text-ink-muted">{j.title}</span>
                <span className="mt-2 block font-semibold">
                  {j.entries ? `${Math.round(j.bagsLogged * 10) / 10} bags logged · last ${when.format(new Date(j.lastLoggedAt!))}` : "Nothing logged yet"}
                </span>
                <span className="mt-2 inline-flex min-h-12 items-center font-semibold text-spruce-700 underline">Open crew log →</span>
              </Link>
            </li>
          ))}
        </ul>
      )}
    </>
  );
}
