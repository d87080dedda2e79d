import type { Metadata } from "next";
import Link from "next/link";
import { Suspense } from "react";
import { JobsTable } from "@/components/jobs/jobs-table";
import { can } from "@/lib/authz/permissions";
import { requireStaffPage } from "@/lib/session";

export const metadata: Metadata = { title: "Jobs" };

export default async function JobsPage() {
  const user = await requireStaffPage("jobs:list");
  return (
    <>
      <div className="mb-6 flex flex-wrap items-center justify-between gap-3">
        <div>
          <h1 id="jobs-heading" className="text-3xl font-bold text-spruce-900">Jobs</h1>
          <p className="text-ink-muted">{user.role === "installer" ? "Jobs you are assigned to." : "Every house your company is working on."}</p>
        </div>
        {can(user.role, "jobs:create") ? (
          <Link href="/jobs/new" className="btn-accent">New job</Link>
        ) : null}
      </div>
      <Suspense fallback={<p className="text-ink-muted">Loading jobs…</p>}>
        <JobsTable />
      </Suspense>
    </>
  );
}
