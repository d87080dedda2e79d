// Removes location and every other embedded metadata block from a photo without touching its
// pixels: the kept byte ranges are streamed straight from the received file. JPEG keeps only
// what decoding needs (JFIF, ICC colour profile, Adobe colour transform, tables, scans) and, when
// the photo is rotated, a fresh EXIF block holding nothing but the orientation. PNG keeps its
// image and colour chunks; WebP keeps its image, animation and colour chunks. Anything after the
// end of the image (phone "multi-picture" trailers, which carry their own EXIF) is cut off.
import { open, type FileHandle } from "node:fs/promises";
import { fileSlices, type FileSlices } from "@/lib/storage/slices";
import type { PhotoContentType } from "./limits";

export type Part = { start: number; end: number } | { bytes: Buffer };
export type StripPlan = { parts: Part[]; length: number };

export class MalformedImage extends Error {}

async function readAt(fh: FileHandle, position: number, length: number) {
  const buf = Buffer.alloc(length);
  const { bytesRead } = await fh.read(buf, 0, length, position);
  if (bytesRead < length) throw new MalformedImage("The image ends too early.");
  return buf;
}

/** Minimal EXIF APP1: big-endian TIFF, IFD0 with one entry, Orientation (0x0112, SHORT). */
export function orientationApp1(orientation: number): Buffer {
  const b = Buffer.alloc(34);
  b.writeUInt16BE(0xffe1, 0);
  b.writeUInt16BE(32, 2);
  b.write("Exif\0\0", 4, "latin1");
  b.write("MM", 10, "latin1");
  b.writeUInt16BE(42, 12);
  b.writeUInt32BE(8, 14);
  b.writeUInt16BE(1, 18);
  b.writeUInt16BE(0x0112, 20);
  b.writeUInt16BE(3, 22);
  b.writeUInt32BE(1, 24);
  b.writeUInt16BE(orientation, 28);
  return b; // bytes 30–33: next IFD offset 0
}

async function planJpeg(fh: FileHandle, size: number, orientation: number): Promise<Part[]> {
  const parts: Part[] = [{ start: 0, end: 2 }];
  let pos = 2;
  let inserted = orientation <= 1;
  const insertOrientation = () => {
    if (!inserted) parts.push({ bytes: orientationApp1(orientation) });
    inserted = true;
  };
  const chunk = Buffer.alloc(64 * 1024);
  for (;;) {
    if (pos + 2 > size) throw new MalformedImage("The JPEG ends before its end-of-image marker.");
    let m = await readAt(fh, pos, 2);
    while (m[0] === 0xff && m[1] === 0xff) m = await readAt(fh, ++pos, 2); // fill bytes
    if (m[0] !== 0xff) throw new MalformedImage("The JPEG has a broken marker.");
    const marker = m[1];
    if (marker === 0xd9) {
      parts.push({ start: pos, end: pos + 2 });
      return parts;
    }
    if (marker >= 0xd0 && marker <= 0xd7) throw new MalformedImage("The JPEG has a restart marker outside a scan.");
    const len = (await readAt(fh, pos + 2, 2)).readUInt16BE(0);
    if (len < 2 || pos + 2 + len > size) throw new MalformedImage("The JPEG has a segment longer than the file.");
    const segEnd = pos + 2 + len;
    const isApp = marker >= 0xe0 && marker <= 0xef;
    let keep = !isApp && marker !== 0xfe; // COM comments go too
    if (marker === 0xe0) keep = (await readAt(fh, pos + 4, Math.min(5, len - 2))).toString("latin1").startsWith("JFIF"); // JFIF/JFXX
    if (marker === 0xe2) keep = len >= 14 && (await readAt(fh, pos + 4, 12)).toString("latin1") === "ICC_PROFILE\0";
    if (marker === 0xee) keep = (await readAt(fh, pos + 4, Math.min(5, len - 2))).toString("latin1") === "Adobe";
    if (marker !== 0xe0) insertOrientation(); // after JFIF, before everything else
    if (keep) parts.push({ start: pos, end: segEnd });
    pos = segEnd;
    if (marker !== 0xda) continue;
    // Entropy-coded scan data runs until a marker that is neither a stuffed 0xFF00 nor a restart.
    const scanStart = pos;
    let found = -1;
    while (found === -1) {
      if (pos >= size) throw new MalformedImage("The JPEG's image data is cut short.");
      const { bytesRead } = await fh.read(chunk, 0, chunk.length, pos);
      for (let i = 0; i < bytesRead - 1; i++) {
        if (chunk[i] === 0xff) {
          const next = chunk[i + 1];
          if (next !== 0x00 && next !== 0xff && !(next >= 0xd0 && next <= 0xd7)) {
            found = pos + i;
            break;
          }
        }
      }
      if (found === -1) pos += Math.max(1, bytesRead - 1);
    }
    parts.push({ start: scanStart, end: found });
    pos = found;
  }
}

const pngKeep = new Set(["IHDR", "PLTE", "IDAT", "IEND", "tRNS", "cHRM", "gAMA", "iCCP", "sBIT", "sRGB", "cICP", "mDCV", "cLLI", "bKGD", "pHYs", "acTL", "fcTL", "fdAT"]);

async function planPng(fh: FileHandle, size: number): Promise<Part[]> {
  const parts: Part[] = [{ start: 0, end: 8 }];
  let pos = 8;
  for (;;) {
    if (pos + 12 > size) throw new MalformedImage("The PNG ends before its IEND chunk.");
    const h = await readAt(fh, pos, 8);
    const len = h.readUInt32BE(0);
    const type = h.toString("latin1", 4, 8);
    const end = pos + 12 + len;
    if (end > size) throw new MalformedImage("The PNG has a chunk longer than the file.");
    if (pngKeep.has(type)) parts.push({ start: pos, end });
    pos = end;
    if (type === "IEND") return parts;
  }
}

const webpKeep = new Set(["VP8 ", "VP8L", "VP8X", "ALPH", "ANIM", "ANMF", "ICCP"]);

async function planWebp(fh: FileHandle, size: number): Promise<Part[]> {
  const riffEnd = Math.min(size, 8 + (await readAt(fh, 4, 4)).readUInt32LE(0));
  const chunks: Part[] = [];
  let pos = 12;
  let body = 4; // "WEBP"
  while (pos + 8 <= riffEnd) {
    const h = await readAt(fh, pos, 8);
    const type = h.toString("latin1", 0, 4);
    const len = h.readUInt32LE(4);
    const end = pos + 8 + len + (len & 1);
    if (pos + 8 + len > riffEnd) throw new MalformedImage("The WebP has a chunk longer than the file.");
    if (type === "VP8X") {
      const x = await readAt(fh, pos, end - pos);
      x[8] &= ~0x0c; // clear the EXIF (0x08) and XMP (0x04) flags
      chunks.push({ bytes: x });
      body += x.length;
    } else if (webpKeep.has(type)) {
      chunks.push({ start: pos, end: Math.min(end, riffEnd) });
      body += Math.min(end, riffEnd) - pos;
    }
    pos = end;
  }
  const header = Buffer.alloc(12);
  header.write("RIFF", 0, "latin1");
  header.writeUInt32LE(body, 4);
  header.write("WEBP", 8, "latin1");
  return [{ bytes: header }, ...chunks];
}

/** Which byte ranges of the received file make the stored photo, and its length. */
export async function planStrip(file: string, contentType: PhotoContentType, orientation = 1): Promise<StripPlan> {
  const fh = await open(file, "r");
  try {
    const { size } = await fh.stat();
    const parts = contentType === "image/jpeg" ? await planJpeg(fh, size, orientation) : contentType === "image/png" ? await planPng(fh, size) : await planWebp(fh, size);
    const length = parts.reduce((n, p) => n + ("bytes" in p ? p.bytes.length : p.end - p.start), 0);
    return { parts, length };
  } finally {
    await fh.close();
  }
}

/** The stripped photo, as byte ranges of the received file for the storage driver to copy. */
export const planSlices = (file: string, plan: StripPlan): FileSlices => fileSlices(file, plan.parts);
