import type { Metadata } from "next";
import { AssessmentWorkspace } from "@/components/assessment/workspace";
import { JobHeading } from "@/components/jobs/job-heading";
import { requireJobPage } from "@/lib/session";

export const metadata: Metadata = { title: "Assessment" };

export default async function AssessmentPage({ params }: { params: Promise<{ id: string }> }) {
  const { user, job } = await requireJobPage(params, "assessment:read");
  return (
    <>
      <JobHeading job={job} active="assessment" />
      <AssessmentWorkspace jobId={job.id} initialUnits={user.unitSystem} />
    </>
  );
}
