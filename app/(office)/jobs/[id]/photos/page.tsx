import type { Metadata } from "next";
import Link from "next/link";
import { PhotosWorkspace } from "@/components/photos/photos-workspace";
import { can } from "@/lib/authz/permissions";
import { listPhotoSurfaces } from "@/lib/data/photos";
import { requireJobPage } from "@/lib/session";

export const metadata: Metadata = { title: "Photos" };

export default async function JobPhotosPage({ params }: { params: Promise<{ id: string }> }) {
  const { user, job } = await requireJobPage(params, "photos:read");
  const surfaces = (await listPhotoSurfaces(user, job.id)) ?? [];
  return (
    <>
      <p className="mb-2 text-sm"><Link href={`/jobs/${job.id}`} className="text-spruce-700 underline">← Job #{job.number}</Link></p>
      <div className="mb-6">
        <p className="text-sm font-semibold text-ember-700">Job #{job.number}</p>
        <h1 className="text-3xl font-bold text-spruce-900">Photos</h1>
        <p className="text-ink-muted">{job.house.street}, {job.house.city}</p>
      </div>
      <PhotosWorkspace
        jobId={job.id}
        surfaces={surfaces.map((s) => ({ id: s.id, label: s.label }))}
        canUpload={can(user.role, "photos:upload")}
        viewer={{ id: user.id, canDeleteAny: can(user.role, "photos:delete") && user.role !== "installer", canDeleteOwn: can(user.role, "photos:delete") }}
      />
    </>
  );
}
