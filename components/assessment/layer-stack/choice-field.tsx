"use client";
import { withLabel } from "./model";

export type Choice = { value: string; label: string; group?: string };

/** A controlled select with its reasons beside it. Options with a `group` are put in optgroups. */
export function ChoiceField({ id, label, value, options, onChange, errors, hint, disabled }: {
  id: string; label: string; value: string; options: Choice[]; onChange: (v: string) => void; errors?: string[]; hint?: string; disabled?: boolean;
}) {
  const groups = [...new Set(options.map((o) => o.group ?? ""))];
  const invalid = Boolean(errors?.length);
  const opt = (o: Choice) => <option key={o.value} value={o.value}>{o.label}</option>;
  return (
    <div className="min-w-0">
      <label htmlFor={id} className="field-label">{label}</label>
      <select id={id} className="field-input" value={value} disabled={disabled} onChange={(e) => onChange(e.target.value)}
        aria-invalid={invalid || undefined} aria-describedby={[invalid ? `${id}-error` : null, hint ? `${id}-hint` : null].filter(Boolean).join(" ") || undefined}>
        {groups.map((g) => (g === "" ? options.filter((o) => !o.group).map(opt) : (
          <optgroup key={g} label={g}>{options.filter((o) => o.group === g).map(opt)}</optgroup>
        )))}
      </select>
      {hint ? <p id={`${id}-hint`} className="mt-1 text-sm text-ink-muted">{hint}</p> : null}
      <p id={`${id}-error`} aria-live="polite" className="field-error">{(errors ?? []).map((m) => withLabel(label, m)).join(" ")}</p>
    </div>
  );
}
