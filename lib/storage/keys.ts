import { randomUUID } from "node:crypto";

// Storage keys are made here, from ids the server chose: `<companyId>/<jobId>/<uuid>.<ext>`.
// The uploaded file's name never reaches a key or a path.
const SEGMENT = /^[A-Za-z0-9][A-Za-z0-9_-]*(\.[A-Za-z0-9]+)?$/;

/** Throws on anything that is not a key this module would make (no `..`, no absolute paths, no odd characters). */
export function assertSafeKey(key: string): string {
  const parts = key.split("/");
  if (key.length > 300 || parts.length < 1 || !parts.every((p) => SEGMENT.test(p))) {
    throw new Error(`Refusing unsafe storage key: ${JSON.stringify(key.slice(0, 80))}`);
  }
  return key;
}

const ID = /^[A-Za-z0-9-]{1,64}$/;

export function newPhotoKeys(companyId: string, jobId: string, extension: string) {
  if (!ID.test(companyId) || !ID.test(jobId) || !/^[a-z0-9]{2,5}$/.test(extension)) throw new Error("Bad id or extension for a storage key.");
  const base = `photos/${companyId}/${jobId}/${randomUUID()}`;
  return { original: assertSafeKey(`${base}.${extension}`), thumbnail: assertSafeKey(`${base}-thumb.webp`) };
}
