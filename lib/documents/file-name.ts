/** The file name an issued document's PDF saves as, e.g. warmstead-savings-report-job-1006-v2.pdf. */
export const pdfFileName = (kind: string, jobNumber: number, version: number) =>
  `warmstead-${kind === "proposal" ? "proposal" : "savings-report"}-job-${jobNumber}-v${version}.pdf`;
