import type { Metadata } from "next";
import { notFound } from "next/navigation";
import { DocumentsPanel } from "@/components/documents/documents-panel";
import { JobTabs } from "@/components/jobs/job-tabs";
import { can } from "@/lib/authz/permissions";
import { getJob } from "@/lib/data/jobs";
import { requireStaffPage } from "@/lib/session";

export const metadata: Metadata = { title: "Documents" };

export default async function DocumentsPage({ params }: { params: Promise<{ id: string }> }) {
  const user = await requireStaffPage("documents:read");
  const { id } = await params;
  const job = await getJob(user, id);
  if (!job) notFound();
  return (
    <>
      <p className="text-sm font-semibold text-ember-700">Job #{job.number}</p>
      <h1 className="text-3xl font-bold text-spruce-900">{job.house.street}</h1>
      <JobTabs jobId={job.id} active="documents" />
      <DocumentsPanel jobId={job.id} jobNumber={job.number} canIssue={can(user.role, "documents:issue")} />
    </>
  );
}
