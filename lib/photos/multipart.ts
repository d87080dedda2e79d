// A streaming multipart/form-data reader for one photo upload. The file part goes straight to a
// temporary file as it arrives (one chunk in memory at a time); the small text fields are kept.
// `request.formData()` would hold the whole body, then a File copy of it, in memory.
import { randomUUID } from "node:crypto";
import { mkdir, open, rm, type FileHandle } from "node:fs/promises";
import os from "node:os";
import path from "node:path";
import { ApiError } from "@/lib/api/errors";
import { formatBytes, MAX_PHOTO_BYTES } from "./limits";
import { SNIFF_BYTES, sniffPhoto, type SniffResult } from "./sniff";

export type ReceivedFile = { path: string; bytes: number; head: Buffer; sniff: SniffResult & { ok: true } };
export type ReceivedUpload = { fields: Record<string, string>; file: ReceivedFile | null; cleanup: () => Promise<void> };

export type ReceiveOptions = { fileField?: string; maxFileBytes?: number; tempDir?: string };

const MAX_FIELDS = 20;
const MAX_FIELD_BYTES = 16 * 1024;
const MAX_HEADER_BYTES = 16 * 1024;

const EMPTY = Buffer.alloc(0);

/** How many bytes at the end of `buf` could be the start of a delimiter split across chunks. */
function partialDelimiterAtEnd(buf: Buffer, delimiter: Buffer): number {
  for (let k = Math.min(buf.length, delimiter.length - 1); k > 0; k--) {
    if (buf[buf.length - k] === delimiter[0] && buf.compare(delimiter, 0, k, buf.length - k) === 0) return k;
  }
  return 0;
}

/** Where uploads are received before checking: UPLOAD_TMP_DIR, else <os temp>/warmstead-uploads. */
export const uploadTempDir = () => process.env.UPLOAD_TMP_DIR?.trim() || path.join(os.tmpdir(), "warmstead-uploads");

function boundaryOf(contentType: string | null): string {
  const match = /^multipart\/form-data\s*;.*\bboundary=(?:"([^"]{1,70})"|([^\s;]{1,70}))/i.exec(contentType ?? "");
  if (!match) throw new ApiError(415, "Send the photo as multipart/form-data with the image in the field \"file\".");
  return match[1] ?? match[2];
}

function partHeaders(raw: string) {
  const disposition = /^content-disposition:\s*(.+)$/im.exec(raw)?.[1] ?? "";
  const name = /\bname="([^"]*)"/i.exec(disposition)?.[1] ?? /\bname=([^;\s]+)/i.exec(disposition)?.[1];
  const isFile = /\bfilename\*?=/i.test(disposition);
  return { name, isFile };
}

/** Reads the request body once, front to back. Throws ApiError 413/415/422 with the reason; leaves no temp file behind on failure. */
export async function receivePhotoUpload(req: Request, options: ReceiveOptions = {}): Promise<ReceivedUpload> {
  const fileField = options.fileField ?? "file";
  const maxFileBytes = options.maxFileBytes ?? MAX_PHOTO_BYTES;
  const boundary = boundaryOf(req.headers.get("content-type"));
  const declared = Number(req.headers.get("content-length") ?? NaN);
  const tooBigMessage = `The photo is larger than ${formatBytes(maxFileBytes)}, the most an upload can be.`;
  const tooBig = () => new ApiError(413, tooBigMessage, { [fileField]: [tooBigMessage] });
  if (Number.isFinite(declared) && declared > maxFileBytes + 64 * 1024) throw tooBig();
  if (!req.body) throw new ApiError(422, "The upload has no body.", { file: ["Choose a photo to upload."] });

  const tempDir = options.tempDir ?? uploadTempDir();
  const delimiter = Buffer.from(`\r\n--${boundary}`);
  const fields: Record<string, string> = {};
  let fieldCount = 0;
  let handle: FileHandle | null = null;
  let tempPath: string | null = null;
  let file: { bytes: number; head: Buffer; refused: SniffResult | null } | null = null;
  let current: { kind: "field"; name: string; chunks: Buffer[]; size: number } | { kind: "file" } | { kind: "skip" } | null = null;

  const cleanup = async () => {
    await handle?.close().catch(() => undefined);
    handle = null;
    if (tempPath) await rm(tempPath, { force: true });
  };

  async function onData(data: Buffer) {
    if (!current || data.length === 0) return;
    if (current.kind === "field") {
      current.size += data.length;
      if (current.size > MAX_FIELD_BYTES) throw new ApiError(422, `The field "${current.name}" is too long.`, { [current.name]: ["This is too long."] });
      current.chunks.push(Buffer.from(data));
    } else if (current.kind === "file" && file) {
      file.bytes += data.length;
      if (file.bytes > maxFileBytes) throw tooBig();
      if (file.head.length < SNIFF_BYTES) {
        file.head = Buffer.concat([file.head, data.subarray(0, SNIFF_BYTES - file.head.length)]);
        if (file.head.length >= SNIFF_BYTES && !file.refused) {
          const s = sniffPhoto(file.head, file.bytes);
          if (!s.ok) file.refused = s; // keep reading (and discarding) so the browser gets our answer
        }
      }
      if (!file.refused) await handle!.write(data);
    }
  }

  async function startPart(rawHeaders: string) {
    const { name, isFile } = partHeaders(rawHeaders);
    if (!name) throw new ApiError(422, "A part of the upload has no field name.");
    if (isFile) {
      if (name !== fileField) throw new ApiError(422, `Put the photo in the field "${fileField}", not "${name}".`, { [fileField]: ["Choose a photo to upload."] });
      if (file) throw new ApiError(422, "Upload one photo at a time.", { [fileField]: ["Send one photo per upload."] });
      await mkdir(tempDir, { recursive: true });
      tempPath = path.join(tempDir, `upload-${randomUUID()}`);
      handle = await open(tempPath, "wx", 0o600);
      file = { bytes: 0, head: Buffer.alloc(0), refused: null };
      current = { kind: "file" };
      return;
    }
    if (++fieldCount > MAX_FIELDS) throw new ApiError(422, "The upload has too many fields.");
    current = { kind: "field", name, chunks: [], size: 0 };
  }

  function endPart() {
    if (current?.kind === "field") fields[current.name] = Buffer.concat(current.chunks).toString("utf8");
    current = null;
  }

  const reader = req.body.getReader();
  let ended = false;
  try {
    // A virtual CRLF in front lets the first boundary match the same delimiter as the rest.
    let buf: Buffer = Buffer.from("\r\n");
    let state: "preamble" | "boundary-end" | "headers" | "body" | "done" = "preamble";
    while (state !== "done") {
      if (!ended) {
        let chunk: ReadableStreamReadResult<Uint8Array>;
        try {
          chunk = await reader.read();
        } catch {
          throw new ApiError(400, "The upload was interrupted before it finished. Try again.");
        }
        if (chunk.done) ended = true;
        else buf = buf.length ? Buffer.concat([buf, chunk.value]) : Buffer.from(chunk.value.buffer, chunk.value.byteOffset, chunk.value.byteLength);
      }
      let progressed = true;
      while (progressed && state !== "done") {
        progressed = false;
        if (state === "preamble" || state === "body") {
          const at = buf.indexOf(delimiter);
          if (at === -1) {
            const keep = partialDelimiterAtEnd(buf, delimiter);
            if (state === "body") await onData(buf.subarray(0, buf.length - keep));
            // Usually nothing is kept, so the next chunk is used as it comes, without a copy.
            buf = keep ? Buffer.from(buf.subarray(buf.length - keep)) : EMPTY;
          } else {
            if (state === "body") await onData(buf.subarray(0, at));
            endPart();
            buf = buf.subarray(at + delimiter.length);
            state = "boundary-end";
            progressed = true;
          }
        } else if (state === "boundary-end") {
          if (buf.length < 2) break;
          if (buf[0] === 0x2d && buf[1] === 0x2d) state = "done";
          else {
            const eol = buf.indexOf("\r\n");
            if (eol === -1) break;
            buf = buf.subarray(eol + 2); // transport padding, then CRLF
            state = "headers";
          }
          progressed = true;
        } else if (state === "headers") {
          const end = buf.indexOf("\r\n\r\n");
          if (end === -1) {
            if (buf.length > MAX_HEADER_BYTES) throw new ApiError(422, "A part of the upload has headers that are too long.");
            break;
          }
          await startPart(buf.subarray(0, end).toString("utf8"));
          buf = buf.subarray(end + 4);
          state = "body";
          progressed = true;
        }
      }
      if (ended && state !== "done") throw new ApiError(422, "The upload ended before the form data was complete. Try again.", { file: ["The upload was cut short."] });
    }
    // Read the (normally empty) epilogue so the stream closes on its own; give up on a long one.
    for (let extra = 0; !ended && extra <= 64 * 1024; ) {
      const r = await reader.read();
      if (r.done) ended = true;
      else extra += r.value.byteLength;
    }
    if (!ended) await reader.cancel().catch(() => undefined);
    if (handle) await (handle as FileHandle).close();
    handle = null;

    if (!file) return { fields, file: null, cleanup };
    const got = file as { bytes: number; head: Buffer; refused: SniffResult | null };
    const sniff = got.refused ?? sniffPhoto(got.head, got.bytes);
    if (!sniff.ok) throw new ApiError(sniff.status, sniff.message, { [fileField]: [sniff.message] });
    return { fields, file: { path: tempPath!, bytes: got.bytes, head: got.head, sniff }, cleanup };
  } catch (err) {
    if (!ended) await reader.cancel().catch(() => undefined);
    await cleanup();
    throw err;
  }
}
