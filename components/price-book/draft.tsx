"use client";

import type { ReactNode } from "react";
import type { FieldErrors } from "@/lib/api/errors";
import type { PriceBookItem } from "@/lib/data/price-book";
import { FetchError } from "@/lib/hooks/fetcher";
import { centsToDollars } from "@/lib/money";
import { priceBookKindLabels, priceBookKindValues, priceBookUnitLabels, priceBookUnitValues } from "@/lib/validation/price-book";

/** What a person has typed for one item: text as typed, so nothing is lost while it is wrong. */
export type ItemDraft = {
  code: string;
  name: string;
  description: string;
  kind: string;
  unit: string;
  unitPrice: string;
  taxable: boolean;
};

export const emptyDraft: ItemDraft = { code: "", name: "", description: "", kind: "", unit: "", unitPrice: "", taxable: true };

export function draftFrom(item: PriceBookItem): ItemDraft {
  return {
    code: item.code,
    name: item.name,
    description: item.description ?? "",
    kind: item.kind,
    unit: item.unit,
    unitPrice: centsToDollars(item.unitPriceCents),
    taxable: item.taxable,
  };
}

/** zod issues → field messages, keyed the way the API keys them. */
export function issuesToFields(issues: { path: PropertyKey[]; message: string }[]): FieldErrors {
  const fields: FieldErrors = {};
  for (const issue of issues) {
    const key = issue.path.length ? issue.path.map(String).join(".") : "_form";
    (fields[key] ??= []).push(issue.message);
  }
  return fields;
}

export type Problem = { message: string; fields: FieldErrors; current?: PriceBookItem; status?: number };

/** A failed request as the screen shows it: the API's message and per-field reasons, or a network failure. */
export function problemFrom(err: unknown): Problem {
  if (err instanceof FetchError) {
    const body = err.body as { fields?: FieldErrors; current?: PriceBookItem };
    return { message: err.message, fields: body.fields ?? {}, current: body.current, status: err.status };
  }
  return { message: "Could not reach Warmstead. Nothing was saved; what you typed is still here, so try again when you are back online.", fields: {} };
}

export const kindOptions = priceBookKindValues.map((value) => ({ value, label: priceBookKindLabels[value] }));
export const unitOptions = priceBookUnitValues.map((value) => ({ value, label: priceBookUnitLabels[value] }));

type InputProps = {
  id: string;
  name: string;
  label: string;
  value: string;
  onChange: (value: string) => void;
  errors?: string[];
  /** Hide the label on wide screens, where the column heading names the field. */
  compact?: boolean;
  prefix?: ReactNode;
  inputMode?: "text" | "decimal";
  placeholder?: string;
  maxLength?: number;
  className?: string;
};

function ErrorText({ id, name, errors }: { id: string; name: string; errors?: string[] }) {
  return (
    <p id={`${id}-error`} aria-live="polite" className="field-error" data-testid={`error-${name}`}>
      {errors?.join(" ")}
    </p>
  );
}

/** A labelled text input whose reasons sit right under it, tied by aria-describedby. */
export function TextInput({ id, name, label, value, onChange, errors, compact, prefix, inputMode, placeholder, maxLength, className }: InputProps) {
  const invalid = Boolean(errors?.length);
  const input = (
    <input
      id={id}
      name={name}
      value={value}
      onChange={(e) => onChange(e.target.value)}
      inputMode={inputMode}
      placeholder={placeholder}
      maxLength={maxLength}
      autoComplete="off"
      className={`field-input ${prefix ? "pl-7" : ""}`}
      aria-invalid={invalid || undefined}
      aria-describedby={invalid ? `${id}-error` : undefined}
    />
  );
  return (
    <div className={className}>
      <label htmlFor={id} className={`field-label ${compact ? "md:sr-only" : ""}`}>
        {label}
      </label>
      {prefix ? (
        <div className="relative">
          <span aria-hidden="true" className="pointer-events-none absolute inset-y-0 left-3 flex items-center text-ink-muted">
            {prefix}
          </span>
          {input}
        </div>
      ) : (
        input
      )}
      <ErrorText id={id} name={name} errors={errors} />
    </div>
  );
}

type SelectProps = Omit<InputProps, "prefix" | "inputMode" | "placeholder" | "maxLength"> & { options: { value: string; label: string }[] };

export function SelectInput({ id, name, label, value, onChange, errors, compact, options, className }: SelectProps) {
  const invalid = Boolean(errors?.length);
  return (
    <div className={className}>
      <label htmlFor={id} className={`field-label ${compact ? "md:sr-only" : ""}`}>
        {label}
      </label>
      <select
        id={id}
        name={name}
        value={value}
        onChange={(e) => onChange(e.target.value)}
        className="field-input"
        aria-invalid={invalid || undefined}
        aria-describedby={invalid ? `${id}-error` : undefined}
      >
        {value === "" ? <option value="">Choose…</option> : null}
        {options.map((o) => (
          <option key={o.value} value={o.value}>
            {o.label}
          </option>
        ))}
      </select>
      <ErrorText id={id} name={name} errors={errors} />
    </div>
  );
}

export function CheckboxInput({ id, name, label, checked, onChange, errors }: { id: string; name: string; label: string; checked: boolean; onChange: (checked: boolean) => void; errors?: string[] }) {
  return (
    <div>
      <label htmlFor={id} className="inline-flex min-h-11 cursor-pointer items-center gap-2 font-semibold">
        <input id={id} name={name} type="checkbox" checked={checked} onChange={(e) => onChange(e.target.checked)} className="h-5 w-5 accent-spruce-700" />
        {label}
      </label>
      <ErrorText id={id} name={name} errors={errors} />
    </div>
  );
}
