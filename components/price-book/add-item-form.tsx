"use client";

import { useState, type FormEvent } from "react";
import { FormMessage } from "@/components/forms/field";
import type { FieldErrors } from "@/lib/api/errors";
import type { PriceBookItem } from "@/lib/data/price-book";
import { sendJson } from "@/lib/hooks/fetcher";
import { formatDollars } from "@/lib/money";
import { newPriceBookItemSchema, priceBookUnitLabels } from "@/lib/validation/price-book";
import { CheckboxInput, emptyDraft, issuesToFields, kindOptions, problemFrom, SelectInput, TextInput, unitOptions, type ItemDraft } from "./draft";

/**
 * Adds an item. The same zod schema as the API checks the draft first, so reasons appear beside
 * each field at once; the API checks again (and alone knows about duplicate codes). Whatever was
 * typed stays in the form until the item is saved.
 */
export function AddItemForm({ onAdded }: { onAdded: (item: PriceBookItem) => void | Promise<void> }) {
  const [draft, setDraft] = useState<ItemDraft>(emptyDraft);
  const [errors, setErrors] = useState<FieldErrors>({});
  const [message, setMessage] = useState<{ text: string; ok: boolean } | undefined>();
  const [pending, setPending] = useState(false);

  const set = <K extends keyof ItemDraft>(key: K) => (value: ItemDraft[K]) => setDraft((d) => ({ ...d, [key]: value }));

  async function submit(e: FormEvent<HTMLFormElement>) {
    e.preventDefault();
    const checked = newPriceBookItemSchema.safeParse(draft);
    if (!checked.success) {
      setErrors(issuesToFields(checked.error.issues));
      setMessage({ text: "Some fields need attention.", ok: false });
      return;
    }
    setPending(true);
    try {
      const { item } = await sendJson<{ item: PriceBookItem }>("/api/price-book", "POST", draft);
      setDraft(emptyDraft);
      setErrors({});
      setMessage({ text: `Added ${item.code}, ${item.name}, at ${formatDollars(item.unitPriceCents)} per ${priceBookUnitLabels[item.unit]}.`, ok: true });
      await onAdded(item);
    } catch (err) {
      const problem = problemFrom(err);
      setErrors(problem.fields);
      setMessage({ text: problem.message, ok: false });
    } finally {
      setPending(false);
    }
  }

  return (
    <form id="add-item" onSubmit={submit} noValidate className="card space-y-4" aria-labelledby="add-item-heading" data-testid="add-item-form">
      <h2 id="add-item-heading" className="text-xl font-semibold text-spruce-800">
        Add an item
      </h2>
      <FormMessage message={message?.text} ok={message?.ok} />
      <div className="grid gap-4 sm:grid-cols-2 lg:grid-cols-3">
        <TextInput id="new-code" name="code" label="Code" value={draft.code} onChange={set("code")} errors={errors.code} placeholder="e.g. CEL-BAG" maxLength={40} />
        <TextInput id="new-name" name="name" label="Name" value={draft.name} onChange={set("name")} errors={errors.name} className="lg:col-span-2" maxLength={140} />
        <SelectInput id="new-kind" name="kind" label="Kind" value={draft.kind} onChange={set("kind")} errors={errors.kind} options={kindOptions} />
        <SelectInput id="new-unit" name="unit" label="Unit" value={draft.unit} onChange={set("unit")} errors={errors.unit} options={unitOptions} />
        <TextInput id="new-unitPrice" name="unitPrice" label="Unit price" value={draft.unitPrice} onChange={set("unitPrice")} errors={errors.unitPrice} prefix="$" inputMode="decimal" placeholder="0.00" />
        <TextInput id="new-description" name="description" label="Description (optional)" value={draft.description} onChange={set("description")} errors={errors.description} className="sm:col-span-2" maxLength={520} />
        <div className="flex items-end">
          <CheckboxInput id="new-taxable" name="taxable" label="Taxable" checked={draft.taxable} onChange={set("taxable")} errors={errors.taxable} />
        </div>
      </div>
      {errors._form ? <p className="field-error">{errors._form.join(" ")}</p> : null}
      <button type="submit" className="btn-primary" disabled={pending}>
        {pending ? "Adding…" : "Add item"}
      </button>
    </form>
  );
}
