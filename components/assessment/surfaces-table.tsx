"use client";

import { flexRender, getCoreRowModel, useReactTable, type ColumnDef, type RowSelectionState } from "@tanstack/react-table";
import { memo, useMemo, useState } from "react";
import type { Row } from "@tanstack/react-table";
import type { AssessmentDoc, AssessmentSurface } from "@/lib/assessment/doc";
import { AssessmentProvider, useAssessmentCtx, type AssessmentCtx } from "./context";
import { U_UNIT } from "./layer-stack/format";
import * as f from "./results/format";
import type { SurfaceFigures, surfaceTotals } from "./surface-edits";
import { AreaField, ExistingStackField, KindField, LabelField, OpeningsEditor, openingsSummary, OrientationField, ProposedField, SurfaceFiguresText } from "./surface-fields";

export type RowActions = { duplicate: (i: number) => void; remove: (i: number) => void };

/** Column widths in rem (a fixed layout, so every input keeps a usable width); sticky columns stay in view while the table scrolls sideways. */
type Meta = { className: string; width: number };
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
  const ctx = useAssessmentCtx();
  const { doc, readOnly, units } = ctx;
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
  const issueSig = rowIssueSignatures(ctx.issues, ctx.warnings);
  const width = table.getVisibleLeafColumns().reduce((a, c) => a + (c.columnDef.meta as Meta).width, 0);

  return (
    <>
    <p className="text-sm text-ink-muted">One row per surface; the table scrolls sideways to its layer stacks, U and UA, with the label kept in view.</p>
    <div className="overflow-x-auto pb-1 [contain:content]" data-testid="surface-table">
      <table className="w-full table-fixed border-collapse text-sm" style={{ minWidth: `${width}rem` }} data-testid="surface-list">
        <caption className="sr-only">Surfaces of the house: one row each, with its openings, layer stacks and heat loss</caption>
        <colgroup>
          {table.getVisibleLeafColumns().map((c) => <col key={c.id} style={{ width: `${(c.columnDef.meta as Meta).width}rem` }} />)}
        </colgroup>
        <thead>
          {table.getHeaderGroups().map((g) => (
            <tr key={g.id} className="border-b border-line">
              {g.headers.map((h) => (
                <th key={h.id} scope="col" className={`${th} bg-white ${(h.column.columnDef.meta as Meta | undefined)?.className ?? ""}`}>
                  {h.isPlaceholder ? null : flexRender(h.column.columnDef.header, h.getContext())}
                </th>
              ))}
            </tr>
          ))}
        </thead>
        <tbody>
          {table.getRowModel().rows.map((row) => (
            <SurfaceRow
              key={row.id}
              row={row}
              ctx={ctx}
              surface={row.original}
              index={row.index}
              selected={row.getIsSelected()}
              expanded={open.has(row.id)}
              figures={figures?.get(row.id)}
              issueSig={issueSig.get(row.index) ?? ""}
              assemblies={doc.assemblies}
              upgrades={doc.upgrades}
              units={units}
              readOnly={readOnly}
              colCount={colCount}
            />
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
    </>
  );
}

function surfaceColumns(readOnly: boolean): ColumnDef<AssessmentSurface>[] {
  const cols: ColumnDef<AssessmentSurface>[] = [
    { id: "label", header: "Label", meta: { className: `sticky ${readOnly ? "left-0" : "left-10"} z-10`, width: 10.5 }, cell: ({ row }) => <LabelField i={row.index} compact /> },
    { id: "kind", header: "Kind", meta: { className: "", width: 6.75 }, cell: ({ row }) => <KindField i={row.index} compact /> },
    { id: "orientation", header: "Facing", meta: { className: "", width: 7.5 }, cell: ({ row }) => <OrientationField i={row.index} compact /> },
    { id: "area", header: "Gross ft²", meta: { className: "", width: 6 }, cell: ({ row }) => <AreaField i={row.index} compact /> },
    {
      id: "openings",
      header: "Openings",
      meta: { className: "", width: 7 },
      cell: ({ row, table }) => {
        const { open, toggleOpen } = metaOf(table);
        const s = row.original;
        const expanded = open.has(s.id);
        return (
          <button type="button" className="btn-ghost min-h-10 w-full justify-between gap-1 whitespace-nowrap px-2 py-1 text-sm" aria-expanded={expanded} aria-controls={`openings-${s.id}`} aria-label={`Windows and doors in “${s.name}”: ${openingsSummary(s)}`} onClick={() => toggleOpen(s.id)}>
            <span className="tabular-nums">{openingsSummary(s)}</span>
            <span aria-hidden="true">{expanded ? "▴" : "▾"}</span>
          </button>
        );
      },
    },
    { id: "existing", header: "Existing layer stack", meta: { className: "", width: 13 }, cell: ({ row }) => <ExistingStackField i={row.index} compact /> },
    { id: "proposed", header: "Proposed", meta: { className: "", width: 10 }, cell: ({ row }) => <ProposedField i={row.index} compact /> },
    { id: "figures", header: ({ table }) => <>U / UA<span className="block font-normal normal-case">{U_UNIT[metaOf(table).units]} · {f.uaUnit(metaOf(table).units)}</span></>, meta: { className: "text-right", width: 9 }, cell: ({ row, table }) => <SurfaceFiguresText figures={metaOf(table).figures?.get(row.original.id)} compact /> },
  ];
  if (readOnly) return cols;
  return [
    {
      id: "select",
      header: ({ table }) => (
        <input type="checkbox" className="h-5 w-5" aria-label="Select every surface" checked={table.getIsAllRowsSelected()} ref={(el) => { if (el) el.indeterminate = table.getIsSomeRowsSelected(); }} onChange={table.getToggleAllRowsSelectedHandler()} />
      ),
      meta: { className: "sticky left-0 z-10", width: 2.5 },
      cell: ({ row }) => <input type="checkbox" className="h-5 w-5" aria-label={`Select “${row.original.name}”`} checked={row.getIsSelected()} onChange={row.getToggleSelectedHandler()} />,
    },
    ...cols,
    {
      id: "actions",
      header: () => <span className="sr-only">Row actions</span>,
      meta: { className: "", width: 10.5 },
      cell: ({ row, table }) => (
        <div className="flex gap-1">
          <button type="button" className="btn-ghost min-h-10 px-2 py-1 text-sm" aria-label={`Duplicate “${row.original.name}”`} onClick={() => metaOf(table).actions.duplicate(row.index)}>Duplicate</button>
          <button type="button" className="btn-ghost min-h-10 px-2 py-1 text-sm text-danger" aria-label={`Delete “${row.original.name}”`} onClick={() => metaOf(table).actions.remove(row.index)}>Delete</button>
        </div>
      ),
    },
  ];
}


/** Per row index, a string of the reasons and warnings whose path is inside that surface. */
function rowIssueSignatures(issues: Map<string, string[]>, warnings: Map<string, string[]>): Map<number, string> {
  const out = new Map<number, string>();
  for (const [tag, m] of [["e", issues], ["w", warnings]] as const) {
    for (const [path, msgs] of m) {
      const hit = /^surfaces\.(\d+)\./.exec(path);
      if (!hit) continue;
      const i = Number(hit[1]);
      out.set(i, `${out.get(i) ?? ""}|${tag}:${path}=${msgs.join("¦")}`);
    }
  }
  return out;
}

type RowProps = {
  row: Row<AssessmentSurface>;
  ctx: AssessmentCtx;
  surface: AssessmentSurface;
  index: number;
  selected: boolean;
  expanded: boolean;
  figures: SurfaceFigures | undefined;
  issueSig: string;
  assemblies: AssessmentDoc["assemblies"];
  upgrades: AssessmentDoc["upgrades"];
  units: "ip" | "si";
  readOnly: boolean;
  colCount: number;
};

/** The label (and the selection box before it) stay in view while the table scrolls sideways. */
const sticky = (id: string, readOnly: boolean) => (id === "select" ? "sticky left-0 z-10" : id === "label" ? `sticky ${readOnly ? "left-0" : "left-10"} z-10 shadow-[1px_0_0_var(--color-line)]` : "");

const sameFigures = (a: SurfaceFigures | undefined, b: SurfaceFigures | undefined) =>
  a === b || (!!a && !!b && a.uBefore === b.uBefore && a.uAfter === b.uAfter && a.uaBefore === b.uaBefore && a.uaAfter === b.uaAfter);

/**
 * One surface's row. A keystroke in one row re-renders that row only: the row gives its cells
 * their own provider, whose value changes only when something the row shows has changed (its
 * surface, its reasons, its figures, the stacks and upgrades it lists, selection, units).
 */
const SurfaceRow = memo(
  function SurfaceRow({ row, ctx, surface, index, selected, expanded, colCount, readOnly }: RowProps) {
    const lead = readOnly ? 0 : 1;
    return (
      <AssessmentProvider value={ctx}>
        <tr className="border-b border-line/60 align-top" data-testid={`surface-${index}`} data-surface-id={surface.id}>
          {row.getVisibleCells().map((c) => (
            <td key={c.id} className={`px-2 py-1.5 ${c.column.id === "figures" ? "pt-2.5 text-right" : ""} ${c.column.id === "select" ? "pt-3.5" : ""} ${sticky(c.column.id, readOnly)} ${selected ? "bg-spruce-50" : "bg-white"}`}>
              {flexRender(c.column.columnDef.cell, c.getContext())}
            </td>
          ))}
        </tr>
        {expanded ? (
          <tr id={`openings-${surface.id}`} className="border-b border-line/60 bg-paper" data-testid={`surface-${index}-openings`}>
            {lead ? <td /> : null}
            <td colSpan={colCount - lead} className="px-2 py-3">
              <div className="max-w-3xl"><OpeningsEditor index={index} compact /></div>
            </td>
          </tr>
        ) : null}
      </AssessmentProvider>
    );
  },
  (a, b) =>
    a.surface === b.surface && a.index === b.index && a.selected === b.selected && a.expanded === b.expanded && a.issueSig === b.issueSig &&
    sameFigures(a.figures, b.figures) && a.assemblies === b.assemblies && a.upgrades === b.upgrades && a.units === b.units && a.readOnly === b.readOnly &&
    a.colCount === b.colCount && a.ctx.update === b.ctx.update,
);
