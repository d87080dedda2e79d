// The page frame every report page shares: a thin spruce band with the document's name at the
// top, and a footer with the company's name and "Page N of M" (counted over the whole file, so a
// proposal with its savings report appended numbers straight through).
import type { ReactNode } from "react";
import { Page, Text, View } from "@react-pdf/renderer";
import { colors, PAGE_PAD_X, s } from "./theme";
import { pdfText } from "./text";

const PAGE_H = 792; // US Letter, points

export type FrameProps = { companyName: string; documentTitle: string; children: ReactNode; wrap?: boolean };

export function ReportPage({ companyName, documentTitle, children, wrap = true }: FrameProps) {
  return (
    <Page size="LETTER" style={s.page} wrap={wrap}>
      <View fixed style={{ position: "absolute", top: 0, left: 0, right: 0, height: 6, backgroundColor: colors.spruce700 }} />
      <View fixed style={{ position: "absolute", top: 16, left: PAGE_PAD_X, right: PAGE_PAD_X, flexDirection: "row", justifyContent: "space-between" }}>
        <Text style={{ fontSize: 8, color: colors.muted, letterSpacing: 0.6 }}>{pdfText(documentTitle.toUpperCase())}</Text>
      </View>
      {children}
      <View
        fixed
        style={{ position: "absolute", top: PAGE_H - 46, left: PAGE_PAD_X, right: PAGE_PAD_X, flexDirection: "row", justifyContent: "space-between", borderTopWidth: 0.75, borderTopColor: colors.line, paddingTop: 6 }}
      >
        <Text style={{ fontSize: 8.5, color: colors.spruce800, fontWeight: 600 }}>{pdfText(companyName)}</Text>
        <Text style={{ fontSize: 8.5, color: colors.muted }} render={({ pageNumber, totalPages }) => `Page ${pageNumber} of ${totalPages}`} />
      </View>
    </Page>
  );
}
