import { JobTabs } from "./job-tabs";

type Tab = Parameters<typeof JobTabs>[0]["active"];

/** The top of a job's own pages: its number, the house's street and the tabs between the pages. */
export function JobHeading({ job, active }: { job: { id: string; number: number; house: { street: string } }; active: Tab }) {
  return (
    <>
      <p className="text-sm font-semibold text-ember-700">Job #{job.number}</p>
      <h1 className="text-3xl font-bold text-spruce-900">{job.house.street}</h1>
      <JobTabs jobId={job.id} active={active} />
    </>
  );
}
