// Photo uploads end to end: accepted formats, refusals (nothing stored), metadata stripping,
// thumbnails, listing filters, deletion and the homeowner's issued-document rule.
import { eq } from "drizzle-orm";
import exifr from "exifr";
import { mkdtempSync, readdirSync, rmSync } from "node:fs";
import os from "node:os";
import path from "node:path";
import sharp from "sharp";
import { afterAll, beforeAll, describe, expect, it, vi } from "vitest";
import { issuedDocuments, jobs, photos, surfaces, users } from "@/db/schema";
import type { AuthUser } from "@/lib/authz/guard";
import { LocalStorage, resetStorage } from "@/lib/storage";
import { actAs } from "../support/auth-mock";
import { call } from "../support/route";
import { getImage, makeImage, postPhoto } from "./photos-support";
import { ids, seededDbForFile } from "./setup";

vi.mock("@/lib/auth", () => import("../support/auth-mock"));

const listRoute = await import("@/app/api/jobs/[id]/photos/route");
const photoRoute = await import("@/app/api/photos/[photoId]/route");
const thumbRoute = await import("@/app/api/photos/[photoId]/thumbnail/route");
const data = await import("@/lib/data/photos");

const ctx = seededDbForFile();
const dir = mkdtempSync(path.join(os.tmpdir(), "warmstead-photos-test-"));
const storeDir = path.join(dir, "store");
const tempDir = path.join(dir, "incoming");
let surfaceId = "";
let otherJobSurfaceId = "";

/** Every file under the storage folder. */
function storedFiles(root = storeDir): string[] {
  try {
    return readdirSync(root, { recursive: true, withFileTypes: true }).filter((d) => d.isFile()).map((d) => path.join(d.parentPath, d.name));
  } catch {
    return [];
  }
}
const photoCount = async () => (await ctx.t.db.select({ id: photos.id }).from(photos)).length;
const post = (fields: Record<string, string>, file?: { bytes: Uint8Array; name: string; type?: string }, jobId = ids.demoJob) => postPhoto(listRoute.POST as never, jobId, fields, file);

beforeAll(async () => {
  process.env.UPLOAD_TMP_DIR = tempDir;
  resetStorage(new LocalStorage(storeDir));
  const otherJob = (await ctx.t.db.select({ id: jobs.id }).from(jobs)).find((j) => j.id !== ids.demoJob)!.id;
  [{ id: surfaceId }] = await ctx.t.db.insert(surfaces).values({ jobId: ids.demoJob, label: "North wall", kind: "wall", orientation: "N", grossAreaFt2: 320 }).returning({ id: surfaces.id });
  [{ id: otherJobSurfaceId }] = await ctx.t.db.insert(surfaces).values({ jobId: otherJob, label: "Elsewhere", kind: "wall", orientation: "S", grossAreaFt2: 200 }).returning({ id: surfaces.id });
});
afterAll(() => {
  resetStorage();
  delete process.env.UPLOAD_TMP_DIR;
  rmSync(dir, { recursive: true, force: true });
});

describe("uploading a photo", () => {
  it("stores a JPEG with its thumbnail and answers 201 with the record", async () => {
    actAs(ids.auditor);
    const res = await post({ tag: "before", caption: "North wall, empty cavity at the sill", surfaceId }, { bytes: await makeImage("jpeg", { width: 1200, height: 800 }), name: "IMG_2231.JPG" });
    expect(res.status).toBe(201);
    const photo = res.json.photo!;
    expect(photo).toMatchObject({ tag: "before", caption: "North wall, empty cavity at the sill", surfaceId, surfaceLabel: "North wall", contentType: "image/jpeg", width: 1200, height: 800, jobId: ids.demoJob });
    expect(photo).not.toHaveProperty("storageKey");
    expect(storedFiles()).toHaveLength(2);

    const original = await getImage(photoRoute.GET as never, photo.id as string, photo.url as string);
    expect(original.status).toBe(200);
    expect(original.headers.get("content-type")).toBe("image/jpeg");
    expect(original.headers.get("cache-control")).toMatch(/^private/);
    expect(original.headers.get("x-content-type-options")).toBe("nosniff");
    expect(Number(original.headers.get("content-length"))).toBe(photo.bytes);
    expect((await sharp(original.body).metadata()).width).toBe(1200);

    const thumb = await getImage(thumbRoute.GET as never, photo.id as string, photo.thumbnailUrl as string);
    expect(thumb.status).toBe(200);
    expect(thumb.headers.get("content-type")).toBe("image/webp");
    const t = await sharp(thumb.body).metadata();
    expect([t.format, t.width, t.height]).toEqual(["webp", 480, 320]);

    const again = await getImage(photoRoute.GET as never, photo.id as string, photo.url as string, { "if-none-match": original.headers.get("etag")! });
    expect(again.status).toBe(304);
  });

  it("accepts PNG and WebP, judged by their bytes", async () => {
    actAs(ids.installer);
    const png = await post({ tag: "during" }, { bytes: await makeImage("png"), name: "scan.bin", type: "application/octet-stream" });
    expect(png.status).toBe(201);
    expect(png.json.photo!.contentType).toBe("image/png");
    const webp = await post({ tag: "thermal" }, { bytes: await makeImage("webp"), name: "thermal.jpg", type: "image/jpeg" });
    expect(webp.status).toBe(201);
    expect(webp.json.photo!.contentType).toBe("image/webp");
  });
});

describe("location and other metadata are removed", () => {
  it("strips EXIF GPS from a JPEG, keeps its pixels and its orientation", async () => {
    const input = await makeImage("jpeg", { width: 300, height: 200, gps: true, orientation: 6 });
    const before = await exifr.gps(Buffer.from(input));
    expect(before?.latitude).toBeCloseTo(40.43676, 3); // the test image really carries a location
    actAs(ids.installer);
    const res = await post({ tag: "after" }, { bytes: input, name: "with-location.jpg" });
    expect(res.status).toBe(201);
    expect([res.json.photo!.width, res.json.photo!.height]).toEqual([200, 300]); // as displayed (rotated 90°)

    const stored = (await getImage(photoRoute.GET as never, res.json.photo!.id as string, res.json.photo!.url as string)).body;
    expect(await exifr.gps(stored)).toBeUndefined();
    const tags = (await exifr.parse(stored, { gps: true, tiff: true, exif: true, xmp: true, iptc: true, translateValues: false })) ?? {};
    expect(Object.keys(tags).filter((k) => /gps|make|model/i.test(k))).toEqual([]);
    expect(tags.Orientation).toBe(6);
    // lossless: the same decoded pixels as the upload
    const raw = async (b: Uint8Array) => sharp(b).raw().toBuffer();
    expect((await raw(stored)).equals(await raw(input))).toBe(true);
    // the thumbnail is turned upright
    const thumb = await getImage(thumbRoute.GET as never, res.json.photo!.id as string, res.json.photo!.thumbnailUrl as string);
    const t = await sharp(thumb.body).metadata();
    expect([t.width, t.height, t.exif]).toEqual([200, 300, undefined]);
  });

  it.each(["png", "webp"] as const)("strips EXIF GPS from a %s", async (format) => {
    const input = await makeImage(format, { gps: true });
    expect((await sharp(input).metadata()).exif).toBeDefined();
    actAs(ids.auditor);
    const res = await post({ tag: "before" }, { bytes: input, name: `loc.${format}` });
    expect(res.status).toBe(201);
    const stored = (await getImage(photoRoute.GET as never, res.json.photo!.id as string, res.json.photo!.url as string)).body;
    expect((await sharp(stored).metadata()).exif).toBeUndefined();
    expect(await exifr.gps(stored).catch(() => undefined)).toBeUndefined();
  });
});

describe("refused uploads store nothing", () => {
  const svg = `<svg xmlns="http://www.w3.org/2000/svg" width="10" height="10"><script>alert(document.cookie)</script></svg>`;
  const cases: { name: string; file: () => Promise<{ bytes: Uint8Array; name: string; type?: string }>; status: number; message: RegExp }[] = [
    { name: "an oversized file", file: async () => { const b = new Uint8Array(20 * 1024 * 1024 + 1); b.set([0xff, 0xd8, 0xff, 0xe0]); return { bytes: b, name: "big.jpg" }; }, status: 413, message: /larger than 20\.0 MB/ },
    { name: "text renamed to .jpg (wrong magic bytes)", file: async () => ({ bytes: new TextEncoder().encode("just some text pretending to be a photo, honestly"), name: "photo.jpg" }), status: 415, message: /not a JPEG, PNG or WebP/ },
    { name: "an SVG with a script", file: async () => ({ bytes: new TextEncoder().encode(svg), name: "wall.svg", type: "image/svg+xml" }), status: 415, message: /SVG/ },
    { name: "an SVG with a script renamed to .jpg", file: async () => ({ bytes: new TextEncoder().encode(`<?xml version="1.0"?>${svg}`), name: "wall.jpg" }), status: 415, message: /SVG/ },
    { name: "a PDF", file: async () => ({ bytes: new TextEncoder().encode("%PDF-1.7\n%âãÏÓ\n1 0 obj << >> endobj\ntrailer"), name: "report.jpg" }), status: 415, message: /PDF/ },
    { name: "a HEIC photo", file: async () => ({ bytes: Uint8Array.from([0, 0, 0, 0x18, ...new TextEncoder().encode("ftypheic"), 0, 0, 0, 0, ...new TextEncoder().encode("mif1heic"), 0, 0, 0, 0]), name: "IMG_0001.HEIC", type: "image/heic" }), status: 415, message: /HEIC.*Export it as JPEG/ },
    { name: "a zero-byte file", file: async () => ({ bytes: new Uint8Array(0), name: "empty.jpg" }), status: 422, message: /empty/ },
    { name: "JPEG magic bytes then garbage", file: async () => ({ bytes: Uint8Array.from([0xff, 0xd8, 0xff, 0xe0, ...new TextEncoder().encode("not really a jpeg at all, just bytes after the magic number")]), name: "broken.jpg" }), status: 422, message: /could not be read as one/ },
  ];

  it.each(cases)("refuses $name", async ({ file, status, message }) => {
    actAs(ids.auditor);
    const filesBefore = storedFiles();
    const countBefore = await photoCount();
    const res = await post({ tag: "before" }, await file());
    expect(res.status).toBe(status);
    expect(res.json.error).toMatch(message);
    expect(res.json.fields?.file?.[0]).toMatch(message);
    expect(storedFiles()).toEqual(filesBefore);
    expect(await photoCount()).toBe(countBefore);
    expect(storedFiles(tempDir)).toEqual([]); // the received temporary file is gone too
  });

  it("ignores a path-traversal file name: the key is made by the server", async () => {
    actAs(ids.auditor);
    const res = await post({ tag: "before" }, { bytes: await makeImage("jpeg"), name: "../../../../../tmp/evil\\..\\x.jpg" });
    expect(res.status).toBe(201);
    const [row] = await ctx.t.db.select().from(photos).where(eq(photos.id, res.json.photo!.id as string));
    expect(row.storageKey).toMatch(new RegExp(`^photos/[0-9a-f-]{36}/${ids.demoJob}/[0-9a-f-]{36}\\.jpg$`));
    expect(row.thumbnailKey).toBe(row.storageKey.replace(/\.jpg$/, "-thumb.webp"));
    expect(storedFiles().every((f) => f.startsWith(storeDir + path.sep) && !/evil/.test(f))).toBe(true);
  });

  it("names the field for missing or bad form fields, before storing anything", async () => {
    actAs(ids.auditor);
    const filesBefore = storedFiles();
    const jpeg = await makeImage("jpeg");
    const noTag = await post({}, { bytes: jpeg, name: "a.jpg" });
    expect([noTag.status, noTag.json.fields?.tag]).toEqual([422, ["Choose tag from the list."]]);
    const badTag = await post({ tag: "sideways" }, { bytes: jpeg, name: "a.jpg" });
    expect(badTag.status).toBe(422);
    const noFile = await post({ tag: "before" });
    expect([noFile.status, noFile.json.fields?.file]).toEqual([422, ["Choose a photo to upload."]]);
    const longCaption = await post({ tag: "before", caption: "x".repeat(501) }, { bytes: jpeg, name: "a.jpg" });
    expect(longCaption.json.fields?.caption).toEqual(["Caption must be at most 500 characters."]);
    const foreignSurface = await post({ tag: "before", surfaceId: otherJobSurfaceId }, { bytes: jpeg, name: "a.jpg" });
    expect([foreignSurface.status, foreignSurface.json.fields?.surfaceId]).toEqual([422, ["This surface is not part of this job."]]);
    const badId = await post({ tag: "before", crewLogEntryId: "../../etc" }, { bytes: jpeg, name: "a.jpg" });
    expect(badId.json.fields?.crewLogEntryId).toEqual(["Crew-log entry is not a valid id."]);
    const json = await call(listRoute.POST as never, { method: "POST", params: { id: ids.demoJob }, body: { tag: "before" } });
    expect([json.status, json.json.error]).toEqual([415, 'Send the photo as multipart/form-data with the image in the field "file".']);
    expect(storedFiles()).toEqual(filesBefore);
    expect(storedFiles(tempDir)).toEqual([]);
  });
});

describe("listing and deleting", () => {
  it("filters by tag and by surface", async () => {
    actAs(ids.owner);
    const all = await call<{ photos: { tag: string; surfaceId: string | null }[] }>(listRoute.GET as never, { path: `/api/jobs/${ids.demoJob}/photos`, params: { id: ids.demoJob } });
    expect(all.status).toBe(200);
    expect(all.json.photos.length).toBeGreaterThanOrEqual(6);
    const thermal = await call<{ photos: { tag: string }[] }>(listRoute.GET as never, { path: `/api/jobs/${ids.demoJob}/photos?tag=thermal`, params: { id: ids.demoJob } });
    expect(thermal.json.photos.map((p) => p.tag)).toEqual(["thermal"]);
    const bySurface = await call<{ photos: { surfaceId: string }[] }>(listRoute.GET as never, { path: `/api/jobs/${ids.demoJob}/photos?surfaceId=${surfaceId}`, params: { id: ids.demoJob } });
    expect(bySurface.json.photos.map((p) => p.surfaceId)).toEqual([surfaceId]);
    const bad = await call(listRoute.GET as never, { path: `/api/jobs/${ids.demoJob}/photos?tag=upside-down`, params: { id: ids.demoJob } });
    expect([bad.status, bad.json.fields]).toEqual([422, { tag: ["Choose tag from the list."] }]);
  });

  it("lets an installer delete only their own upload, and removes the files", async () => {
    actAs(ids.auditor);
    const mine = await post({ tag: "during" }, { bytes: await makeImage("jpeg"), name: "a.jpg" });
    const id = mine.json.photo!.id as string;
    actAs(ids.installer);
    expect((await call(photoRoute.DELETE as never, { method: "DELETE", params: { photoId: id } })).status).toBe(403);
    const filesBefore = storedFiles().length;
    actAs(ids.auditor);
    expect((await call(photoRoute.DELETE as never, { method: "DELETE", params: { photoId: id } })).status).toBe(200);
    expect(storedFiles().length).toBe(filesBefore - 2);
    expect((await getImage(photoRoute.GET as never, id, `/api/photos/${id}`)).status).toBe(404);
  });
});

describe("homeowners see only photos in their issued documents", () => {
  async function authUser(id: string): Promise<AuthUser> {
    const [u] = await ctx.t.db.select().from(users).where(eq(users.id, id));
    return { id: u.id, companyId: u.companyId, role: u.role, name: u.name, email: u.email, unitSystem: u.unitSystem };
  }

  it("reads issuedDocuments.snapshot.photoIds", async () => {
    actAs(ids.auditor);
    const shown = (await post({ tag: "after" }, { bytes: await makeImage("jpeg"), name: "a.jpg" })).json.photo!.id as string;
    const notShown = (await post({ tag: "after" }, { bytes: await makeImage("jpeg"), name: "b.jpg" })).json.photo!.id as string;
    const owner = await authUser(ids.homeowner);
    const stranger = await authUser(ids.homeowner2);
    expect(await data.findReadablePhoto(owner, shown)).toBeNull(); // nothing issued yet

    const [job] = await ctx.t.db.select().from(jobs).where(eq(jobs.id, ids.demoJob));
    await ctx.t.db.insert(issuedDocuments).values({ companyId: job.companyId, jobId: job.id, kind: "savings-report", version: 1, snapshot: { photoIds: [shown] }, contentHash: "0".repeat(64), issuedById: ids.auditor });

    expect((await data.findReadablePhoto(owner, shown))?.id).toBe(shown);
    expect(await data.findReadablePhoto(owner, notShown)).toBeNull();
    expect(await data.findReadablePhoto(stranger, shown)).toBeNull();
    expect((await data.listPhotos(owner, ids.demoJob, {}))?.map((p) => p.id)).toEqual([shown]);
    // and the route answers the same: the shown photo, not the other one
    actAs(ids.homeowner);
    expect((await getImage(photoRoute.GET as never, shown, `/api/photos/${shown}`)).status).toBe(200);
    expect((await getImage(photoRoute.GET as never, notShown, `/api/photos/${notShown}`)).status).toBe(404);
    // and an issued photo cannot be deleted
    actAs(ids.owner);
    const del = await call(photoRoute.DELETE as never, { method: "DELETE", params: { photoId: shown } });
    expect([del.status, del.json.error]).toEqual([409, "This photo is part of an issued document and cannot be deleted."]);
  });
});
