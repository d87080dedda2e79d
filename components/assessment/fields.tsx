"use client";

import { useId, useState } from "react";
import { useAssessmentCtx } from "./context";

type Base = {
  path: string;
  label: string;
  hint?: string;
  className?: string;
  /** In a table cell: the label is read by screen readers (and tests) but not drawn; the column header shows it. */
  compact?: boolean;
};

const labelClass = (compact?: boolean) => (compact ? "sr-only" : "field-label");
const inputClass = (compact?: boolean) => (compact ? "field-input min-h-10 px-2 py-1.5" : "field-input");

function Messages({ id, path, extra }: { id: string; path: string; extra?: string | null }) {
  const { issues, warnings } = useAssessmentCtx();
  const errs = [...(extra ? [extra] : []), ...(issues.get(path) ?? [])];
  const warns = warnings.get(path) ?? [];
  return (
    <>
      <p id={`${id}-err`} aria-live="polite" className="field-error" data-testid={`err-${path}`}>{errs.map((e) => `${e.charAt(0).toUpperCase()}${e.slice(1)}`).join(" ")}</p>
      {warns.length ? <p className="mt-1 rounded bg-warn-bg px-2 py-1 text-sm text-warn" data-testid={`warn-${path}`}>{warns.join(" ")}</p> : null}
    </>
  );
}

/**
 * A number input that keeps exactly what was typed: only a finite number is committed to the
 * document; anything else stays in the box with its reason beside it until it is fixed.
 */
export function NumField({ path, label, hint, className, compact, value, onValue, step }: Base & { value: number | null | undefined; onValue: (n: number | null) => void; step?: string }) {
  const id = useId();
  const { readOnly, issues } = useAssessmentCtx();
  const [draft, setDraft] = useState(value == null || Number.isNaN(value) ? "" : String(value));
  const [local, setLocal] = useState<string | null>(null);
  const [seen, setSeen] = useState(value);
  // The document changed from outside (undo, duplicate, load): show its value, unless the box holds
  // an unreadable draft the user is still fixing.
  if (seen !== value && !(Number.isNaN(seen) && Number.isNaN(value))) {
    setSeen(value);
    const typed = draft.trim() === "" ? null : Number(draft);
    if (!local && typed !== (value ?? null)) setDraft(value == null || Number.isNaN(value) ? "" : String(value));
  }
  const invalid = Boolean(local) || issues.has(path);
  return (
    <div className={className}>
      <label htmlFor={id} className={labelClass(compact)}>{label}</label>
      <input
        id={id}
        inputMode="decimal"
        step={step}
        className={inputClass(compact)}
        value={draft}
        readOnly={readOnly}
        aria-invalid={invalid || undefined}
        aria-describedby={`${id}-err`}
        data-path={path}
        onChange={(e) => {
          const text = e.target.value;
          setDraft(text);
          if (text.trim() === "") {
            setLocal(null);
            return onValue(null);
          }
          const n = Number(text.replace(/,/g, ""));
          if (!Number.isFinite(n)) return setLocal(`${label} must be a number.`);
          setLocal(null);
          onValue(n);
        }}
      />
      {hint ? <p className="mt-1 text-sm text-ink-muted">{hint}</p> : null}
      <Messages id={id} path={path} extra={local} />
    </div>
  );
}

export function TextField({ path, label, className, compact, value, onValue }: Base & { value: string; onValue: (v: string) => void }) {
  const id = useId();
  const { readOnly, issues } = useAssessmentCtx();
  return (
    <div className={className}>
      <label htmlFor={id} className={labelClass(compact)}>{label}</label>
      <input id={id} className={inputClass(compact)} value={value} readOnly={readOnly} data-path={path} aria-invalid={issues.has(path) || undefined} aria-describedby={`${id}-err`} onChange={(e) => onValue(e.target.value)} />
      <Messages id={id} path={path} />
    </div>
  );
}

export function ChoiceField<T extends string>({ path, label, className, compact, value, options, onValue }: Base & { value: T | ""; options: readonly { value: T; label: string }[]; onValue: (v: T) => void }) {
  const id = useId();
  const { readOnly, issues } = useAssessmentCtx();
  return (
    <div className={className}>
      <label htmlFor={id} className={labelClass(compact)}>{label}</label>
      <select id={id} className={inputClass(compact)} value={value} disabled={readOnly} data-path={path} aria-invalid={issues.has(path) || undefined} aria-describedby={`${id}-err`} onChange={(e) => onValue(e.target.value as T)}>
        {value === "" ? <option value="">Choose…</option> : null}
        {options.map((o) => (
          <option key={o.value} value={o.value}>{o.label}</option>
        ))}
      </select>
      <Messages id={id} path={path} />
    </div>
  );
}
