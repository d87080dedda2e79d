"use client";

import Link from "next/link";
import { useState } from "react";
import useSWR from "swr";
import type { DocumentSummary } from "@/lib/data/documents";
import { pdfFileName } from "@/lib/documents/file-name";
import { fetcher, FetchError, sendJson } from "@/lib/hooks/fetcher";
import { usePhotos } from "@/lib/hooks/use-photos";
import { formatDollars } from "@/lib/money";
import { DownloadPdfButton } from "./download-pdf-button";
import { orderedChoice, PhotoPicker } from "./photo-picker";

const day = new Intl.DateTimeFormat("en-US", { dateStyle: "medium", timeStyle: "short" });
const usd = (x: number) => `$${Math.round(x).toLocaleString("en-US")}`;

/** Staff: issue a new version, compare versions' headline figures, open or download each, send to the homeowner. */
export function DocumentsPanel({ jobId, jobNumber, canIssue }: { jobId: string; jobNumber: number; canIssue: boolean }) {
  const key = `/api/jobs/${jobId}/documents`;
  const { data, mutate } = useSWR<{ documents: DocumentSummary[] }>(key, fetcher);
  const [busy, setBusy] = useState<string | null>(null);
  const [message, setMessage] = useState<{ ok: boolean; text: string } | null>(null);
  const [chosen, setChosen] = useState<Set<string>>(() => new Set());
  const jobPhotos = usePhotos(jobId);

  async function run(label: string, fn: () => Promise<string>) {
    setBusy(label);
    setMessage(null);
    try {
      setMessage({ ok: true, text: await fn() });
      await mutate();
    } catch (err) {
      const fields = err instanceof FetchError ? Object.entries((err.body.fields ?? {}) as Record<string, string[]>).map(([k, v]) => `${k}: ${v.join(" ")}`) : [];
      setMessage({ ok: false, text: [err instanceof Error ? err.message : "Could not reach the server.", ...fields].join(" ") });
    } finally {
      setBusy(null);
    }
  }
  const issue = (kind: "savings-report" | "proposal") =>
    run(kind, async () => {
      const photoIds = orderedChoice(jobPhotos.data?.photos ?? [], chosen);
      const r = await sendJson<{ document: DocumentSummary }>(key, "POST", { kind, photoIds });
      const withPhotos = photoIds.length ? ` with ${photoIds.length} photo${photoIds.length === 1 ? "" : "s"}` : "";
      return `Issued ${kind === "proposal" ? "proposal" : "savings report"} version ${r.document.version}${withPhotos}.`;
    });
  const send = () =>
    run("send", async () => {
      const r = await sendJson<{ invite: { to: string; mail: { status: string } } }>(`/api/jobs/${jobId}/invite`, "POST", {});
      return `Link sent to ${r.invite.to} (${r.invite.mail.status}).`;
    });

  const docs = data?.documents ?? [];
  return (
    <section aria-labelledby="docs-h" className="card space-y-4">
      <h2 id="docs-h" className="text-xl font-semibold text-spruce-800">Issued documents</h2>
      {canIssue ? <PhotoPicker jobId={jobId} chosen={chosen} onChange={setChosen} disabled={busy !== null} /> : null}
      {canIssue ? (
        <div className="flex flex-wrap gap-2">
          <button type="button" className="btn-primary" disabled={busy !== null} onClick={() => void issue("savings-report")}>{busy === "savings-report" ? "Issuing…" : "Issue savings report"}</button>
          <button type="button" className="btn-accent" disabled={busy !== null} onClick={() => void issue("proposal")}>{busy === "proposal" ? "Issuing…" : "Issue proposal"}</button>
          <button type="button" className="btn-ghost" disabled={busy !== null || docs.length === 0} onClick={() => void send()}>{busy === "send" ? "Sending…" : "Send to homeowner"}</button>
        </div>
      ) : null}
      {message ? <p role="status" data-testid="documents-message" className={`text-sm font-medium ${message.ok ? "text-spruce-800" : "text-danger"}`}>{message.text}</p> : null}
      <p className="text-sm text-ink-muted">Issuing freezes the job as it is now. Later edits never change an issued version; issuing again makes the next one.</p>
      <div className="overflow-x-auto">
        <table className="w-full min-w-[640px] text-left text-sm">
          <thead className="bg-paper-deep">
            <tr>
              <th scope="col" className="px-3 py-2">Document</th><th scope="col" className="px-3 py-2">Issued</th><th scope="col" className="px-3 py-2 text-right">Cost now / after</th>
              <th scope="col" className="px-3 py-2 text-right">Yearly saving</th><th scope="col" className="px-3 py-2 text-right">CFM50</th><th scope="col" className="px-3 py-2 text-right">Total</th><th scope="col" className="px-3 py-2">Status</th>
            </tr>
          </thead>
          <tbody data-testid="documents-rows">
            {docs.map((d) => (
              <tr key={d.id} className="border-t border-line">
                <td className="px-3 py-2 font-semibold">
                  <Link className="text-spruce-700 underline" href={`/jobs/${jobId}/documents/${d.id}`}>{d.kind === "proposal" ? "Proposal" : "Savings report"} v{d.version}</Link>{" "}
                  <DownloadPdfButton compact href={`/api/documents/${d.id}/pdf`} fileName={pdfFileName(d.kind, jobNumber, d.version)} label="PDF" />
                </td>
                <td className="px-3 py-2">{day.format(d.issuedAt)} · {d.issuedByName}</td>
                <td className="px-3 py-2 text-right tabular-nums">{usd(d.headline.annualCostBeforeUSD)} / {usd(d.headline.annualCostAfterUSD)}</td>
                <td className="px-3 py-2 text-right tabular-nums">{usd(d.headline.yearlySavingUSD)}</td>
                <td className="px-3 py-2 text-right tabular-nums">{Math.round(d.headline.cfm50Before)} → {Math.round(d.headline.cfm50After)}</td>
                <td className="px-3 py-2 text-right tabular-nums">{d.headline.totalCents === null ? "—" : formatDollars(d.headline.totalCents)}</td>
                <td className="px-3 py-2">{d.accepted ? `Accepted by ${d.accepted.name}` : d.supersededAt ? "Superseded" : "Current"}</td>
              </tr>
            ))}
            {docs.length === 0 ? <tr><td colSpan={7} className="px-3 py-6 text-center text-ink-muted">Nothing issued yet.</td></tr> : null}
          </tbody>
        </table>
      </div>
    </section>
  );
}
