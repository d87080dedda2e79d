// What a file really is, from its first bytes (magic numbers), never from its name or the
// type the browser claims. Pure: the uploader runs it before sending, the server after receiving.
import { formatBytes, MAX_PHOTO_BYTES, type PhotoContentType } from "./limits";

/** How many leading bytes `sniffPhoto` needs. */
export const SNIFF_BYTES = 32;

export type SniffResult =
  | { ok: true; contentType: PhotoContentType }
  | { ok: false; status: 413 | 415 | 422; message: string };

const ascii = (b: Uint8Array, start: number, end: number) => String.fromCharCode(...b.subarray(start, end));
const startsWith = (b: Uint8Array, sig: number[], at = 0) => sig.every((v, i) => b[at + i] === v);

const heifBrands = new Set(["heic", "heix", "heim", "heis", "hevc", "hevx", "mif1", "msf1", "avif", "avis"]);

function refuse(message: string, status: 413 | 415 | 422 = 415): SniffResult {
  return { ok: false, status, message };
}

export function sniffPhoto(head: Uint8Array, totalBytes: number): SniffResult {
  if (totalBytes === 0) return refuse("The file is empty (0 bytes). Choose the photo again.", 422);
  if (totalBytes > MAX_PHOTO_BYTES) return refuse(`The file is ${formatBytes(totalBytes)}; photos can be at most ${formatBytes(MAX_PHOTO_BYTES)}.`, 413);
  if (startsWith(head, [0xff, 0xd8, 0xff])) return { ok: true, contentType: "image/jpeg" };
  if (startsWith(head, [0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a])) return { ok: true, contentType: "image/png" };
  if (ascii(head, 0, 4) === "RIFF" && ascii(head, 8, 12) === "WEBP") return { ok: true, contentType: "image/webp" };

  if (ascii(head, 4, 8) === "ftyp" && heifBrands.has(ascii(head, 8, 12))) {
    return refuse("This is a HEIC/HEIF photo, which the server cannot read. Export it as JPEG (on an iPhone: Settings → Camera → Formats → Most Compatible) and upload that.");
  }
  if (ascii(head, 0, 5) === "%PDF-") return refuse("This is a PDF, not a photo. Upload a JPEG, PNG or WebP image.");
  const text = ascii(head, 0, Math.min(head.length, SNIFF_BYTES)).trimStart().toLowerCase();
  if (text.startsWith("<svg") || text.startsWith("<?xml") || text.startsWith("<!doctype") || text.startsWith("<html")) {
    return refuse("This is an SVG or other text/markup file, not a photo. SVG is refused because it can carry scripts. Upload a JPEG, PNG or WebP image.");
  }
  if (ascii(head, 0, 3) === "GIF") return refuse("GIF is not accepted. Upload a JPEG, PNG or WebP image.");
  return refuse("The file's contents are not a JPEG, PNG or WebP image, whatever its name says. Upload a photo in one of those formats.");
}
