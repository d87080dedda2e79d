// One issued snapshot → PDF bytes. Pure rendering: everything comes from the snapshot.
import { renderToBuffer } from "@react-pdf/renderer";
import { createElement } from "react";
import type { ReportSnapshot } from "@/lib/documents/snapshot";
import { ProposalDocument } from "./proposal";
import { SavingsReportDocument } from "./savings-report";

/**
 * Renders a savings report, or a proposal with the savings report's pages appended. A proposal
 * appends `options.report` when given (the savings report issued with it), else its own analysis.
 * `options.images` holds the JPEG bytes of the snapshot's chosen photos, by id (the photos page).
 */
export async function renderSnapshotPdf(snapshot: ReportSnapshot, options: { report?: ReportSnapshot; images?: Record<string, Buffer> } = {}): Promise<Buffer> {
  const doc = snapshot.kind === "proposal"
    ? createElement(ProposalDocument, { snapshot, report: options.report, images: options.images })
    : createElement(SavingsReportDocument, { snapshot, images: options.images });
  // renderToBuffer's type wants a <Document> element; both components return one.
  return renderToBuffer(doc as Parameters<typeof renderToBuffer>[0]);
}
