"use client";

import { useState } from "react";
import type { PhotoView } from "@/lib/data/photos";
import { FetchError, sendJson } from "@/lib/hooks/fetcher";
import { usePhotos, useRefreshPhotos } from "@/lib/hooks/use-photos";
import { photoTagLabels, photoTagList } from "@/lib/photos/tags";
import type { SurfaceOption } from "./photo-uploader";

const when = new Intl.DateTimeFormat("en-US", { dateStyle: "medium", timeStyle: "short", timeZone: "America/New_York" });
const tagClass: Record<string, string> = {
  before: "bg-paper-deep text-charcoal",
  during: "bg-ember-50 text-ember-700",
  after: "bg-spruce-100 text-spruce-900",
  thermal: "bg-danger-bg text-danger",
};

export type GalleryViewer = { id: string; canDeleteAny: boolean; canDeleteOwn: boolean };

function PhotoCard({ photo, viewer, onDeleted }: { photo: PhotoView; viewer: GalleryViewer; onDeleted: () => void }) {
  const [message, setMessage] = useState<string | null>(null);
  const mayDelete = viewer.canDeleteAny || (viewer.canDeleteOwn && photo.uploadedBy.id === viewer.id);
  async function remove() {
    if (!window.confirm("Delete this photo? This cannot be undone.")) return;
    try {
      await sendJson(photo.url, "DELETE");
      onDeleted();
    } catch (err) {
      setMessage(err instanceof FetchError ? err.message : "Could not reach the server. Try again.");
    }
  }
  const portrait = (photo.height ?? 3) > (photo.width ?? 4);
  return (
    <figure className="overflow-hidden rounded-lg border border-line bg-white" data-testid="photo-card">
      <a href={photo.url} target="_blank" rel="noopener" className="block bg-paper-deep">
        {/* eslint-disable-next-line @next/next/no-img-element -- private, already-sized thumbnails from our own API */}
        <img src={photo.thumbnailUrl} alt={photo.caption || `${photoTagLabels[photo.tag]} photo`} loading="lazy" width={portrait ? 360 : 480} height={portrait ? 480 : 360} className="aspect-[4/3] h-auto w-full object-cover" />
      </a>
      <figcaption className="space-y-1 p-3 text-sm">
        <div className="flex flex-wrap items-center gap-2">
          <span className={`rounded-full px-2 py-0.5 font-semibold ${tagClass[photo.tag]}`}>{photoTagLabels[photo.tag]}</span>
          {photo.surfaceLabel ? <span className="font-semibold text-spruce-800">{photo.surfaceLabel}</span> : null}
        </div>
        {photo.caption ? <p className="text-charcoal">{photo.caption}</p> : null}
        <p className="text-ink-muted">{photo.uploadedBy.name}, {when.format(photo.takenAt ?? photo.createdAt)}</p>
        {mayDelete ? <button type="button" className="min-h-11 font-semibold text-danger underline" onClick={remove}>Delete</button> : null}
        {message ? <p className="font-medium text-danger">{message}</p> : null}
      </figcaption>
    </figure>
  );
}

/** For each surface (and the job as a whole), the latest "before" beside the latest "after". */
function pairsOf(photos: PhotoView[]) {
  const groups = new Map<string, { label: string; before?: PhotoView; after?: PhotoView }>();
  for (const p of photos) {
    if (p.tag !== "before" && p.tag !== "after") continue;
    const key = p.surfaceId ?? "job";
    const g = groups.get(key) ?? { label: p.surfaceLabel ?? "Whole job" };
    g[p.tag] ??= p; // the list is newest first
    groups.set(key, g);
  }
  return [...groups.values()].filter((g): g is { label: string; before: PhotoView; after: PhotoView } => Boolean(g.before && g.after));
}

export function PhotoGallery({ jobId, surfaces, viewer }: { jobId: string; surfaces: SurfaceOption[]; viewer: GalleryViewer }) {
  const [tag, setTag] = useState("");
  const [surfaceId, setSurfaceId] = useState("");
  const { data, error, isLoading } = usePhotos(jobId, { tag, surfaceId });
  const all = usePhotos(jobId);
  const refresh = useRefreshPhotos(jobId);
  const photos = data?.photos ?? [];
  const pairs = pairsOf(all.data?.photos ?? []).filter((p) => !surfaceId || p.before.surfaceId === surfaceId);

  return (
    <section aria-labelledby="gallery-heading" className="space-y-4">
      <div className="flex flex-wrap items-end justify-between gap-3">
        <h2 id="gallery-heading" className="text-xl font-semibold text-spruce-800">Gallery{data ? ` (${photos.length})` : ""}</h2>
        <div className="flex flex-wrap items-end gap-3">
          <div role="group" aria-label="Filter by tag" className="flex flex-wrap gap-1">
            {["", ...photoTagList].map((t) => (
              <button key={t || "all"} type="button" aria-pressed={tag === t} onClick={() => setTag(t)} className={`min-h-11 rounded-full border px-4 text-sm font-semibold ${tag === t ? "border-spruce-700 bg-spruce-700 text-white" : "border-line bg-white text-charcoal hover:bg-paper-deep"}`}>
                {t ? photoTagLabels[t as keyof typeof photoTagLabels] : "All"}
              </button>
            ))}
          </div>
          {surfaces.length ? (
            <div>
              <label htmlFor="gallery-surface" className="field-label">Surface</label>
              <select id="gallery-surface" className="field-input" value={surfaceId} onChange={(e) => setSurfaceId(e.target.value)}>
                <option value="">All surfaces</option>
                {surfaces.map((s) => (
                  <option key={s.id} value={s.id}>{s.label}</option>
                ))}
              </select>
            </div>
          ) : null}
        </div>
      </div>

      {pairs.length && !tag ? (
        <div className="max-w-3xl space-y-3" data-testid="before-after">
          <h3 className="font-semibold">Before and after</h3>
          {pairs.map((p) => (
            <div key={p.label} className="card p-3">
              <p className="mb-2 font-semibold text-spruce-800">{p.label}</p>
              <div className="grid grid-cols-2 gap-3">
                <PhotoCard photo={p.before} viewer={viewer} onDeleted={refresh} />
                <PhotoCard photo={p.after} viewer={viewer} onDeleted={refresh} />
              </div>
            </div>
          ))}
        </div>
      ) : null}

      {error ? <p className="rounded-md bg-danger-bg px-3 py-2 text-danger">{error.message}</p> : null}
      {isLoading && !data ? <p className="text-ink-muted">Loading photos…</p> : null}
      {data && !photos.length ? <p className="rounded-md border border-dashed border-line px-4 py-8 text-center text-ink-muted">{tag || surfaceId ? "No photos match this filter." : "No photos on this job yet."}</p> : null}
      <div className="grid grid-cols-1 gap-4 sm:grid-cols-2 lg:grid-cols-3" data-testid="photo-grid">
        {photos.map((p) => (
          <PhotoCard key={p.id} photo={p} viewer={viewer} onDeleted={refresh} />
        ))}
      </div>
    </section>
  );
}
