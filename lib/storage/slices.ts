// A stored object made of byte ranges of a file on disk, plus a few bytes made in memory: how the
// photo pipeline hands over a stripped original without building it first. The local driver
// copies the ranges through one reused buffer, so storing allocates nothing per chunk; other
// drivers read it as a stream.
import { createReadStream } from "node:fs";
import { stat, type FileHandle } from "node:fs/promises";
import { Readable } from "node:stream";

export type FileSlice = { start: number; end: number } | { bytes: Uint8Array };
export type FileSlices = { kind: "file-slices"; path: string; parts: FileSlice[]; length: number };

export const isFileSlices = (body: unknown): body is FileSlices => typeof body === "object" && body !== null && (body as FileSlices).kind === "file-slices";

export function fileSlices(path: string, parts: FileSlice[]): FileSlices {
  const length = parts.reduce((n, p) => n + ("bytes" in p ? p.bytes.byteLength : Math.max(0, p.end - p.start)), 0);
  return { kind: "file-slices", path, parts, length };
}

const COPY_BYTES = 256 * 1024;
const SHORT = "The source file is shorter than the slices that were planned from it.";

/** Writes the slices to `out` in order through one buffer; returns the bytes written. */
export async function copySlices(slices: FileSlices, source: FileHandle, out: FileHandle): Promise<number> {
  const buf = Buffer.allocUnsafeSlow(COPY_BYTES);
  let written = 0;
  for (const part of slices.parts) {
    if ("bytes" in part) {
      await out.write(part.bytes);
      written += part.bytes.byteLength;
      continue;
    }
    for (let pos = part.start; pos < part.end; ) {
      const { bytesRead } = await source.read(buf, 0, Math.min(buf.length, part.end - pos), pos);
      if (bytesRead === 0) throw new Error(SHORT);
      await out.write(buf, 0, bytesRead);
      pos += bytesRead;
      written += bytesRead;
    }
  }
  return written;
}

/** Throws unless every range lies inside the file as it is now. */
export async function assertSlicesFit(slices: FileSlices) {
  const { size } = await stat(slices.path);
  if (slices.parts.some((p) => !("bytes" in p) && (p.start < 0 || p.end < p.start || p.end > size))) throw new Error(SHORT);
}

/** The slices as one stream, range by range; it fails (rather than ending early) if the file is shorter than planned. */
export function slicesStream(slices: FileSlices): Readable {
  async function* generate() {
    for (const part of slices.parts) {
      if ("bytes" in part) {
        yield Buffer.from(part.bytes.buffer, part.bytes.byteOffset, part.bytes.byteLength);
        continue;
      }
      let got = 0;
      if (part.end > part.start) {
        for await (const chunk of createReadStream(slices.path, { start: part.start, end: part.end - 1, highWaterMark: COPY_BYTES })) {
          got += (chunk as Buffer).length;
          yield chunk as Buffer;
        }
      }
      if (got !== Math.max(0, part.end - part.start)) throw new Error(SHORT);
    }
  }
  return Readable.from(generate(), { objectMode: false });
}
