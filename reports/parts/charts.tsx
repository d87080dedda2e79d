// Vector charts for the PDF, drawn with React-PDF's own Svg primitives (recharts needs a DOM).
// Each chart takes plain numbers and draws its labels in the report's body face.
import type { ComponentType, ReactNode } from "react";
import { Line, Path, Polyline, Rect, Svg, Text, Tspan, View } from "@react-pdf/renderer";
import { BODY } from "./fonts";
import { AFTER, BEFORE, colors } from "./theme";
import { pdfText } from "./text";

// React-PDF reads fontFamily/fontSize/fontWeight from an Svg Text's props; its types omit them.
type SvgTextProps = {
  x: number; y: number; fill?: string; textAnchor?: "start" | "middle" | "end";
  fontFamily?: string; fontSize?: number; fontWeight?: number; children: ReactNode;
};
const SvgTextBase = Text as unknown as ComponentType<SvgTextProps>;
function Label({ children, size = 8, weight = 400, ...p }: Omit<SvgTextProps, "children" | "fontSize" | "fontWeight" | "fontFamily"> & { children: string; size?: number; weight?: number }) {
  return <SvgTextBase fontFamily={BODY} fontSize={size} fontWeight={weight} fill={p.fill ?? colors.muted} {...p}>{pdfText(children)}</SvgTextBase>;
}

type Anchor = "start" | "middle" | "end";
const TspanBase = Tspan as unknown as ComponentType<{ x: number; y: number; textAnchor: Anchor; children: string }>;
/**
 * Labels that share a size, weight, colour and anchor (an axis's ticks, a series' values): one
 * text element with a positioned span per label, drawn as separate labels would be.
 */
function Labels({ items, size = 8, weight = 400, fill = colors.muted, anchor = "start" }: { items: { x: number; y: number; text: string }[]; size?: number; weight?: number; fill?: string; anchor?: Anchor }) {
  if (items.length === 0) return null;
  return (
    <SvgTextBase fontFamily={BODY} fontSize={size} fontWeight={weight} fill={fill} x={items[0].x} y={items[0].y} textAnchor={anchor}>
      {items.map((l, i) => <TspanBase key={i} x={l.x} y={l.y} textAnchor={anchor}>{pdfText(l.text)}</TspanBase>)}
    </SvgTextBase>
  );
}

/** A round step for an axis: 1, 2 or 5 × 10^n, giving about `count` ticks up to `max`. */
export function niceStep(max: number, count = 5): number {
  if (!(max > 0)) return 1;
  const raw = max / count;
  const mag = 10 ** Math.floor(Math.log10(raw));
  const r = raw / mag;
  return (r <= 1 ? 1 : r <= 2 ? 2 : r <= 2.5 ? 2.5 : r <= 5 ? 5 : 10) * mag;
}
/** A rectangle as a closed subpath, so several same-coloured ones draw as one path. */
const rectPath = (x: number, y: number, w: number, h: number) => `M${x} ${y}H${x + w}V${y + h}H${x}Z`;

const ticks = (max: number, count = 5) => {
  const step = niceStep(max, count);
  const top = Math.ceil(max / step) * step;
  const out: number[] = [];
  for (let v = 0; v <= top + step / 2; v += step) out.push(v);
  return out;
};

function Legend({ items }: { items: [string, string][] }) {
  return (
    <View style={{ flexDirection: "row", alignItems: "center", marginTop: 4 }}>
      {items.map(([label, color]) => [
        <View key={`${label}-key`} style={{ width: 9, height: 9, marginRight: 4, backgroundColor: color, borderRadius: 1.5 }} />,
        <Text key={label} style={{ fontSize: 8.5, marginRight: 12, color: colors.charcoal }}>{pdfText(label)}</Text>,
      ])}
    </View>
  );
}

export function ChartFrame({ title, caption, children, legend, width }: { title: string; caption?: string; children: ReactNode; legend?: [string, string][]; width?: number }) {
  return (
    <View wrap={false} style={width === undefined ? { marginBottom: 12 } : { marginBottom: 12, width }}>
      <Text style={{ fontWeight: 700, fontSize: 10.5, color: colors.charcoal, marginBottom: 4 }}>{pdfText(title)}</Text>
      {children}
      {legend ? <Legend items={legend} /> : null}
      {caption ? <Text style={{ fontSize: 8, color: colors.muted, marginTop: 3 }}>{pdfText(caption)}</Text> : null}
    </View>
  );
}

export type PairRow = { label: string; before: number; after: number };

/** Horizontal paired bars (before in ember, after in spruce) with values at the bar ends. */
export function PairedBars({ rows, width, format, labelWidth = 74 }: { rows: PairRow[]; width: number; format: (v: number) => string; labelWidth?: number }) {
  const bar = 8;
  const gap = 1.5;
  const rowH = bar * 2 + gap + 8;
  const valueRoom = 58;
  const plotW = width - labelWidth - valueRoom;
  const max = Math.max(1, ...rows.flatMap((r) => [r.before, r.after]));
  const axis = ticks(max, 5);
  const scaleMax = axis[axis.length - 1];
  const x = (v: number) => labelWidth + (Math.max(0, v) / scaleMax) * plotW;
  const height = rows.length * rowH + 16;
  // Same-styled shapes share one path (gridlines, then each series' bars), drawn in the order
  // the chart layers them: grid under bars, the value axis over them.
  const grid = axis.map((t) => `M${x(t)} 0V${height - 14}`).join("");
  const bars = (v: (r: PairRow) => number, dy: number) => rows.map((r, i) => rectPath(labelWidth, i * rowH + 4 + dy, Math.max(0.5, x(v(r)) - labelWidth), bar)).join("");
  return (
    <Svg width={width} height={height} viewBox={`0 0 ${width} ${height}`}>
      <Path d={grid} stroke={colors.line} strokeWidth={0.5} />
      <Labels items={axis.map((t) => ({ x: x(t), y: height - 4, text: format(t) }))} anchor="middle" size={7} />
      <Path d={bars((r) => r.before, 0)} fill={BEFORE} />
      <Path d={bars((r) => r.after, bar + gap)} fill={AFTER} />
      <Labels items={rows.map((r, i) => ({ x: labelWidth - 6, y: i * rowH + 4 + bar + 3, text: r.label }))} anchor="end" size={8.5} fill={colors.charcoal} />
      <Labels items={rows.map((r, i) => ({ x: x(r.before) + 3, y: i * rowH + 4 + bar - 1.5, text: format(r.before) }))} size={7.5} />
      <Labels items={rows.map((r, i) => ({ x: x(r.after) + 3, y: i * rowH + 4 + 2 * bar + gap - 1.5, text: format(r.after) }))} size={7.5} fill={colors.spruce800} weight={600} />
      <Line x1={labelWidth} y1={0} x2={labelWidth} y2={height - 14} stroke={colors.charcoal} strokeWidth={0.75} />
    </Svg>
  );
}

export type Column = { label: string; value: number; tone: "before" | "after" | "step" };

/** Vertical columns with the value above each and a (short) label below. */
export function Columns({ columns, width, height = 150, format }: { columns: Column[]; width: number; height?: number; format: (v: number) => string }) {
  const top = 16;
  const bottom = 28;
  const plotH = height - top - bottom;
  const max = Math.max(1, ...columns.map((c) => c.value));
  const slot = width / columns.length;
  const barW = Math.min(46, slot * 0.6);
  const fill = (t: Column["tone"]) => (t === "before" ? BEFORE : t === "after" ? AFTER : colors.spruce500);
  const geometry = columns.map((c, i) => {
    const h = (Math.max(0, c.value) / max) * plotH;
    const cx = slot * i + slot / 2;
    const words = c.label.split(" ");
    const half = Math.ceil(words.length / 2);
    const lines = c.label.length > 14 && words.length > 1 ? [words.slice(0, half).join(" "), words.slice(half).join(" ")] : [c.label];
    return { c, h, cx, lines };
  });
  // One path per fill: columns never overlap, so this draws what a rect per column would.
  const tones = [...new Set(columns.map((c) => c.tone))];
  return (
    <Svg width={width} height={height} viewBox={`0 0 ${width} ${height}`}>
      <Line x1={0} y1={top + plotH} x2={width} y2={top + plotH} stroke={colors.charcoal} strokeWidth={0.75} />
      {tones.map((tone) => (
        <Path key={tone} d={geometry.filter((g) => g.c.tone === tone).map((g) => rectPath(g.cx - barW / 2, top + plotH - g.h, barW, Math.max(0.5, g.h))).join("")} fill={fill(tone)} />
      ))}
      {[colors.ember700, colors.spruce800].map((color) => (
        <Labels
          key={color}
          items={geometry.filter(({ c }) => (c.tone === "before" ? colors.ember700 : colors.spruce800) === color).map(({ c, h, cx }) => ({ x: cx, y: top + plotH - h - 4, text: format(c.value) }))}
          anchor="middle"
          size={8.5}
          weight={700}
          fill={color}
        />
      ))}
      <Labels items={geometry.flatMap(({ cx, lines }) => lines.map((l, li) => ({ x: cx, y: top + plotH + 11 + li * 9, text: l })))} anchor="middle" size={7.5} fill={colors.charcoal} />
    </Svg>
  );
}

/** Cumulative savings (a rising line) against the plan's cost (a level line), year by year. */
export function CumulativeChart({ points, cost, width, height = 170, format }: { points: number[]; cost: number; width: number; height?: number; format: (v: number) => string }) {
  const left = 46;
  const right = 8;
  const top = 8;
  const bottom = 22;
  const plotW = width - left - right;
  const plotH = height - top - bottom;
  const yearsN = Math.max(1, points.length - 1);
  const axis = ticks(Math.max(cost, ...points), 5);
  const yMax = axis[axis.length - 1];
  const x = (yr: number) => left + (yr / yearsN) * plotW;
  const y = (v: number) => top + plotH - (Math.max(0, v) / yMax) * plotH;
  const yearStep = yearsN > 20 ? 5 : yearsN > 10 ? 2 : 1;
  const yearTicks: number[] = [];
  for (let t = 0; t <= yearsN; t += yearStep) yearTicks.push(t);
  const cross = points.findIndex((v) => v >= cost && cost > 0);
  return (
    <Svg width={width} height={height} viewBox={`0 0 ${width} ${height}`}>
      <Path d={axis.map((t) => `M${left} ${y(t)}H${left + plotW}`).join("")} stroke={colors.line} strokeWidth={0.5} />
      <Labels items={axis.map((t) => ({ x: left - 4, y: y(t) + 2.5, text: format(t) }))} anchor="end" size={7} />
      <Labels items={yearTicks.map((t) => ({ x: x(t), y: top + plotH + 10, text: String(t) }))} anchor="middle" size={7} />
      <Label x={left + plotW} y={height - 2} textAnchor="end" size={7}>years after the work</Label>
      <Line x1={left} y1={top + plotH} x2={left + plotW} y2={top + plotH} stroke={colors.charcoal} strokeWidth={0.75} />
      <Line x1={left} y1={y(cost)} x2={left + plotW} y2={y(cost)} stroke={BEFORE} strokeWidth={1.5} strokeDasharray="4 3" />
      <Polyline points={points.map((v, i) => `${x(i)},${y(v)}`).join(" ")} stroke={AFTER} strokeWidth={2} fill="none" />
      {cross > 0 ? <Line x1={x(cross)} y1={y(cost)} x2={x(cross)} y2={top + plotH} stroke={colors.muted} strokeWidth={0.5} strokeDasharray="2 2" /> : null}
      {cross > 0 ? <Rect x={x(cross) - 2.5} y={y(points[cross]) - 2.5} width={5} height={5} fill={colors.spruce900} /> : null}
    </Svg>
  );
}
