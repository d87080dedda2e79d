"use client";

import { memo, useMemo } from "react";
import { Bar, BarChart, CartesianGrid, Legend, Tooltip, XAxis, YAxis } from "recharts";
import { num } from "./format";

export type HeatLossRow = { component: string; before: number; after: number };

// Palette (app/globals.css): ember-600 for the house as found, spruce-700 after the plan.
const BEFORE = "#b9521e";
const AFTER = "#1f5444";
const INK = "#4b5157";

// Props that never change are module constants, and the chart's parts are made once per unit
// system: recharts re-registers an axis, bar or legend in its store every time that element
// re-renders, so on a keystroke only the data should reach it.
const MARGIN = { top: 4, right: 12, bottom: 4, left: 4 };
const TICK = { fill: INK, fontSize: 12 };
const LEGEND_STYLE = { fontSize: 13, color: INK };

const sameRows = (a: HeatLossRow[], b: HeatLossRow[]) =>
  a === b || (a.length === b.length && a.every((r, i) => r.component === b[i]!.component && r.before === b[i]!.before && r.after === b[i]!.after));

/** Horizontal bars (they fit a narrow column): heat loss by component, before and after. */
function HeatLossChart({ rows, unit, digits }: { rows: HeatLossRow[]; unit: string; digits: number }) {
  const parts = useMemo(() => {
    const value = (v: unknown) => `${num(Number(v), digits)} ${unit}`;
    return [
      <CartesianGrid key="grid" horizontal={false} stroke="#ddd5c8" />,
      <XAxis key="x" type="number" tick={TICK} tickFormatter={(v: number) => num(v, digits)} />,
      <YAxis key="y" type="category" dataKey="component" width={84} tick={TICK} />,
      <Tooltip key="tip" formatter={value} />,
      <Legend key="legend" itemSorter={null} wrapperStyle={LEGEND_STYLE} />,
      <Bar key="before" dataKey="before" name="Before" fill={BEFORE} isAnimationActive={false} />,
      <Bar key="after" dataKey="after" name="After" fill={AFTER} isAnimationActive={false} />,
    ];
  }, [unit, digits]);
  const style = useMemo(() => ({ width: "100%", height: 56 + rows.length * 44 }), [rows.length]);
  return (
    <BarChart layout="vertical" data={rows} responsive style={style} margin={MARGIN} barGap={2}>
      {parts}
    </BarChart>
  );
}

// Same figures (a price or a name changed, not the heat loss): the chart is left as it is.
export default memo(HeatLossChart, (a, b) => a.unit === b.unit && a.digits === b.digits && sameRows(a.rows, b.rows));
