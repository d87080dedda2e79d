import type { Metadata } from "next";
import { DownloadPdfButton } from "@/components/documents/download-pdf-button";
import { StageBadge } from "@/components/jobs/stage-badge";
import { listDocuments, type DocumentSummary } from "@/lib/data/documents";
import { pdfFileName } from "@/lib/documents/file-name";
import { listHomeownerHouses } from "@/lib/data/portal";
import Link from "next/link";
import { requireHomeownerPage } from "@/lib/session";

export const metadata: Metadata = { title: "My home" };

export default async function PortalPage() {
  const user = await requireHomeownerPage();
  const [homes, documents] = await Promise.all([listHomeownerHouses(user), listDocuments(user)]);
  return (
    <>
      <h1 className="text-3xl font-bold text-spruce-900">Welcome, {user.name.split(" ")[0]}</h1>
      <p className="mt-1 text-ink-muted">Your house, the work planned for it, and the reports your contractor has issued to you.</p>
      <ul className="mt-6 space-y-4" data-testid="portal-houses">
        {homes.map((h) => (
          <li key={h.jobId} className="card">
            <div className="flex flex-wrap items-center justify-between gap-3">
              <div>
                <h2 className="text-xl font-semibold text-spruce-800">{h.street}</h2>
                <p className="text-ink-muted">{h.city}, {h.state} · built {h.yearBuilt}</p>
              </div>
              <StageBadge stage={h.stage} />
            </div>
            <DocumentList documents={documents.filter((d) => d.jobId === h.jobId)} jobNumber={h.number} />
          </li>
        ))}
        {homes.length === 0 ? <li className="card text-ink-muted">No house is linked to your account yet.</li> : null}
      </ul>
    </>
  );
}

const day = new Intl.DateTimeFormat("en-US", { dateStyle: "medium" });

function DocumentList({ documents, jobNumber }: { documents: DocumentSummary[]; jobNumber: number }) {
  if (documents.length === 0) return <p className="mt-3 text-ink-muted">No documents have been issued yet. When your savings report or proposal is ready, it appears here and you receive an e-mail.</p>;
  return (
    <ul className="mt-4 divide-y divide-line" data-testid="portal-documents">
      {documents.map((d) => (
        <li key={d.id} className="flex flex-wrap items-center justify-between gap-2 py-3">
          <Link href={`/portal/documents/${d.id}`} className="font-semibold text-spruce-700 underline">
            {d.kind === "proposal" ? "Proposal" : "Savings report"}, version {d.version}
          </Link>
          <span className="text-sm text-ink-muted">{day.format(d.issuedAt)} · {d.accepted ? "accepted" : d.supersededAt ? "replaced by a newer version" : "current"} · <DownloadPdfButton compact href={`/api/documents/${d.id}/pdf`} fileName={pdfFileName(d.kind, jobNumber, d.version)} label="PDF" /></span>
        </li>
      ))}
    </ul>
  );
}
