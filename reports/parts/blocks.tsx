// Small building blocks: headings that never sit alone at a page foot, large figures, tables.
import type { ReactNode } from "react";
import { Text, View } from "@react-pdf/renderer";
import type { Style } from "@react-pdf/types";
import { colors, s } from "./theme";
import { pdfText } from "./text";

/**
 * A section heading. With `ahead`, it keeps at least that many points of its section on the same
 * page; inside a `wrap={false}` group (heading with its first block) leave it out.
 */
export function Heading({ children, ahead, level = 2 }: { children: string; ahead?: number; level?: 2 | 3 }) {
  return (
    <Text style={level === 2 ? s.h2 : s.h3} {...(ahead ? { minPresenceAhead: ahead } : {})}>
      {pdfText(children)}
    </Text>
  );
}

/** Plain paragraph; strings are made safe for the report fonts. */
type TextStyle = Style | Style[];

export function P({ children, style }: { children: ReactNode; style?: TextStyle }) {
  const extra = Array.isArray(style) ? style : style ? [style] : [];
  return <Text style={[s.p, ...extra]}>{typeof children === "string" ? pdfText(children) : children}</Text>;
}

/** A large figure with what it is, its unit and a line of detail. */
export function BigFigure({ label, value, unit, detail, tone = "spruce" }: { label: string; value: string; unit: string; detail?: string; tone?: "spruce" | "ember" }) {
  const fg = tone === "spruce" ? colors.spruce800 : colors.ember700;
  const bg = tone === "spruce" ? colors.spruce50 : colors.ember50;
  return (
    <View style={{ flex: 1, backgroundColor: bg, borderRadius: 6, paddingVertical: 12, paddingHorizontal: 12 }} wrap={false}>
      <Text style={{ fontSize: 9, fontWeight: 700, color: colors.muted, letterSpacing: 0.5 }}>{pdfText(label.toUpperCase())}</Text>
      <Text style={{ color: fg, marginTop: 4 }}>
        <Text style={{ fontFamily: s.display.fontFamily, fontWeight: 700, fontSize: 34, lineHeight: 1.1 }}>{pdfText(value)}</Text>
        {"\n"}
        <Text style={{ fontSize: 10.5, fontWeight: 600 }}>{pdfText(unit)}</Text>
      </Text>
      {detail ? <Text style={{ fontSize: 9, color: colors.charcoal, marginTop: 4 }}>{pdfText(detail)}</Text> : null}
    </View>
  );
}

export type Column = { title: string; width: number; align?: "left" | "right" };

/** A table: header row, body rows, optional footer row in bold. Rows never split across pages. */
export function Table({ columns, rows, foot, fontSize = 9.5 }: { columns: Column[]; rows: string[][]; foot?: string[]; fontSize?: number }) {
  const cell = (c: Column, i: number, text: string, bold = false) => (
    <Text key={i} style={{ width: `${c.width}%`, textAlign: c.align ?? "left", paddingVertical: 3.5, paddingHorizontal: 4, fontWeight: bold ? 700 : 400 }}>
      {pdfText(text)}
    </Text>
  );
  return (
    <>
      <View style={{ flexDirection: "row", borderBottomWidth: 1, borderBottomColor: colors.spruce700, color: colors.muted }} wrap={false}>
        {columns.map((c, i) => (
          <Text key={i} style={{ width: `${c.width}%`, textAlign: c.align ?? "left", paddingVertical: 3, paddingHorizontal: 4, fontWeight: 700, fontSize: fontSize - 1 }}>
            {pdfText(c.title)}
          </Text>
        ))}
      </View>
      {rows.map((r, ri) => (
        <View key={ri} wrap={false} style={{ flexDirection: "row", fontSize, borderBottomWidth: 0.5, borderBottomColor: colors.line, backgroundColor: ri % 2 ? colors.white : colors.paper }}>
          {columns.map((c, i) => cell(c, i, r[i] ?? ""))}
        </View>
      ))}
      {foot ? (
        <View wrap={false} style={{ flexDirection: "row", fontSize, borderTopWidth: 1, borderTopColor: colors.charcoal }}>
          {columns.map((c, i) => cell(c, i, foot[i] ?? "", true))}
        </View>
      ) : null}
    </>
  );
}

/** Label / value pairs in two columns. */
export function Facts({ items, labelWidth = 42 }: { items: [string, string][]; labelWidth?: number }) {
  return (
    <>
      {items.map(([k, v], i) => (
        <View key={i} style={{ flexDirection: "row", paddingVertical: 2, borderBottomWidth: 0.5, borderBottomColor: colors.line }} wrap={false}>
          <Text style={{ width: `${labelWidth}%`, color: colors.muted, paddingRight: 6 }}>{pdfText(k)}</Text>
          <Text style={{ width: `${100 - labelWidth}%` }}>{pdfText(v)}</Text>
        </View>
      ))}
    </>
  );
}
