import { DeleteObjectCommand, GetObjectCommand, HeadObjectCommand, PutObjectCommand, S3Client } from "@aws-sdk/client-s3";
import { Readable } from "node:stream";
import { assertSafeKey } from "./keys";
import { assertSlicesFit, isFileSlices, slicesStream } from "./slices";
import type { PutBody, PutOptions, StorageDriver, StoredObject } from "./types";

export type S3Config = {
  bucket: string;
  region: string;
  endpoint?: string;
  accessKeyId?: string;
  secretAccessKey?: string;
  forcePathStyle: boolean;
};

const isNotFound = (e: unknown) => {
  const err = e as { name?: string; $metadata?: { httpStatusCode?: number } };
  return err?.name === "NoSuchKey" || err?.name === "NotFound" || err?.$metadata?.httpStatusCode === 404;
};

/** S3-compatible object storage. The client is made on first use, never at import (next build imports this). */
export class S3Storage implements StorageDriver {
  readonly name = "s3" as const;
  private client?: S3Client;

  constructor(private readonly config: S3Config) {}

  private s3() {
    const { region, endpoint, accessKeyId, secretAccessKey, forcePathStyle } = this.config;
    this.client ??= new S3Client({
      region,
      endpoint,
      forcePathStyle,
      credentials: accessKeyId && secretAccessKey ? { accessKeyId, secretAccessKey } : undefined,
      // Checksums only where S3 demands them: many S3-compatible services (and local fakes) do not
      // understand the SDK's default aws-chunked uploads with trailing checksums.
      requestChecksumCalculation: "WHEN_REQUIRED",
      responseChecksumValidation: "WHEN_REQUIRED",
    });
    return this.client;
  }

  async put(key: string, input: PutBody, options: PutOptions): Promise<void> {
    if (isFileSlices(input)) await assertSlicesFit(input);
    const body = isFileSlices(input) ? slicesStream(input) : input;
    const length = isFileSlices(input) ? input.length : body instanceof Readable ? options.contentLength : body.byteLength;
    if (length === undefined) throw new Error("S3 storage needs the content length of a streamed upload.");
    // A body stream that fails part-way would leave the request waiting for bytes that never come.
    const abort = new AbortController();
    let failed: unknown;
    if (body instanceof Readable) body.once("error", (err) => ((failed = err), abort.abort(err)));
    try {
      await this.s3().send(
        new PutObjectCommand({ Bucket: this.config.bucket, Key: assertSafeKey(key), Body: body, ContentType: options.contentType, ContentLength: length }),
        { abortSignal: abort.signal },
      );
    } catch (err) {
      throw failed ?? err;
    }
  }

  async get(key: string): Promise<StoredObject | null> {
    try {
      const res = await this.s3().send(new GetObjectCommand({ Bucket: this.config.bucket, Key: assertSafeKey(key) }));
      if (!res.Body) return null;
      return { body: res.Body as Readable, size: res.ContentLength ?? 0, contentType: res.ContentType };
    } catch (err) {
      if (isNotFound(err)) return null;
      throw err;
    }
  }

  async delete(key: string): Promise<void> {
    await this.s3().send(new DeleteObjectCommand({ Bucket: this.config.bucket, Key: assertSafeKey(key) }));
  }

  async exists(key: string): Promise<boolean> {
    try {
      await this.s3().send(new HeadObjectCommand({ Bucket: this.config.bucket, Key: assertSafeKey(key) }));
      return true;
    } catch (err) {
      if (isNotFound(err)) return false;
      throw err;
    }
  }

  /** For tests and shutdown. */
  close() {
    this.client?.destroy();
    this.client = undefined;
  }
}
