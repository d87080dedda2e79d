// The storage module: local disk by default, S3-compatible object storage with STORAGE_DRIVER=s3.
//
//   STORAGE_DRIVER        local (default) | s3
//   STORAGE_DIR           local root; default $WARMSTEAD_DATA_DIR/uploads, else ./data/uploads
//   S3_BUCKET             required for s3
//   S3_REGION             default us-east-1
//   S3_ENDPOINT           e.g. http://127.0.0.1:9000 for MinIO or another S3-compatible service
//   S3_ACCESS_KEY_ID, S3_SECRET_ACCESS_KEY   (otherwise the SDK's default credential chain)
//   S3_FORCE_PATH_STYLE   true/false; default true when S3_ENDPOINT is set
//
// Nothing is created at import time: `next build` imports route modules.
import path from "node:path";
import { LocalStorage } from "./local";
import { S3Storage } from "./s3";
import type { StorageDriver } from "./types";

export type { PutBody, PutOptions, StorageDriver, StoredObject } from "./types";
export { fileSlices, isFileSlices, slicesStream, type FileSlice, type FileSlices } from "./slices";
export { LocalStorage } from "./local";
export { S3Storage, type S3Config } from "./s3";
export { assertSafeKey, newPhotoKeys } from "./keys";

const bool = (v: string | undefined, fallback: boolean) => (v === undefined || v === "" ? fallback : /^(1|true|yes)$/i.test(v));

export function storageFromEnv(env: Record<string, string | undefined> = process.env): StorageDriver {
  const driver = (env.STORAGE_DRIVER ?? "local").trim().toLowerCase();
  if (driver === "s3") {
    const bucket = env.S3_BUCKET?.trim();
    if (!bucket) throw new Error("STORAGE_DRIVER=s3 needs S3_BUCKET.");
    const endpoint = env.S3_ENDPOINT?.trim() || undefined;
    return new S3Storage({
      bucket,
      region: env.S3_REGION?.trim() || "us-east-1",
      endpoint,
      accessKeyId: env.S3_ACCESS_KEY_ID?.trim() || undefined,
      secretAccessKey: env.S3_SECRET_ACCESS_KEY?.trim() || undefined,
      forcePathStyle: bool(env.S3_FORCE_PATH_STYLE, Boolean(endpoint)),
    });
  }
  if (driver !== "local") throw new Error(`Unknown STORAGE_DRIVER "${driver}"; use local or s3.`);
  const root = env.STORAGE_DIR?.trim() || path.join(env.WARMSTEAD_DATA_DIR?.trim() || path.join(process.cwd(), "data"), "uploads");
  return new LocalStorage(root);
}

// On globalThis so `next dev` module reloads keep one driver per process.
const holder = globalThis as typeof globalThis & { __warmsteadStorage?: StorageDriver };

/** The process-wide storage driver, made from the environment on first use. */
export function getStorage(): StorageDriver {
  holder.__warmsteadStorage ??= storageFromEnv();
  return holder.__warmsteadStorage;
}

/** Tests: forget the driver so the next `getStorage()` reads the environment again. */
export function resetStorage(driver?: StorageDriver) {
  holder.__warmsteadStorage = driver;
}
