import type { Metadata } from "next";
import { DocumentsPanel } from "@/components/documents/documents-panel";
import { JobHeading } from "@/components/jobs/job-heading";
import { can } from "@/lib/authz/permissions";
import { requireJobPage } from "@/lib/session";

export const metadata: Metadata = { title: "Documents" };

export default async function DocumentsPage({ params }: { params: Promise<{ id: string }> }) {
  const { user, job } = await requireJobPage(params, "documents:read");
  return (
    <>
      <JobHeading job={job} active="documents" />
      <DocumentsPanel jobId={job.id} jobNumber={job.number} canIssue={can(user.role, "documents:issue")} />
    </>
  );
}
