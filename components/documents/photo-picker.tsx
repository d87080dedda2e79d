"use client";

import type { PhotoView } from "@/lib/data/photos";
import { arrangePhotos, arrangedIds } from "@/lib/documents/photo-groups";
import { usePhotos } from "@/lib/hooks/use-photos";
import { photoTagLabels } from "@/lib/photos/tags";

/** The ids chosen, in the order the document will show them (pairs first, then by tag). */
export function orderedChoice(photos: PhotoView[], chosen: ReadonlySet<string>): string[] {
  return arrangedIds(arrangePhotos(photos)).filter((id) => chosen.has(id));
}

function Choice({ photo, checked, onToggle, label }: { photo: PhotoView; checked: boolean; onToggle: (id: string) => void; label?: string }) {
  const text = photo.caption || `${photoTagLabels[photo.tag]} photo`;
  return (
    <label className={`block cursor-pointer overflow-hidden rounded-lg border-2 bg-white focus-within:ring-2 focus-within:ring-spruce-500 ${checked ? "border-spruce-700" : "border-line"}`} data-testid="photo-choice">
      {/* eslint-disable-next-line @next/next/no-img-element -- private, already-sized thumbnails from our own API */}
      <img src={photo.thumbnailUrl} alt="" loading="lazy" width={480} height={360} className="aspect-[4/3] h-auto w-full bg-paper-deep object-cover" />
      <span className="flex items-start gap-2 p-2 text-sm">
        <input type="checkbox" className="mt-0.5 h-5 w-5 shrink-0" checked={checked} onChange={() => onToggle(photo.id)} />
        <span>
          <span className="font-semibold">{label ?? photoTagLabels[photo.tag]}</span>
          {photo.surfaceLabel && !label ? <span className="text-ink-muted"> · {photo.surfaceLabel}</span> : null}
          <span className="block text-charcoal">{text}</span>
        </span>
      </span>
    </label>
  );
}

/**
 * Before issuing: the auditor ticks the job's photos to include. Before/after pairs of a surface sit
 * side by side; the rest are grouped by tag. The server checks every id belongs to the job.
 */
export function PhotoPicker({ jobId, chosen, onChange, disabled }: { jobId: string; chosen: ReadonlySet<string>; onChange: (next: Set<string>) => void; disabled?: boolean }) {
  const { data, error, isLoading } = usePhotos(jobId);
  const photos = data?.photos ?? [];
  const { pairs, groups } = arrangePhotos(photos);
  const toggle = (id: string) => {
    const next = new Set(chosen);
    if (next.has(id)) next.delete(id);
    else next.add(id);
    onChange(next);
  };
  const count = photos.filter((p) => chosen.has(p.id)).length;
  return (
    <fieldset className="space-y-3 rounded-lg border border-line p-3" disabled={disabled} data-testid="photo-picker">
      <legend className="px-1 font-semibold text-spruce-800">Photos to include</legend>
      {error ? <p className="rounded-md bg-danger-bg px-3 py-2 text-danger">Could not load the job&rsquo;s photos: {error.message}</p> : null}
      {isLoading && !data ? <p className="text-ink-muted">Loading photos…</p> : null}
      {data && photos.length === 0 ? <p className="text-ink-muted">No photos on this job yet. Add them on the Photos tab; the documents you issue can then show them.</p> : null}
      {photos.length > 0 ? (
        <div className="flex flex-wrap items-center gap-3 text-sm">
          <p aria-live="polite" data-testid="photo-choice-count"><strong>{count}</strong> of {photos.length} chosen. The savings report shows them on a photos page, with their captions.</p>
          <button type="button" className="min-h-11 font-semibold text-spruce-700 underline" onClick={() => onChange(new Set(photos.map((p) => p.id)))}>Choose all</button>
          <button type="button" className="min-h-11 font-semibold text-spruce-700 underline" onClick={() => onChange(new Set())}>Clear</button>
        </div>
      ) : null}
      {pairs.length ? (
        <div className="space-y-2">
          <h3 className="font-semibold">Before and after</h3>
          {pairs.map((p) => (
            <div key={p.key} className="rounded-lg bg-paper-deep p-2">
              <p className="mb-1 text-sm font-semibold text-spruce-800">{p.label}</p>
              <div className="grid max-w-xl grid-cols-2 gap-2">
                <Choice photo={p.before} checked={chosen.has(p.before.id)} onToggle={toggle} label="Before" />
                <Choice photo={p.after} checked={chosen.has(p.after.id)} onToggle={toggle} label="After" />
              </div>
            </div>
          ))}
        </div>
      ) : null}
      {groups.map((g) => (
        <div key={g.tag} className="space-y-1">
          <h3 className="font-semibold">{g.label}</h3>
          <div className="grid grid-cols-2 gap-2 sm:grid-cols-3 lg:grid-cols-4">
            {g.photos.map((p) => <Choice key={p.id} photo={p} checked={chosen.has(p.id)} onToggle={toggle} />)}
          </div>
        </div>
      ))}
    </fieldset>
  );
}
