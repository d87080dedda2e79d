// Shared by the photo tests: generated images (no binary fixtures) and a multipart upload call.
import { NextRequest } from "next/server";
import sharp from "sharp";

const ORIGIN = "http://localhost:3000";

/** A small noisy JPEG/PNG/WebP, optionally with EXIF (GPS, camera, orientation) written by sharp. */
export async function makeImage(format: "jpeg" | "png" | "webp", opts: { width?: number; height?: number; gps?: boolean; orientation?: number } = {}) {
  const { width = 96, height = 64 } = opts;
  let img = sharp({ create: { width, height, channels: 3, background: "#806040", noise: { type: "gaussian", mean: 120, sigma: 30 } } })[format]();
  if (opts.orientation) img = img.withMetadata({ orientation: opts.orientation }); // sharp writes Orientation itself
  if (opts.gps || opts.orientation) {
    img = img.withExif({
      IFD0: { Make: "TestCam", Model: "Field Phone" },
      ...(opts.gps ? { IFD3: { GPSLatitudeRef: "N", GPSLatitude: "40/1 26/1 1234/100", GPSLongitudeRef: "W", GPSLongitude: "74/1 1/1 5678/100" } } : {}),
    });
  }
  return new Uint8Array(await img.toBuffer());
}

type Handler = (req: NextRequest, ctx: { params: Promise<Record<string, string>> }) => Promise<Response>;

/** POSTs multipart form data to the upload route the way a browser does. */
export async function postPhoto(handler: Handler, jobId: string, fields: Record<string, string>, file?: { bytes: Uint8Array; name: string; type?: string }) {
  const fd = new FormData();
  for (const [k, v] of Object.entries(fields)) fd.set(k, v);
  if (file) fd.set("file", new Blob([file.bytes as Uint8Array<ArrayBuffer>], { type: file.type ?? "image/jpeg" }), file.name);
  const req = new NextRequest(`${ORIGIN}/api/jobs/${jobId}/photos`, { method: "POST", body: fd, headers: { host: "localhost:3000", origin: ORIGIN } });
  const res = await handler(req, { params: Promise.resolve({ id: jobId }) });
  const json = await res.json().catch(() => ({}));
  return { status: res.status, json: json as Record<string, unknown> & { error?: string; fields?: Record<string, string[]>; photo?: Record<string, unknown> } };
}

/** GETs an image route; returns the status, headers and body bytes. */
export async function getImage(handler: Handler, photoId: string, path: string, headers: Record<string, string> = {}) {
  const req = new NextRequest(`${ORIGIN}${path}`, { headers: { host: "localhost:3000", ...headers } });
  const res = await handler(req, { params: Promise.resolve({ photoId }) });
  return { status: res.status, headers: res.headers, body: Buffer.from(await res.arrayBuffer()) };
}
