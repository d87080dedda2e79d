import { withAuth } from "@/lib/authz/guard";
import { getDocument } from "@/lib/data/documents";
import { renderSnapshotPdf } from "@/reports/render";

export const runtime = "nodejs";

/** The issued document as a PDF, drawn from the same frozen snapshot as the on-screen view. */
export const GET = withAuth<{ docId: string }>(
  async (_req, { user, params }) => {
    const doc = await getDocument(user, params.docId);
    const pdf = await renderSnapshotPdf(doc.snapshot);
    const name = `${doc.kind === "proposal" ? "proposal" : "savings-report"}-job-${doc.snapshot.job.number}-v${doc.version}.pdf`;
    return new Response(new Uint8Array(pdf), {
      headers: {
        "content-type": "application/pdf",
        "content-disposition": `attachment; filename="${name}"`,
        "cache-control": "private, no-store",
        "x-content-hash": doc.contentHash,
      },
    });
  },
  { permission: "documents:read" },
);
