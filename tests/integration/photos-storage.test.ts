// The storage module's two drivers, and the streaming multipart reader at awkward chunk sizes.
import { mkdtempSync, readFileSync, rmSync, writeFileSync } from "node:fs";
import os from "node:os";
import path from "node:path";
import { Readable } from "node:stream";
import { afterAll, beforeAll, describe, expect, it, vi } from "vitest";
import { receivePhotoUpload } from "@/lib/photos/multipart";
import { assertSafeKey, fileSlices, LocalStorage, newPhotoKeys, S3Storage, storageFromEnv, type StorageDriver } from "@/lib/storage";
import { makeImage } from "./photos-support";

vi.mock("@/lib/auth", () => import("../support/auth-mock"));

// @ts-expect-error -- s3rver ships no type declarations
const { default: S3rver } = await import("s3rver");

const dir = mkdtempSync(path.join(os.tmpdir(), "warmstead-storage-test-"));
let s3server: { close: () => Promise<void> };
let s3: S3Storage;
const bucket = "warmstead-test";

beforeAll(async () => {
  const fake = new S3rver({ address: "127.0.0.1", port: 0, silent: true, directory: path.join(dir, "s3"), configureBuckets: [{ name: bucket }] });
  const { port } = (await fake.run()) as { port: number };
  s3server = fake;
  s3 = storageFromEnv({ STORAGE_DRIVER: "s3", S3_BUCKET: bucket, S3_REGION: "us-east-1", S3_ENDPOINT: `http://127.0.0.1:${port}`, S3_ACCESS_KEY_ID: "S3RVER", S3_SECRET_ACCESS_KEY: "S3RVER" }) as S3Storage;
});
afterAll(async () => {
  s3?.close();
  await s3server?.close();
  rmSync(dir, { recursive: true, force: true });
});

async function readAll(stream: Readable) {
  const chunks: Buffer[] = [];
  for await (const c of stream) chunks.push(Buffer.from(c));
  return Buffer.concat(chunks);
}

describe.each([
  ["local disk", () => new LocalStorage(path.join(dir, "local")) as StorageDriver],
  ["S3 (against s3rver on 127.0.0.1)", () => s3 as StorageDriver],
])("%s driver", (_name, driver) => {
  it("puts a buffer and a stream, reads them back, checks and deletes them", async () => {
    const store = driver();
    const keys = newPhotoKeys("00000000-0000-4000-8000-000000000001", "00000000-0000-4000-8000-000000000002", "jpg");
    const jpeg = Buffer.from(await makeImage("jpeg", { width: 400, height: 300 }));
    const thumb = Buffer.from(await makeImage("webp"));
    await store.put(keys.original, Readable.from([jpeg.subarray(0, 1000), jpeg.subarray(1000)]), { contentType: "image/jpeg", contentLength: jpeg.length });
    await store.put(keys.thumbnail, thumb, { contentType: "image/webp" });
    expect(await store.exists(keys.original)).toBe(true);
    const got = await store.get(keys.original);
    expect(got?.size).toBe(jpeg.length);
    expect((await readAll(got!.body)).equals(jpeg)).toBe(true);
    expect((await readAll((await store.get(keys.thumbnail))!.body)).equals(thumb)).toBe(true);
    await store.delete(keys.original);
    expect(await store.exists(keys.original)).toBe(false);
    expect(await store.get(keys.original)).toBeNull();
    await store.delete(keys.original); // deleting twice is fine
  });

  it("stores byte ranges of a file with bytes made in memory between them, in order", async () => {
    const store = driver();
    const source = path.join(dir, `slices-source-${Math.random().toString(16).slice(2)}.bin`);
    // 700 KB, so a range spans several 256 KB copy buffers; every byte differs from its neighbours.
    const data = Buffer.alloc(700 * 1024);
    for (let i = 0; i < data.length; i++) data[i] = (i * 7 + (i >> 8)) & 0xff;
    writeFileSync(source, data);
    const keys = newPhotoKeys("00000000-0000-4000-8000-000000000001", "00000000-0000-4000-8000-000000000002", "jpg");
    const parts = [{ start: 0, end: 2 }, { bytes: Buffer.from("inserted") }, { start: 10, end: 600_000 }, { start: 650_000, end: data.length }];
    const slices = fileSlices(source, parts);
    const expected = Buffer.concat([data.subarray(0, 2), Buffer.from("inserted"), data.subarray(10, 600_000), data.subarray(650_000)]);
    expect(slices.length).toBe(expected.length);
    await store.put(keys.original, slices, { contentType: "image/jpeg" });
    const got = await store.get(keys.original);
    expect(got?.size).toBe(expected.length);
    expect((await readAll(got!.body)).equals(expected)).toBe(true);
    await store.delete(keys.original);
  });

  it("refuses a file shorter than its planned ranges, and stores nothing", async () => {
    const store = driver();
    const source = path.join(dir, `slices-short-${Math.random().toString(16).slice(2)}.bin`);
    writeFileSync(source, Buffer.alloc(1000, 1));
    const keys = newPhotoKeys("00000000-0000-4000-8000-000000000001", "00000000-0000-4000-8000-000000000002", "jpg");
    await expect(store.put(keys.original, fileSlices(source, [{ start: 0, end: 5000 }]), { contentType: "image/jpeg" })).rejects.toThrow();
    expect(await store.exists(keys.original)).toBe(false);
  });

  it("refuses keys it did not make", async () => {
    const store = driver();
    for (const key of ["../escape.jpg", "/etc/passwd", "photos/../../x", "a//b", "photos/a b.jpg", ""]) {
      await expect(store.get(key)).rejects.toThrow(/unsafe storage key/);
    }
  });
});

describe("storage configuration", () => {
  it("defaults to local disk under WARMSTEAD_DATA_DIR/uploads, or STORAGE_DIR", () => {
    expect((storageFromEnv({ WARMSTEAD_DATA_DIR: "/srv/ws" }) as LocalStorage).root).toBe("/srv/ws/uploads");
    expect((storageFromEnv({ STORAGE_DIR: "/mnt/photos" }) as LocalStorage).root).toBe("/mnt/photos");
    expect(() => storageFromEnv({ STORAGE_DRIVER: "s3" })).toThrow("STORAGE_DRIVER=s3 needs S3_BUCKET.");
    expect(() => storageFromEnv({ STORAGE_DRIVER: "ftp" })).toThrow(/Unknown STORAGE_DRIVER/);
    expect(assertSafeKey("photos/a/b/c.jpg")).toBe("photos/a/b/c.jpg");
  });
});

describe("streaming multipart reader", () => {
  it.each([1, 7, 45, 4096])("reassembles the file exactly when the body arrives in %i-byte chunks", async (size) => {
    const jpeg = Buffer.from(await makeImage("jpeg", { width: 200, height: 150 }));
    const boundary = "----b0undary\r\n--"; // a boundary-looking run inside the data must not confuse it
    const b = "XyZ123boundary";
    const body = Buffer.concat([
      Buffer.from(`preamble\r\n--${b}\r\nContent-Disposition: form-data; name="tag"\r\n\r\nbefore\r\n--${b}\r\nContent-Disposition: form-data; name="caption"\r\n\r\nline one\r\n--${boundary}\r\n--${b}\r\nContent-Disposition: form-data; name="file"; filename="a.jpg"\r\nContent-Type: image/jpeg\r\n\r\n`),
      jpeg,
      Buffer.from(`\r\n--${b}--\r\nepilogue`),
    ]);
    const chunks: Uint8Array[] = [];
    for (let i = 0; i < body.length; i += size) chunks.push(new Uint8Array(body.subarray(i, i + size)));
    const req = new Request("http://x.test/", { method: "POST", headers: { "content-type": `multipart/form-data; boundary=${b}` }, body: Readable.toWeb(Readable.from(chunks)) as ReadableStream, duplex: "half" } as RequestInit);
    const got = await receivePhotoUpload(req, { tempDir: path.join(dir, "incoming") });
    try {
      expect(got.fields).toEqual({ tag: "before", caption: `line one\r\n--${boundary}` });
      expect(got.file?.bytes).toBe(jpeg.length);
      expect(readFileSync(got.file!.path).equals(jpeg)).toBe(true);
    } finally {
      await got.cleanup();
    }
  });
});
