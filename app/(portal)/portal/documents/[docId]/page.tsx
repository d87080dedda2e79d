import type { Metadata } from "next";
import Link from "next/link";
import { notFound } from "next/navigation";
import { AcceptForm } from "@/components/documents/accept-form";
import { DownloadPdfButton } from "@/components/documents/download-pdf-button";
import { ReportView } from "@/components/documents/report-view";
import { getDocument } from "@/lib/data/documents";
import { pdfFileName } from "@/lib/documents/file-name";
import { formatDollars } from "@/lib/money";
import { requireHomeownerPage } from "@/lib/session";

export const metadata: Metadata = { title: "Your document" };
const day = new Intl.DateTimeFormat("en-US", { dateStyle: "long", timeStyle: "short" });

export default async function PortalDocumentPage({ params }: { params: Promise<{ docId: string }> }) {
  const user = await requireHomeownerPage();
  const { docId } = await params;
  const doc = await getDocument(user, docId).catch(() => null);
  if (!doc) notFound();
  const s = doc.snapshot;
  return (
    <>
      <div className="mb-4 flex flex-wrap items-center gap-3 text-sm"><Link href="/portal" className="text-spruce-700 underline">← My home</Link> <DownloadPdfButton href={`/api/documents/${doc.id}/pdf`} fileName={pdfFileName(doc.kind, s.job.number, doc.version)} /></div>
      {doc.supersededAt ? <p className="mb-4 rounded-md bg-warn-bg px-3 py-2 text-warn">A newer version of this document has been issued to you; this one is kept for your records.</p> : null}
      <ReportView snapshot={s} />
      {s.kind === "proposal" ? (
        <div className="mt-6">
          {doc.accepted ? (
            <p role="status" className="card font-semibold text-spruce-800" data-testid="accepted">Accepted by {doc.accepted.name} on {day.format(doc.accepted.at)}. Thank you — the office has been told.</p>
          ) : doc.supersededAt ? null : (
            <AcceptForm docId={doc.id} total={formatDollars(s.proposal?.totalCents ?? 0)} />
          )}
        </div>
      ) : null}
    </>
  );
}
