// Sends one photo with XMLHttpRequest, which (unlike fetch) reports upload progress.
import type { PhotoView } from "@/lib/data/photos";
import { formatBytes, MAX_PHOTO_BYTES } from "@/lib/photos/limits";
import { SNIFF_BYTES, sniffPhoto } from "@/lib/photos/sniff";

export type UploadFields = { tag: string; caption?: string; surfaceId?: string };
export type UploadResult = { ok: true; photo: PhotoView } | { ok: false; message: string };

/** The server's checks, run before sending, so a wrong file is refused at once. */
export async function checkBeforeUpload(file: File): Promise<string | null> {
  if (file.size > MAX_PHOTO_BYTES) return `${file.name} is ${formatBytes(file.size)}; photos can be at most ${formatBytes(MAX_PHOTO_BYTES)}.`;
  const head = new Uint8Array(await file.slice(0, SNIFF_BYTES).arrayBuffer());
  const result = sniffPhoto(head, file.size);
  return result.ok ? null : `${file.name}: ${result.message}`;
}

export function uploadPhoto(jobId: string, file: File, fields: UploadFields, onProgress: (fraction: number) => void): Promise<UploadResult> {
  return new Promise((resolve) => {
    const form = new FormData();
    form.set("tag", fields.tag);
    if (fields.caption) form.set("caption", fields.caption);
    if (fields.surfaceId) form.set("surfaceId", fields.surfaceId);
    if (file.lastModified) form.set("takenAt", String(Math.min(file.lastModified, Date.now())));
    form.set("file", file, "photo");
    const xhr = new XMLHttpRequest();
    xhr.open("POST", `/api/jobs/${jobId}/photos`);
    xhr.setRequestHeader("accept", "application/json");
    xhr.upload.onprogress = (e) => e.lengthComputable && onProgress(e.loaded / e.total);
    xhr.onload = () => {
      let body: { photo?: PhotoView; error?: string; fields?: Record<string, string[]> } = {};
      try {
        body = JSON.parse(xhr.responseText);
      } catch {
        // not JSON
      }
      if (xhr.status === 201 && body.photo) return resolve({ ok: true, photo: body.photo });
      const detail = body.fields ? Object.values(body.fields).flat().find((m) => m !== body.error) : undefined;
      resolve({ ok: false, message: [body.error ?? `Upload failed (${xhr.status}).`, detail].filter(Boolean).join(" ") });
    };
    xhr.onerror = () => resolve({ ok: false, message: "Could not reach the server. Check the connection and add the photo again." });
    xhr.send(form);
  });
}
