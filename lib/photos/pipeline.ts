// Received file → checked, stripped, thumbnailed → both objects in storage. On any failure
// nothing is left in storage.
import type { StorageDriver } from "@/lib/storage";
import type { ReceivedFile } from "./multipart";
import { processPhoto } from "./process";
import { planSlices } from "./strip";

export type StoredPhotoFiles = {
  storageKey: string;
  thumbnailKey: string;
  contentType: string;
  bytes: number;
  width: number;
  height: number;
  reencoded: boolean;
};

export async function processAndStore(file: ReceivedFile, storage: StorageDriver, keys: { original: string; thumbnail: string }): Promise<StoredPhotoFiles> {
  const processed = await processPhoto(file.path, file.sniff.contentType);
  try {
    await Promise.all([
      storage.put(keys.original, planSlices(processed.source, processed.plan), { contentType: processed.contentType, contentLength: processed.plan.length }),
      storage.put(keys.thumbnail, processed.thumbnail, { contentType: "image/webp" }),
    ]);
  } catch (err) {
    await removeQuietly(storage, [keys.original, keys.thumbnail]);
    throw err;
  } finally {
    await processed.cleanup();
  }
  return {
    storageKey: keys.original,
    thumbnailKey: keys.thumbnail,
    contentType: processed.contentType,
    bytes: processed.plan.length,
    width: processed.width,
    height: processed.height,
    reencoded: processed.reencoded,
  };
}

export async function removeQuietly(storage: StorageDriver, keys: (string | null | undefined)[]) {
  await Promise.all(keys.filter((k): k is string => Boolean(k)).map((k) => storage.delete(k).catch((err) => console.error("photo storage cleanup failed", k, err))));
}
