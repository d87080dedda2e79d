import "server-only";
import { and, eq, inArray } from "drizzle-orm";
import sharp from "sharp";
import { getDb } from "@/db";
import { photos } from "@/db/schema";
import { getStorage } from "@/lib/storage";
import type { ReportSnapshot } from "./snapshot";

/** JPEG bytes per photo id, for the PDF's photos page. */
export type PdfImages = Record<string, Buffer>;

async function readAll(body: NodeJS.ReadableStream): Promise<Buffer> {
  const chunks: Buffer[] = [];
  for await (const c of body) chunks.push(typeof c === "string" ? Buffer.from(c) : (c as Buffer));
  return Buffer.concat(chunks);
}

/**
 * The images a document's PDF embeds: each chosen photo's stored thumbnail (WebP, at most 480 px),
 * re-encoded as JPEG because PDF pages take JPEG or PNG. Never the original: it keeps the PDF light.
 * The caller has already checked the reader may see the document; its snapshot names the photos,
 * and only photos of the document's own job are read. A photo whose file is missing is left out
 * (the page then says so beside its caption).
 */
export async function loadPdfImages(snapshot: ReportSnapshot): Promise<PdfImages> {
  const ids = snapshot.photos?.map((p) => p.id) ?? [];
  if (ids.length === 0) return {};
  const rows = await getDb()
    .select({ id: photos.id, thumbnailKey: photos.thumbnailKey })
    .from(photos)
    .where(and(eq(photos.jobId, snapshot.job.id), inArray(photos.id, ids)));
  const storage = getStorage();
  const out: PdfImages = {};
  await Promise.all(
    rows.map(async (r) => {
      if (!r.thumbnailKey) return;
      const object = await storage.get(r.thumbnailKey);
      if (!object) return;
      out[r.id] = await sharp(await readAll(object.body)).flatten({ background: "#ffffff" }).jpeg({ quality: 78, mozjpeg: true }).toBuffer();
    }),
  );
  return out;
}
