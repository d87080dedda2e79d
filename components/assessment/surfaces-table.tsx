"use client";

import { flexRender, getCoreRowModel, useReactTable, type ColumnDef, type RowSelectionState } from "@tanstack/react-table";
import { Fragment, useMemo, useState } from "react";
import type { AssessmentSurface } from "@/lib/assessment/doc";
import { useAssessmentCtx } from "./context";
import { U_UNIT } from "./layer-stack/format";
import * as f from "./results/format";
import type { SurfaceFigures, surfaceTotals } from "./surface-edits";
import { AreaField, ExistingStackField, KindField, LabelField, OpeningsEditor, openingsSummary, OrientationField, ProposedField, SurfaceFiguresText } from "./surface-fields";

export type RowActions = { duplicate: (i: number) => void; remove: (i: number) => void };

type Meta = { className: string };
/** What the cells read that changes while typing. The column definitions themselves stay the same
 * objects (a new cell function would be a new component type, remounting the inputs and losing focus). */
type TableMeta = { figures: Map<string, SurfaceFigures> | null; open: Set<string>; toggleOpen: (id: string) => void; actions: RowActions; units: "ip" | "si" };
const metaOf = (t: { options: { meta?: unknown } }) => t.options.meta as TableMeta;

const th = "px-2 py-2 text-left align-bottom text-xs font-semibold uppercase tracking-wide text-ink-muted";

/** The surfaces as an editable grid (desktop): real inputs in every cell, one row per surface. */
export function SurfacesTable({
  selection,
  onSelection,
  figures,
  totals,
  actions,
}: {
  selection: RowSelectionState;
  onSelection: (next: RowSelectionState) => void;
  figures: Map<string, SurfaceFigures> | null;
  totals: ReturnType<typeof surfaceTotals>;
  actions: RowActions;
}) {
  const { doc, readOnly, units } = useAssessmentCtx();
  const [open, setOpen] = useState<Set<string>>(new Set());
  const toggleOpen = (id: string) => setOpen((o) => { const n = new Set(o); if (n.has(id)) n.delete(id); else n.add(id); return n; });

  const columns = useMemo(() => surfaceColumns(readOnly), [readOnly]);
  const meta: TableMeta = { figures, open, toggleOpen, actions, units };

  // eslint-disable-next-line react-hooks/incompatible-library -- TanStack Table re-renders on its own state; this component is not memoised
  const table = useReactTable({
    data: doc.surfaces,
    columns,
    getRowId: (s) => s.id,
    getCoreRowModel: getCoreRowModel(),
    enableRowSelection: !readOnly,
    state: { rowSelection: selection },
    onRowSelectionChange: (u) => onSelection(typeof u === "function" ? u(selection) : u),
    meta,
  });
  const colCount = table.getVisibleLeafColumns().length;
  const lead = readOnly ? 0 : 1;

  return (
    <div className="-mx-2 overflow-x-auto px-2 pb-1" data-testid="surface-table">
      <table className="w-full min-w-[60rem] border-collapse text-sm" data-testid="surface-list">
        <caption className="sr-only">Surfaces of the house: one row each, with its openings, layer stacks and heat loss</caption>
        <thead>
          {table.getHeaderGroups().map((g) => (
            <tr key={g.id} className="border-b border-line">
              {g.headers.map((h) => (
                <th key={h.id} scope="col" className={`${th} ${(h.column.columnDef.meta as Meta | undefined)?.className ?? ""}`}>
                  {h.isPlaceholder ? null : flexRender(h.column.columnDef.header, h.getContext())}
                </th>
              ))}
            </tr>
          ))}
        </thead>
        <tbody>
          {table.getRowModel().rows.map((row) => (
            <Fragment key={row.id}>
              <tr className={`border-b border-line/60 align-top ${row.getIsSelected() ? "bg-spruce-50" : ""}`} data-testid={`surface-${row.index}`} data-surface-id={row.id}>
                {row.getVisibleCells().map((c) => (
                  <td key={c.id} className={`px-2 py-1.5 ${c.column.id === "figures" ? "pt-2.5 text-right" : ""} ${c.column.id === "select" ? "pt-3.5" : ""}`}>
                    {flexRender(c.column.columnDef.cell, c.getContext())}
                  </td>
                ))}
              </tr>
              {open.has(row.id) ? (
                <tr id={`openings-${row.id}`} className="border-b border-line/60 bg-paper" data-testid={`surface-${row.index}-openings`}>
                  {lead ? <td /> : null}
                  <td colSpan={colCount - lead} className="px-2 py-3">
                    <div className="max-w-3xl"><OpeningsEditor index={row.index} compact /></div>
                  </td>
                </tr>
              ) : null}
            </Fragment>
          ))}
        </tbody>
        <tfoot>
          <tr className="border-t-2 border-line font-semibold" data-testid="surface-totals">
            {lead ? <td /> : null}
            <th scope="row" className="px-2 py-2 text-left" colSpan={3}>Totals, {totals.count} surfaces</th>
            <td className="px-2 py-2 tabular-nums">{f.num(totals.gross)} ft²</td>
            <td className="px-2 py-2 tabular-nums">{f.num(totals.openings)} ft²</td>
            <td className="px-2 py-2 font-normal text-ink-muted" colSpan={2}>net {f.num(totals.net)} ft²</td>
            <td className="px-2 py-2 text-right tabular-nums" data-testid="surface-totals-ua">
              {totals.ua ? (
                <>
                  <span className="block">UA {f.num(f.uaValue(totals.ua.before, units), 1)}</span>
                  <span className="block font-normal text-ink-muted">→ {f.num(f.uaValue(totals.ua.after, units), 1)}</span>
                </>
              ) : "—"}
            </td>
            {readOnly ? null : <td />}
          </tr>
        </tfoot>
      </table>
    </div>
  );
}

function surfaceColumns(readOnly: boolean): ColumnDef<AssessmentSurface>[] {
  const cols: ColumnDef<AssessmentSurface>[] = [
    { id: "label", header: "Label", meta: { className: "min-w-36" }, cell: ({ row }) => <LabelField i={row.index} compact /> },
    { id: "kind", header: "Kind", meta: { className: "w-28" }, cell: ({ row }) => <KindField i={row.index} compact /> },
    { id: "orientation", header: "Facing", meta: { className: "w-28" }, cell: ({ row }) => <OrientationField i={row.index} compact /> },
    { id: "area", header: "Gross ft²", meta: { className: "w-24" }, cell: ({ row }) => <AreaField i={row.index} compact /> },
    {
      id: "openings",
      header: "Openings",
      meta: { className: "w-28" },
      cell: ({ row, table }) => {
        const { open, toggleOpen } = metaOf(table);
        const s = row.original;
        const expanded = open.has(s.id);
        return (
          <button type="button" className="btn-ghost min-h-10 w-full justify-between px-2 py-1 text-sm" aria-expanded={expanded} aria-controls={`openings-${s.id}`} aria-label={`Windows and doors in “${s.name}”: ${openingsSummary(s)}`} onClick={() => toggleOpen(s.id)}>
            <span className="tabular-nums">{openingsSummary(s)}</span>
            <span aria-hidden="true">{expanded ? "▴" : "▾"}</span>
          </button>
        );
      },
    },
    { id: "existing", header: "Existing layer stack", meta: { className: "min-w-44" }, cell: ({ row }) => <ExistingStackField i={row.index} compact /> },
    { id: "proposed", header: "Proposed", meta: { className: "min-w-36" }, cell: ({ row }) => <ProposedField i={row.index} compact /> },
    { id: "figures", header: ({ table }) => <>U / UA<span className="block font-normal normal-case">{U_UNIT[metaOf(table).units]} · {f.uaUnit(metaOf(table).units)}</span></>, meta: { className: "w-36 text-right" }, cell: ({ row, table }) => <SurfaceFiguresText figures={metaOf(table).figures?.get(row.original.id)} compact /> },
  ];
  if (readOnly) return cols;
  return [
    {
      id: "select",
      header: ({ table }) => (
        <input type="checkbox" className="h-5 w-5" aria-label="Select every surface" checked={table.getIsAllRowsSelected()} ref={(el) => { if (el) el.indeterminate = table.getIsSomeRowsSelected(); }} onChange={table.getToggleAllRowsSelectedHandler()} />
      ),
      meta: { className: "w-10" },
      cell: ({ row }) => <input type="checkbox" className="h-5 w-5" aria-label={`Select “${row.original.name}”`} checked={row.getIsSelected()} onChange={row.getToggleSelectedHandler()} />,
    },
    ...cols,
    {
      id: "actions",
      header: () => <span className="sr-only">Row actions</span>,
      meta: { className: "w-40" },
      cell: ({ row, table }) => (
        <div className="flex gap-1">
          <button type="button" className="btn-ghost min-h-10 px-2 py-1 text-sm" aria-label={`Duplicate “${row.original.name}”`} onClick={() => metaOf(table).actions.duplicate(row.index)}>Duplicate</button>
          <button type="button" className="btn-ghost min-h-10 px-2 py-1 text-sm text-danger" aria-label={`Delete “${row.original.name}”`} onClick={() => metaOf(table).actions.remove(row.index)}>Delete</button>
        </div>
      ),
    },
  ];
}

