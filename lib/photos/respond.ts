import { Readable } from "node:stream";
import type { StoredObject } from "@/lib/storage";

/** A stored image streamed to the browser: its own type, private caching, never sniffed. */
export function imageResponse(req: Request, object: StoredObject, opts: { contentType: string; etag: string; filename: string }): Response {
  const headers = new Headers({
    "Content-Type": opts.contentType,
    "Cache-Control": "private, max-age=3600",
    "X-Content-Type-Options": "nosniff",
    "Content-Disposition": `inline; filename="${opts.filename}"`,
    "Content-Security-Policy": "default-src 'none'; sandbox",
    ETag: `"${opts.etag}"`,
  });
  if (req.headers.get("if-none-match") === `"${opts.etag}"`) {
    object.body.destroy();
    return new Response(null, { status: 304, headers });
  }
  if (object.size) headers.set("Content-Length", String(object.size));
  return new Response(Readable.toWeb(object.body) as ReadableStream<Uint8Array>, { status: 200, headers });
}
