import { arrangePhotos } from "@/lib/documents/photo-groups";
import type { SnapshotPhoto } from "@/lib/documents/snapshot";

const tagNames: Record<SnapshotPhoto["tag"], string> = { before: "Before", during: "During the work", after: "After", thermal: "Thermal image" };

function Figure({ photo, label }: { photo: SnapshotPhoto; label?: string }) {
  const caption = [photo.surfaceLabel, photo.caption].filter(Boolean).join(": ") || tagNames[photo.tag];
  return (
    <figure className="overflow-hidden rounded-lg border border-line bg-white">
      <a href={`/api/photos/${photo.id}`} target="_blank" rel="noopener" className="block bg-paper-deep">
        {/* eslint-disable-next-line @next/next/no-img-element -- private, already-sized thumbnails from our own API */}
        <img src={`/api/photos/${photo.id}/thumbnail`} alt={caption} loading="lazy" width={photo.width && photo.width < 480 ? photo.width : 480} height={photo.width && photo.height ? Math.round((Math.min(480, photo.width) * photo.height) / photo.width) : 360} className="h-auto w-full object-contain" />
      </a>
      <figcaption className="p-2 text-sm">
        <span className="block text-xs font-bold uppercase tracking-wide text-ember-700">{label ?? tagNames[photo.tag]}</span>
        {caption}
      </figcaption>
    </figure>
  );
}

/** The photos frozen into an issued document: before/after pairs side by side, then the rest by tag. */
export function ReportPhotos({ photos }: { photos: SnapshotPhoto[] }) {
  const { pairs, groups } = arrangePhotos(photos);
  return (
    <section aria-labelledby="report-photos-h" className="space-y-3" data-testid="report-photos">
      <h2 id="report-photos-h" className="text-2xl font-bold text-spruce-900">Photos from your house</h2>
      {pairs.length ? <h3 className="font-semibold">Before and after</h3> : null}
      {pairs.map((p) => (
        <div key={p.key} className="grid max-w-3xl grid-cols-2 gap-3">
          <Figure photo={p.before} label={`Before · ${p.label}`} />
          <Figure photo={p.after} label={`After · ${p.label}`} />
        </div>
      ))}
      {groups.map((g) => (
        <div key={g.tag} className="space-y-2">
          <h3 className="font-semibold">{tagNames[g.tag]}</h3>
          <div className="grid max-w-3xl grid-cols-1 gap-3 sm:grid-cols-2">
            {g.photos.map((p) => <Figure key={p.id} photo={p} />)}
          </div>
        </div>
      ))}
    </section>
  );
}
