import type { Metadata } from "next";
import { NewJobForm } from "@/components/jobs/new-job-form";
import { climateStationOptions } from "@/lib/climate";
import { requireStaffPage } from "@/lib/session";

export const metadata: Metadata = { title: "New job" };

export default async function NewJobPage() {
  await requireStaffPage("jobs:create");
  return (
    <>
      <h1 className="mb-1 text-3xl font-bold text-spruce-900">New job</h1>
      <p className="mb-6 text-ink-muted">The client and the house facts from the first call. Everything can be refined at the assessment.</p>
      <NewJobForm stations={climateStationOptions()} />
    </>
  );
}
