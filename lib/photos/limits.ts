// The stated limits of a photo upload. Pure constants: the uploader reads them too.

/** Largest original accepted: 20 MB (a 12-megapixel phone JPEG is 3–6 MB). */
export const MAX_PHOTO_BYTES = 20 * 1024 * 1024;
/** Largest picture accepted, in pixels (width × height): 120 megapixels. */
export const MAX_PHOTO_PIXELS = 120_000_000;
/** Thumbnails fit inside this square (CSS pixels × 2 for phone screens). */
export const THUMBNAIL_SIZE = 480;
/** Caption length limit. */
export const MAX_CAPTION_LENGTH = 500;

export const acceptedPhotoTypes = ["image/jpeg", "image/png", "image/webp"] as const;
export type PhotoContentType = (typeof acceptedPhotoTypes)[number];

export const photoTypeExtension: Record<PhotoContentType, string> = {
  "image/jpeg": "jpg",
  "image/png": "png",
  "image/webp": "webp",
};

export const formatBytes = (n: number) => (n >= 1024 * 1024 ? `${(n / 1024 / 1024).toFixed(1)} MB` : `${Math.max(1, Math.round(n / 1024))} KB`);
