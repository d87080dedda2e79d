"use client";

import { Bar, BarChart, CartesianGrid, Legend, Tooltip, XAxis, YAxis } from "recharts";
import { num } from "./format";

export type HeatLossRow = { component: string; before: number; after: number };

// Palette (app/globals.css): ember-600 for the house as found, spruce-700 after the plan.
const BEFORE = "#b9521e";
const AFTER = "#1f5444";
const INK = "#4b5157";

/** Horizontal bars (they fit a narrow column): heat loss by component, before and after. */
export default function HeatLossChart({ rows, unit, digits }: { rows: HeatLossRow[]; unit: string; digits: number }) {
  const value = (v: unknown) => `${num(Number(v), digits)} ${unit}`;
  return (
    <BarChart
      layout="vertical"
      data={rows}
      responsive
      style={{ width: "100%", height: 56 + rows.length * 44 }}
      margin={{ top: 4, right: 12, bottom: 4, left: 4 }}
      barGap={2}
    >
      <CartesianGrid horizontal={false} stroke="#ddd5c8" />
      <XAxis type="number" tick={{ fill: INK, fontSize: 12 }} tickFormatter={(v: number) => num(v, digits)} />
      <YAxis type="category" dataKey="component" width={84} tick={{ fill: INK, fontSize: 12 }} />
      <Tooltip formatter={value} />
      <Legend itemSorter={null} wrapperStyle={{ fontSize: 13, color: INK }} />
      <Bar dataKey="before" name="Before" fill={BEFORE} isAnimationActive={false} />
      <Bar dataKey="after" name="After" fill={AFTER} isAnimationActive={false} />
    </BarChart>
  );
}
