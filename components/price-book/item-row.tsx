"use client";

import { Fragment, useState } from "react";
import type { FieldErrors } from "@/lib/api/errors";
import type { PriceBookItem } from "@/lib/data/price-book";
import { sendJson } from "@/lib/hooks/fetcher";
import { formatDollars } from "@/lib/money";
import { priceBookKindLabels, priceBookPatchSchema, priceBookUnitLabels } from "@/lib/validation/price-book";
import { CheckboxInput, draftFrom, issuesToFields, kindOptions, problemFrom, SelectInput, TextInput, unitOptions, type ItemDraft } from "./draft";

// On a phone the table's rows become cards: a two-column grid with the code and status on top, the
// name across, then the figures each under its column name. On wider screens they are table rows.
const rowClass = "border-t border-line max-md:mb-3 max-md:grid max-md:grid-cols-2 max-md:gap-x-4 max-md:gap-y-2 max-md:rounded-lg max-md:border max-md:bg-white max-md:p-4 max-md:shadow-sm";
const cell = "px-3 py-3 max-md:p-0";
const labelled = `${cell} max-md:before:block max-md:before:text-sm max-md:before:font-semibold max-md:before:text-ink-muted max-md:before:content-[attr(data-label)]`;
const editCell = "px-2 py-2 align-top max-md:p-0";
const wide = "max-md:col-span-2";

const draftKeys = ["code", "name", "description", "kind", "unit", "unitPrice", "taxable"] as const;

/** The fields this person changed, relative to the item as it was when they began editing. */
function changesOf(draft: ItemDraft, base: ItemDraft): Partial<ItemDraft> {
  const out: Partial<ItemDraft> = {};
  for (const key of draftKeys) if (draft[key] !== base[key]) Object.assign(out, { [key]: draft[key] });
  return out;
}

type Props = { item: PriceBookItem; canEdit: boolean; onChanged: (item?: PriceBookItem) => void | Promise<void> };

export function ItemRow({ item, canEdit, onChanged }: Props) {
  const [editing, setEditing] = useState(false);
  const [base, setBase] = useState(item);
  const [draft, setDraft] = useState<ItemDraft>(() => draftFrom(item));
  const [errors, setErrors] = useState<FieldErrors>({});
  const [message, setMessage] = useState<{ text: string; ok: boolean } | undefined>();
  const [conflict, setConflict] = useState<PriceBookItem | undefined>();
  const [pending, setPending] = useState(false);
  const idp = `item-${item.id}`;
  const unitLabel = priceBookUnitLabels[item.unit];

  const set = <K extends keyof ItemDraft>(key: K) => (value: ItemDraft[K]) => setDraft((d) => ({ ...d, [key]: value }));

  function startEdit() {
    setBase(item);
    setDraft(draftFrom(item));
    setErrors({});
    setConflict(undefined);
    setMessage(undefined);
    setEditing(true);
  }

  function cancel() {
    setEditing(false);
    setErrors({});
    setConflict(undefined);
    setMessage(undefined);
  }

  async function save() {
    const changes = changesOf(draft, draftFrom(base));
    if (Object.keys(changes).length === 0) {
      cancel();
      return;
    }
    const checked = priceBookPatchSchema.safeParse(changes);
    if (!checked.success) {
      setErrors(issuesToFields(checked.error.issues));
      setMessage({ text: "Some fields need attention.", ok: false });
      return;
    }
    setPending(true);
    try {
      const { item: saved } = await sendJson<{ item: PriceBookItem }>(`/api/price-book/${item.id}`, "PATCH", { ...changes, updatedAt: base.updatedAt });
      setEditing(false);
      setErrors({});
      setConflict(undefined);
      setMessage({ text: `Saved ${saved.code}.`, ok: true });
      await onChanged(saved);
    } catch (err) {
      const problem = problemFrom(err);
      setErrors(problem.fields);
      setConflict(problem.status === 409 ? problem.current : undefined);
      setMessage({ text: problem.message, ok: false });
      if (problem.current) void onChanged();
    } finally {
      setPending(false);
    }
  }

  /** Keep this person's edits on top of the other person's version, and let them save again. */
  function keepMine() {
    if (!conflict) return;
    const mine = changesOf(draft, draftFrom(base));
    setBase(conflict);
    setDraft({ ...draftFrom(conflict), ...mine });
    setConflict(undefined);
    setMessage({ text: "Your edits now sit on top of the current version. Check them, then save.", ok: true });
  }

  function takeTheirs() {
    if (!conflict) return;
    setBase(conflict);
    setDraft(draftFrom(conflict));
    setConflict(undefined);
    setEditing(false);
    setMessage(undefined);
  }

  async function toggleActive() {
    setPending(true);
    setMessage(undefined);
    try {
      const { item: saved } = await sendJson<{ item: PriceBookItem }>(`/api/price-book/${item.id}`, "PATCH", { active: !item.active, updatedAt: item.updatedAt });
      setMessage({ text: saved.active ? `${saved.code} is active again.` : `${saved.code} is inactive: it stays on proposals that already use it, and is left out of new ones.`, ok: true });
      await onChanged(saved);
    } catch (err) {
      const problem = problemFrom(err);
      setMessage({ text: problem.status === 409 ? `${problem.message} The list now shows it as it is.` : problem.message, ok: false });
      if (problem.current) void onChanged();
    } finally {
      setPending(false);
    }
  }

  const messageRow =
    message || conflict ? (
      <tr className="max-md:mb-3 max-md:block" data-testid={`item-message-${item.code}`}>
        <td colSpan={canEdit ? 8 : 7} className="px-3 pb-3 max-md:block max-md:p-0">
          <div role="status" aria-live="polite" className={`rounded-md px-3 py-2 text-sm font-medium ${message?.ok ? "bg-spruce-50 text-spruce-800" : "bg-danger-bg text-danger"}`}>
            {message?.text}
            {conflict ? (
              <span className="mt-2 block font-normal text-charcoal">
                Now: <strong>{conflict.code}</strong>, {conflict.name}, {formatDollars(conflict.unitPriceCents)} per {priceBookUnitLabels[conflict.unit]}
                {conflict.active ? "" : " (inactive)"}. What you typed is still in the form.
                <span className="mt-2 flex flex-wrap gap-2">
                  <button type="button" className="btn-ghost" onClick={keepMine}>
                    Keep my edits
                  </button>
                  <button type="button" className="btn-ghost" onClick={takeTheirs}>
                    Use their version
                  </button>
                </span>
              </span>
            ) : null}
          </div>
        </td>
      </tr>
    ) : null;

  if (editing) {
    return (
      <Fragment>
        <tr className={`${rowClass} bg-ember-50/40 max-md:bg-ember-50`} data-testid={`item-${item.code}`}>
          <td className={`${editCell} max-md:order-1`}>
            <TextInput id={`${idp}-code`} name="code" label="Code" compact value={draft.code} onChange={set("code")} errors={errors.code} maxLength={40} className="md:min-w-28" />
          </td>
          <td className={`${editCell} ${wide} max-md:order-3`}>
            <div className="space-y-2 md:min-w-44">
              <TextInput id={`${idp}-name`} name="name" label="Name" compact value={draft.name} onChange={set("name")} errors={errors.name} maxLength={140} />
              <TextInput id={`${idp}-description`} name="description" label="Description" compact placeholder="Description (optional)" value={draft.description} onChange={set("description")} errors={errors.description} maxLength={520} />
            </div>
          </td>
          <td className={`${editCell} max-md:order-4`}>
            <SelectInput id={`${idp}-kind`} name="kind" label="Kind" compact value={draft.kind} onChange={set("kind")} errors={errors.kind} options={kindOptions} className="md:min-w-28" />
          </td>
          <td className={`${editCell} max-md:order-5`}>
            <SelectInput id={`${idp}-unit`} name="unit" label="Unit" compact value={draft.unit} onChange={set("unit")} errors={errors.unit} options={unitOptions} className="md:min-w-24" />
          </td>
          <td className={`${editCell} max-md:order-6`}>
            <TextInput id={`${idp}-unitPrice`} name="unitPrice" label="Unit price" compact prefix="$" inputMode="decimal" value={draft.unitPrice} onChange={set("unitPrice")} errors={errors.unitPrice} className="md:min-w-28" />
          </td>
          <td className={`${editCell} max-md:order-7 max-md:self-end`}>
            <CheckboxInput id={`${idp}-taxable`} name="taxable" label="Taxable" checked={draft.taxable} onChange={set("taxable")} errors={errors.taxable} />
          </td>
          <td className={`${editCell} pt-4 max-md:order-2 max-md:justify-self-end max-md:pt-0`}>
            <StatusBadge active={item.active} />
          </td>
          <td className={`${editCell} ${wide} max-md:order-8`}>
            <div className="flex gap-2 max-md:flex-wrap">
              <button type="button" className="btn-primary" onClick={save} disabled={pending}>
                {pending ? "Saving…" : "Save"}
              </button>
              <button type="button" className="btn-ghost" onClick={cancel} disabled={pending}>
                Cancel
              </button>
            </div>
          </td>
        </tr>
        {messageRow}
      </Fragment>
    );
  }

  return (
    <Fragment>
      <tr className={`${rowClass} md:align-middle ${item.active ? "" : "bg-paper text-ink-muted max-md:bg-paper"}`} data-testid={`item-${item.code}`}>
        <td className={`${cell} font-mono text-sm font-semibold whitespace-nowrap max-md:order-1 max-md:self-center`}>
          {item.code}
        </td>
        <td className={`${cell} ${wide} max-md:order-3`}>
          <span>
            <span className="block font-semibold text-charcoal">{item.name}</span>
            {item.description ? <span className="block text-sm text-ink-muted">{item.description}</span> : null}
          </span>
        </td>
        <td data-label="Kind" className={`${labelled} max-md:order-6`}>
          {priceBookKindLabels[item.kind]}
        </td>
        <td data-label="Unit" className={`${labelled} max-md:order-5`}>
          {unitLabel}
        </td>
        <td data-label="Unit price" className={`${labelled} tabular-nums max-md:order-4 max-md:text-lg max-md:font-semibold md:text-right`} data-testid="unit-price">
          {formatDollars(item.unitPriceCents)}
        </td>
        <td data-label="Taxable" className={`${labelled} max-md:order-7`}>
          {item.taxable ? "Yes" : "No"}
        </td>
        <td className={`${cell} max-md:order-2 max-md:justify-self-end`}>
          <StatusBadge active={item.active} />
        </td>
        {canEdit ? (
          <td className={`px-3 py-2 ${wide} max-md:order-8 max-md:p-0 max-md:pt-2`}>
            <div className="flex gap-2 max-md:flex-wrap md:justify-end">
              <button type="button" className="btn-ghost" onClick={startEdit} disabled={pending} aria-label={`Edit ${item.code}`}>
                Edit
              </button>
              <button type="button" className="btn-ghost" onClick={toggleActive} disabled={pending} aria-label={`${item.active ? "Deactivate" : "Reactivate"} ${item.code}`}>
                {item.active ? "Deactivate" : "Reactivate"}
              </button>
            </div>
          </td>
        ) : null}
      </tr>
      {messageRow}
    </Fragment>
  );
}

function StatusBadge({ active }: { active: boolean }) {
  return active ? (
    <span className="rounded-full bg-spruce-50 px-2 py-0.5 text-sm font-semibold whitespace-nowrap text-spruce-800">Active</span>
  ) : (
    <span className="rounded-full bg-paper-deep px-2 py-0.5 text-sm font-semibold whitespace-nowrap text-charcoal">Inactive</span>
  );
}
