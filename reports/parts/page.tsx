// The page frame every report page shares: a thin spruce band with the document's name at the
// top, and a footer with the company's name and "Page N of M" (counted over the whole file, so a
// proposal with its savings report appended numbers straight through).
import type { ReactNode } from "react";
import { Page, Text, View } from "@react-pdf/renderer";
import { colors, PAGE_PAD_X, s } from "./theme";
import { pdfText } from "./text";

const PAGE_H = 792; // US Letter, points
const FOOTER_TOP = PAGE_H - 46;
const FOOTER_RULE = 0.75;
const FOOTER_PAD = 6;

export type FrameProps = { companyName: string; documentTitle: string; children: ReactNode; wrap?: boolean };

/**
 * A report page. It uses React-PDF's newer pagination (`experimentalPagination`): content is laid
 * out once and packed into pages, where the default engine laid the whole page out again at each
 * page break and once more per page for the page numbers (about a fifth of a report's render).
 * The frame comes first among the children: fixed, absolutely placed nodes at the start of the
 * page repeat on every page it runs to. "Page N of M" still costs the engine a second round of
 * pagination (it needs the page count), about an eighth of a render.
 */
export function ReportPage({ companyName, documentTitle, children, wrap = true }: FrameProps) {
  return (
    <Page size="LETTER" style={s.page} wrap={wrap} experimentalPagination>
      <View fixed style={{ position: "absolute", top: 0, left: 0, right: 0, height: 6, backgroundColor: colors.spruce700 }} />
      <Text fixed style={{ position: "absolute", top: 16, left: PAGE_PAD_X, right: PAGE_PAD_X, fontSize: 8, color: colors.muted, letterSpacing: 0.6 }}>
        {pdfText(documentTitle.toUpperCase())}
      </Text>
      <View fixed style={{ position: "absolute", top: FOOTER_TOP, left: PAGE_PAD_X, right: PAGE_PAD_X, borderTopWidth: FOOTER_RULE, borderTopColor: colors.line, paddingTop: FOOTER_PAD }}>
        <Text style={{ fontSize: 8.5, color: colors.spruce800, fontWeight: 600 }}>{pdfText(companyName)}</Text>
      </View>
      <Text
        fixed
        style={{ position: "absolute", top: FOOTER_TOP + FOOTER_RULE + FOOTER_PAD, right: PAGE_PAD_X, fontSize: 8.5, color: colors.muted }}
        render={({ pageNumber, totalPages }) => `Page ${pageNumber} of ${totalPages}`}
      />
      {children}
    </Page>
  );
}
