import type { Readable } from "node:stream";
import type { FileSlices } from "./slices";

/** What can be stored: bytes, a stream (with its length for S3), or byte ranges of a file on disk. */
export type PutBody = Readable | Uint8Array | FileSlices;

export type PutOptions = {
  contentType: string;
  /** Required when `body` is a stream and the driver needs it up front (S3). */
  contentLength?: number;
};

export type StoredObject = {
  body: Readable;
  size: number;
  contentType?: string;
};

/** One interface, two drivers (local disk, S3-compatible). Keys come from `keys.ts`, never from a user. */
export interface StorageDriver {
  readonly name: "local" | "s3";
  put(key: string, body: PutBody, options: PutOptions): Promise<void>;
  /** The object as a stream, or null when there is no such key. */
  get(key: string): Promise<StoredObject | null>;
  /** Removes the object; removing a missing key is not an error. */
  delete(key: string): Promise<void>;
  exists(key: string): Promise<boolean>;
}
