// Checks a received photo with sharp, makes its thumbnail, and plans the stripped original.
// sharp is loaded on first use, not at import (next build imports route modules).
import { randomUUID } from "node:crypto";
import { rm } from "node:fs/promises";
import path from "node:path";
import { ApiError } from "@/lib/api/errors";
import { MAX_PHOTO_PIXELS, THUMBNAIL_SIZE, type PhotoContentType } from "./limits";
import { MalformedImage, planStrip, type StripPlan } from "./strip";

type Sharp = typeof import("sharp");
let sharpModule: Promise<Sharp> | undefined;
// No operation cache: every upload is a new file, so cached decodes (and the file mapping libvips
// holds for them) would only keep memory after the request.
const loadSharp = () =>
  (sharpModule ??= import("sharp").then((m) => {
    const sharp = ((m as unknown as { default?: Sharp }).default ?? m) as Sharp;
    sharp.cache(false);
    return sharp;
  }));

export type ProcessedPhoto = {
  contentType: PhotoContentType;
  /** As displayed (after orientation). */
  width: number;
  height: number;
  /** The file the stored original is read from, and which of its bytes. */
  source: string;
  plan: StripPlan;
  thumbnail: Buffer;
  /** True when the pixels had to be rotated and re-encoded (a rotated PNG or WebP). */
  reencoded: boolean;
  cleanup: () => Promise<void>;
};

const sharpFormat: Record<PhotoContentType, string> = { "image/jpeg": "jpeg", "image/png": "png", "image/webp": "webp" };
const label: Record<PhotoContentType, string> = { "image/jpeg": "JPEG", "image/png": "PNG", "image/webp": "WebP" };

function unreadable(contentType: PhotoContentType, why?: string) {
  const message = `The file starts like a ${label[contentType]} but could not be read as one${why ? ` (${why})` : ""}. It may be damaged or cut short; export it again and retry.`;
  return new ApiError(422, message, { file: [message] });
}

export async function processPhoto(file: string, contentType: PhotoContentType): Promise<ProcessedPhoto> {
  const sharp = await loadSharp();
  const input = { limitInputPixels: MAX_PHOTO_PIXELS, failOn: "error" as const };
  let meta: Awaited<ReturnType<ReturnType<Sharp>["metadata"]>>;
  try {
    meta = await sharp(file, input).metadata();
  } catch (err) {
    if (/pixel limit/i.test(String(err))) throw tooManyPixels();
    throw unreadable(contentType);
  }
  if (meta.format !== sharpFormat[contentType] || !meta.width || !meta.height) throw unreadable(contentType);
  const frameHeight = meta.pageHeight ?? meta.height;
  if (meta.width * frameHeight > MAX_PHOTO_PIXELS) throw tooManyPixels(meta.width, frameHeight);
  const orientation = meta.orientation && meta.orientation >= 1 && meta.orientation <= 8 ? meta.orientation : 1;
  const turned = orientation >= 5;

  // Sequential read lets libvips decode top to bottom without keeping decoded tiles around; for a
  // JPEG it also decodes straight at 1/2, 1/4 or 1/8 scale (DCT shrink-on-load), so a 12 MP photo
  // is never expanded to its 36 MB of pixels for a 480-pixel thumbnail.
  // Decoding and encoding run one after the other, so their buffers are not held at once; between
  // them sit only the thumbnail's own pixels (480 × 360 × 3 bytes, about 0.5 MB).
  const thumbnailing = sharp(file, { ...input, sequentialRead: true })
    .rotate()
    .resize(THUMBNAIL_SIZE, THUMBNAIL_SIZE, { fit: "inside", withoutEnlargement: true })
    .raw()
    .toBuffer({ resolveWithObject: true })
    .then(({ data, info }) => sharp(data, { raw: { width: info.width, height: info.height, channels: info.channels } }).webp({ quality: 78 }).toBuffer())
    .catch(() => {
      throw unreadable(contentType, "its image data is damaged");
    });

  // A JPEG keeps its orientation in a fresh, location-free EXIF block; PNG and WebP have no such
  // convention browsers agree on, so a rotated one is turned and re-encoded (rare: phones save JPEG).
  let source = file;
  let reencoded = false;
  const cleanup = async () => {
    if (reencoded) await rm(source, { force: true });
  };
  try {
    if (contentType !== "image/jpeg" && orientation > 1) {
      source = path.join(path.dirname(file), `rotated-${randomUUID()}`);
      reencoded = true;
      const pipeline = sharp(file, input).rotate();
      await (contentType === "image/png" ? pipeline.png() : pipeline.webp({ quality: 90 })).toFile(source);
    }
    const [thumbnail, plan] = await Promise.all([
      thumbnailing,
      planStrip(source, contentType, contentType === "image/jpeg" ? orientation : 1).catch((err) => {
        throw err instanceof MalformedImage ? unreadable(contentType, err.message.replace(/\.$/, "").toLowerCase()) : err;
      }),
    ]);
    return { contentType, width: turned ? frameHeight : meta.width, height: turned ? meta.width : frameHeight, source, plan, thumbnail, reencoded, cleanup };
  } catch (err) {
    await thumbnailing.catch(() => undefined);
    await cleanup();
    throw err;
  }
}

function tooManyPixels(width?: number, height?: number) {
  const size = width && height ? `${width} × ${height} pixels (${Math.round((width * height) / 1e6)} megapixels)` : "larger than the limit";
  const message = `The picture is ${size}; photos can be at most ${MAX_PHOTO_PIXELS / 1e6} megapixels.`;
  return new ApiError(422, message, { file: [message] });
}
