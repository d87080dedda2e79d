import type { Metadata } from "next";
import Link from "next/link";
import { notFound } from "next/navigation";
import { DownloadPdfButton } from "@/components/documents/download-pdf-button";
import { ReportView } from "@/components/documents/report-view";
import { getDocument } from "@/lib/data/documents";
import { pdfFileName } from "@/lib/documents/file-name";
import { requireStaffPage } from "@/lib/session";

export const metadata: Metadata = { title: "Issued document" };

export default async function StaffDocumentPage({ params }: { params: Promise<{ id: string; docId: string }> }) {
  const user = await requireStaffPage("documents:read");
  const { id, docId } = await params;
  const doc = await getDocument(user, docId).catch(() => null);
  if (!doc) notFound();
  return (
    <>
      <div className="mb-4 flex flex-wrap items-center gap-3 text-sm"><Link href={`/jobs/${id}/documents`} className="text-spruce-700 underline">← All documents</Link> <DownloadPdfButton href={`/api/documents/${doc.id}/pdf`} fileName={pdfFileName(doc.kind, doc.snapshot.job.number, doc.version)} /></div>
      {doc.supersededAt ? <p className="mb-4 rounded-md bg-warn-bg px-3 py-2 text-warn">Superseded by a newer version.</p> : null}
      <ReportView snapshot={doc.snapshot} />
    </>
  );
}
