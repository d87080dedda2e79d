"use client";

import { useState } from "react";
import type { PriceBookItem } from "@/lib/data/price-book";
import { usePriceBook, type PriceBookResponse } from "@/lib/hooks/use-price-book";
import { AddItemForm } from "./add-item-form";
import { ItemRow } from "./item-row";

type Filter = "all" | "active" | "inactive";

/** The price book: a table of items (cards on a phone), edited in place by those allowed to. */
export function PriceBookScreen({ canEdit, initial }: { canEdit: boolean; initial: PriceBookResponse }) {
  const { data, error, mutate } = usePriceBook(initial);
  const [filter, setFilter] = useState<Filter>("all");
  const items = data?.items ?? [];
  const shown = items.filter((i) => filter === "all" || (filter === "active" ? i.active : !i.active));
  const inactiveCount = items.filter((i) => !i.active).length;

  // Put the saved item in the list at once, then fetch the list again to be sure it matches.
  const refresh = async (saved?: PriceBookItem) => {
    await mutate(
      (current) => {
        if (!saved || !current) return current;
        const others = current.items.filter((i) => i.id !== saved.id);
        return { items: [...others, saved].sort((a, b) => Number(b.active) - Number(a.active) || (a.code < b.code ? -1 : a.code > b.code ? 1 : 0)) };
      },
      { revalidate: true },
    );
  };

  return (
    <>
      <div className="mb-3 flex flex-wrap items-end justify-between gap-3">
        <p className="text-sm text-ink-muted" aria-live="polite" data-testid="price-book-count">
          {items.length} item{items.length === 1 ? "" : "s"}
          {inactiveCount ? `, ${inactiveCount} inactive` : ""}
        </p>
        <div>
          <label htmlFor="price-book-filter" className="field-label">
            Show
          </label>
          <select id="price-book-filter" className="field-input" value={filter} onChange={(e) => setFilter(e.target.value as Filter)}>
            <option value="all">All items</option>
            <option value="active">Active only</option>
            <option value="inactive">Inactive only</option>
          </select>
        </div>
      </div>
      {error ? (
        <p role="status" className="mb-3 rounded-md bg-danger-bg px-3 py-2 text-danger">
          {error.message} The list below may be out of date.
        </p>
      ) : null}

      <div className="md:overflow-x-auto md:rounded-lg md:border md:border-line md:bg-white">
        <table className="w-full text-left max-md:block" aria-labelledby="price-book-heading">
          <thead className="bg-paper-deep text-sm text-charcoal max-md:sr-only">
            <tr>
              <th scope="col" className="px-3 py-3">Code</th>
              <th scope="col" className="px-3 py-3">Name</th>
              <th scope="col" className="px-3 py-3">Kind</th>
              <th scope="col" className="px-3 py-3">Unit</th>
              <th scope="col" className="px-3 py-3 text-right">Unit price</th>
              <th scope="col" className="px-3 py-3">Taxable</th>
              <th scope="col" className="px-3 py-3">Status</th>
              {canEdit ? (
                <th scope="col" className="px-3 py-3 text-right">
                  <span className="sr-only">Actions</span>
                </th>
              ) : null}
            </tr>
          </thead>
          <tbody className="max-md:block" data-testid="price-book-rows">
            {shown.map((item) => (
              <ItemRow key={item.id} item={item} canEdit={canEdit} onChanged={refresh} />
            ))}
            {shown.length === 0 ? (
              <tr className="max-md:block">
                <td colSpan={canEdit ? 8 : 7} className="px-4 py-8 text-center text-ink-muted max-md:block">
                  {items.length === 0 ? (canEdit ? "No items yet. Add the first one below." : "No items yet.") : "No items match this filter."}
                </td>
              </tr>
            ) : null}
          </tbody>
        </table>
      </div>

      {canEdit ? (
        <div className="mt-8">
          <AddItemForm onAdded={(item) => refresh(item)} />
        </div>
      ) : null}
    </>
  );
}
