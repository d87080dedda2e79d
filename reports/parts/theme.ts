// The report palette (the same values as app/globals.css) and the shared styles.
import { StyleSheet } from "@react-pdf/renderer";
import { BODY, DISPLAY } from "./fonts";

export const colors = {
  paper: "#faf7f2",
  paperDeep: "#f1ebe1",
  charcoal: "#24272a",
  muted: "#4b5157",
  line: "#ddd5c8",
  spruce50: "#eef5f1",
  spruce100: "#d5e7dd",
  spruce500: "#3d7f69",
  spruce700: "#1f5444",
  spruce800: "#173f33",
  spruce900: "#10302a",
  ember50: "#fdf3ec",
  ember100: "#fbe6d8",
  ember500: "#d9692f",
  ember600: "#b9521e",
  ember700: "#96411a",
  warn: "#8a5300",
  warnBg: "#fff4dc",
  white: "#ffffff",
} as const;

/** Before (as found) in ember, after (the plan) in spruce: the same pairing as the screen's charts. */
export const BEFORE = colors.ember600;
export const AFTER = colors.spruce700;

export const PAGE_PAD_X = 48;

export const s = StyleSheet.create({
  page: { fontFamily: BODY, fontSize: 10, lineHeight: 1.4, color: colors.charcoal, backgroundColor: colors.white, paddingTop: 44, paddingBottom: 64, paddingHorizontal: PAGE_PAD_X },
  display: { fontFamily: DISPLAY, fontWeight: 600 },
  h1: { fontFamily: DISPLAY, fontWeight: 700, fontSize: 26, lineHeight: 1.15, color: colors.spruce800 },
  h2: { fontFamily: DISPLAY, fontWeight: 600, fontSize: 16, lineHeight: 1.2, color: colors.spruce800, marginTop: 14, marginBottom: 6 },
  h3: { fontWeight: 700, fontSize: 11, color: colors.charcoal, marginTop: 8, marginBottom: 3 },
  p: { marginBottom: 5 },
  muted: { color: colors.muted },
  small: { fontSize: 8.5, color: colors.muted },
  bold: { fontWeight: 700 },
  semibold: { fontWeight: 600 },
  italic: { fontStyle: "italic" },
  row: { flexDirection: "row" },
  card: { borderRadius: 4, padding: 10, backgroundColor: colors.paper },
  rule: { borderBottomWidth: 0.75, borderBottomColor: colors.line },
});
