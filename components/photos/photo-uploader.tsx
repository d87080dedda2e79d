"use client";

import { useId, useRef, useState } from "react";
import { formatBytes, MAX_CAPTION_LENGTH, MAX_PHOTO_BYTES } from "@/lib/photos/limits";
import { photoTagLabels, photoTagList, type PhotoTagName } from "@/lib/photos/tags";
import { checkBeforeUpload, uploadPhoto } from "./upload";

export type SurfaceOption = { id: string; label: string };

type Item = { key: string; name: string; progress: number; state: "checking" | "sending" | "done" | "failed"; message?: string };

/** Camera or file picker, tag, caption and surface; each file shows its own progress. */
export function PhotoUploader({ jobId, surfaces, onUploaded }: { jobId: string; surfaces: SurfaceOption[]; onUploaded: () => void }) {
  const id = useId();
  const [tag, setTag] = useState<PhotoTagName>("before");
  const [caption, setCaption] = useState("");
  const [surfaceId, setSurfaceId] = useState("");
  const [items, setItems] = useState<Item[]>([]);
  const camera = useRef<HTMLInputElement>(null);
  const picker = useRef<HTMLInputElement>(null);
  const busy = items.some((i) => i.state === "sending" || i.state === "checking");

  const update = (key: string, patch: Partial<Item>) => setItems((all) => all.map((i) => (i.key === key ? { ...i, ...patch } : i)));

  async function send(files: FileList | null) {
    if (!files?.length) return;
    const batch = Array.from(files).map((file, n) => ({ file, key: `${Date.now()}-${n}-${file.name}` }));
    setItems((all) => [...batch.map(({ file, key }) => ({ key, name: file.name || "photo", progress: 0, state: "checking" as const })), ...all].slice(0, 12));
    const fields = { tag, caption: caption.trim() || undefined, surfaceId: surfaceId || undefined };
    for (const { file, key } of batch) {
      const problem = await checkBeforeUpload(file);
      if (problem) {
        update(key, { state: "failed", message: problem });
        continue;
      }
      update(key, { state: "sending" });
      const result = await uploadPhoto(jobId, file, fields, (progress) => update(key, { progress }));
      if (result.ok) {
        update(key, { state: "done", progress: 1 });
        onUploaded();
      } else update(key, { state: "failed", message: result.message });
    }
    setCaption("");
  }

  return (
    <section className="card" aria-labelledby={`${id}-heading`}>
      <h2 id={`${id}-heading`} className="text-xl font-semibold text-spruce-800">Add photos</h2>
      <fieldset className="mt-3">
        <legend className="field-label">Tag</legend>
        <div className="grid grid-cols-2 gap-2 sm:grid-cols-4" role="radiogroup">
          {photoTagList.map((t) => (
            <label key={t} className={`flex min-h-12 cursor-pointer items-center justify-center rounded-md border-2 px-3 text-base font-semibold ${tag === t ? "border-spruce-700 bg-spruce-50 text-spruce-900" : "border-line bg-white text-charcoal"}`}>
              <input type="radio" name={`${id}-tag`} value={t} checked={tag === t} onChange={() => setTag(t)} className="sr-only" />
              {photoTagLabels[t]}
            </label>
          ))}
        </div>
      </fieldset>
      <div className="mt-4 grid gap-4 sm:grid-cols-2">
        <div>
          <label htmlFor={`${id}-caption`} className="field-label">Caption (optional)</label>
          <input id={`${id}-caption`} className="field-input" value={caption} maxLength={MAX_CAPTION_LENGTH} onChange={(e) => setCaption(e.target.value)} placeholder="e.g. North wall, fibre stops half-way down the bay" />
        </div>
        <div>
          <label htmlFor={`${id}-surface`} className="field-label">Surface (optional)</label>
          <select id={`${id}-surface`} className="field-input" value={surfaceId} onChange={(e) => setSurfaceId(e.target.value)}>
            <option value="">Whole job</option>
            {surfaces.map((s) => (
              <option key={s.id} value={s.id}>{s.label}</option>
            ))}
          </select>
        </div>
      </div>
      <div className="mt-4 flex flex-wrap gap-3">
        <button type="button" className="btn-accent min-h-14 flex-1 text-lg sm:flex-none" disabled={busy} onClick={() => camera.current?.click()}>Take photo</button>
        <button type="button" className="btn-ghost min-h-14 flex-1 text-lg sm:flex-none" disabled={busy} onClick={() => picker.current?.click()}>Choose files</button>
        <input ref={camera} type="file" accept="image/*" capture="environment" className="sr-only" tabIndex={-1} aria-hidden="true" onChange={(e) => { void send(e.target.files); e.target.value = ""; }} />
        <input ref={picker} type="file" accept="image/jpeg,image/png,image/webp,image/*" multiple className="sr-only" tabIndex={-1} aria-label="Photo files" data-testid="photo-file-input" onChange={(e) => { void send(e.target.files); e.target.value = ""; }} />
      </div>
      <p className="mt-2 text-sm text-ink-muted">JPEG, PNG or WebP, up to {formatBytes(MAX_PHOTO_BYTES)} each. HEIC cannot be read yet: set the phone camera to “Most Compatible” (JPEG). Location data is removed from every photo.</p>
      {items.length ? (
        <ul className="mt-4 space-y-2" aria-live="polite" data-testid="upload-list">
          {items.map((i) => (
            <li key={i.key} className="rounded-md border border-line px-3 py-2">
              <div className="flex items-center justify-between gap-3 text-sm">
                <span className="truncate font-semibold">{i.name}</span>
                <span className={i.state === "failed" ? "text-danger" : "text-ink-muted"}>
                  {i.state === "checking" ? "Checking…" : i.state === "sending" ? `${Math.round(i.progress * 100)} %` : i.state === "done" ? "Uploaded" : "Not uploaded"}
                </span>
              </div>
              {i.state === "sending" || i.state === "done" ? (
                <div className="mt-1 h-2 overflow-hidden rounded-full bg-paper-deep" role="progressbar" aria-label={`Uploading ${i.name}`} aria-valuemin={0} aria-valuemax={100} aria-valuenow={Math.round(i.progress * 100)}>
                  <div className="h-full bg-spruce-600 transition-[width]" style={{ width: `${Math.round(i.progress * 100)}%` }} />
                </div>
              ) : null}
              {i.message ? <p className="mt-1 text-sm font-medium text-danger" data-testid="upload-error">{i.message}</p> : null}
            </li>
          ))}
        </ul>
      ) : null}
    </section>
  );
}
