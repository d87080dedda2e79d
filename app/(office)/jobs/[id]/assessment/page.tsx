import type { Metadata } from "next";
import { notFound } from "next/navigation";
import { AssessmentWorkspace } from "@/components/assessment/workspace";
import { JobTabs } from "@/components/jobs/job-tabs";
import { getJob } from "@/lib/data/jobs";
import { requireStaffPage } from "@/lib/session";

export const metadata: Metadata = { title: "Assessment" };

export default async function AssessmentPage({ params }: { params: Promise<{ id: string }> }) {
  const user = await requireStaffPage("assessment:read");
  const { id } = await params;
  const job = await getJob(user, id);
  if (!job) notFound();
  return (
    <>
      <p className="text-sm font-semibold text-ember-700">Job #{job.number}</p>
      <h1 className="text-3xl font-bold text-spruce-900">{job.house.street}</h1>
      <JobTabs jobId={job.id} active="assessment" />
      <AssessmentWorkspace jobId={job.id} initialUnits={user.unitSystem} />
    </>
  );
}
