import { randomUUID } from "node:crypto";
import { createReadStream, createWriteStream } from "node:fs";
import { mkdir, open, rename, rm, stat, writeFile } from "node:fs/promises";
import path from "node:path";
import { Readable } from "node:stream";
import { pipeline } from "node:stream/promises";
import { assertSafeKey } from "./keys";
import { copySlices, isFileSlices, type FileSlices } from "./slices";
import type { PutBody, PutOptions, StorageDriver, StoredObject } from "./types";

const isMissing = (e: unknown) => (e as NodeJS.ErrnoException)?.code === "ENOENT";

/** Files under one root folder. Writes go to a temporary name first, then are renamed into place. */
export class LocalStorage implements StorageDriver {
  readonly name = "local" as const;
  readonly root: string;

  constructor(root: string) {
    this.root = path.resolve(root);
  }

  private pathOf(key: string) {
    const full = path.resolve(this.root, assertSafeKey(key));
    if (!full.startsWith(this.root + path.sep)) throw new Error("Storage key escapes the storage folder.");
    return full;
  }

  async put(key: string, body: PutBody, _options: PutOptions): Promise<void> {
    void _options;
    const target = this.pathOf(key);
    await mkdir(path.dirname(target), { recursive: true });
    const temp = `${target}.partial-${randomUUID()}`;
    try {
      if (isFileSlices(body)) await writeSlices(body, temp);
      else if (body instanceof Readable) await pipeline(body, createWriteStream(temp, { flags: "wx" }));
      else await writeFile(temp, body, { flag: "wx" });
      await rename(temp, target);
    } catch (err) {
      await rm(temp, { force: true });
      throw err;
    }
  }

  async get(key: string): Promise<StoredObject | null> {
    const file = this.pathOf(key);
    try {
      const info = await stat(file);
      if (!info.isFile()) return null;
      return { body: createReadStream(file), size: info.size };
    } catch (err) {
      if (isMissing(err)) return null;
      throw err;
    }
  }

  async delete(key: string): Promise<void> {
    await rm(this.pathOf(key), { force: true });
  }

  async exists(key: string): Promise<boolean> {
    try {
      return (await stat(this.pathOf(key))).isFile();
    } catch (err) {
      if (isMissing(err)) return false;
      throw err;
    }
  }
}

async function writeSlices(slices: FileSlices, temp: string) {
  const source = await open(slices.path, "r");
  try {
    const out = await open(temp, "wx");
    try {
      const written = await copySlices(slices, source, out);
      if (written !== slices.length) throw new Error(`Stored ${written} bytes where ${slices.length} were planned.`);
    } finally {
      await out.close();
    }
  } finally {
    await source.close();
  }
}
