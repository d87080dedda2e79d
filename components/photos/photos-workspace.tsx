"use client";

import { useRefreshPhotos } from "@/lib/hooks/use-photos";
import { PhotoGallery, type GalleryViewer } from "./photo-gallery";
import { PhotoUploader, type SurfaceOption } from "./photo-uploader";

export function PhotosWorkspace({ jobId, surfaces, canUpload, viewer }: { jobId: string; surfaces: SurfaceOption[]; canUpload: boolean; viewer: GalleryViewer }) {
  const refresh = useRefreshPhotos(jobId);
  return (
    <div className="space-y-6">
      {canUpload ? <PhotoUploader jobId={jobId} surfaces={surfaces} onUploaded={refresh} /> : null}
      <PhotoGallery jobId={jobId} surfaces={surfaces} viewer={viewer} />
    </div>
  );
}
