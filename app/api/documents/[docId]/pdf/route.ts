import { withAuth } from "@/lib/authz/guard";
import { getDocument } from "@/lib/data/documents";
import { pdfFileName } from "@/lib/documents/file-name";
import { loadPdfImages } from "@/lib/documents/pdf-photos";
import { renderSnapshotPdf } from "@/reports/render";

export const runtime = "nodejs";

/**
 * The issued document as a PDF, drawn from the same frozen snapshot as the on-screen view, with
 * the chosen photos' thumbnails embedded. Content-Length lets the download button show progress.
 */
export const GET = withAuth<{ docId: string }>(
  async (_req, { user, params }) => {
    const doc = await getDocument(user, params.docId);
    const pdf = await renderSnapshotPdf(doc.snapshot, { images: await loadPdfImages(doc.snapshot) });
    return new Response(new Uint8Array(pdf), {
      headers: {
        "content-type": "application/pdf",
        "content-length": String(pdf.length),
        "content-disposition": `attachment; filename="${pdfFileName(doc.kind, doc.snapshot.job.number, doc.version)}"`,
        "cache-control": "private, no-store",
        "x-content-hash": doc.contentHash,
      },
    });
  },
  { permission: "documents:read" },
);
