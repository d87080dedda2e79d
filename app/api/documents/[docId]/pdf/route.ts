import { withAuth } from "@/lib/authz/guard";
import { getDocument } from "@/lib/data/documents";
import { pdfFileName } from "@/lib/documents/file-name";
import { loadPdfImages } from "@/lib/documents/pdf-photos";
import { renderSnapshotPdf } from "@/reports/render";

export const runtime = "nodejs";

/**
 * The issued document as a PDF, drawn from the same frozen snapshot as the on-screen view, with
 * the chosen photos' thumbnails embedded. The length (Content-Length, and X-Content-Length, which
 * survives the server) lets the download button show progress.
 */
export const GET = withAuth<{ docId: string }>(
  async (_req, { user, params }) => {
    const doc = await getDocument(user, params.docId);
    const pdf = await renderSnapshotPdf(doc.snapshot, { images: await loadPdfImages(doc.snapshot) });
    return new Response(new Uint8Array(pdf), {
      headers: {
        "content-type": "application/pdf",
        "content-length": String(pdf.length),
        // Next's route layer drops Content-Length before the response leaves `next start`
        // (node_modules/next/dist/server/send-response.js); the download button reads this copy.
        "x-content-length": String(pdf.length),
        "content-disposition": `attachment; filename="${pdfFileName(doc.kind, doc.snapshot.job.number, doc.version)}"`,
        // no-transform: the server's gzip would drop Content-Length (and PDF streams are compressed already)
        "cache-control": "private, no-store, no-transform",
        "x-content-hash": doc.contentHash,
      },
    });
  },
  { permission: "documents:read" },
);
