"use client";
import { useState, type ReactNode } from "react";
import { parseDraft, withLabel } from "./model";

type Props = {
  id: string;
  label: string;
  value: number | undefined;
  /** Called with a parsed number, or undefined when emptied (the default applies); never with what cannot be read. */
  onCommit: (v: number | undefined) => void;
  errors?: string[];
  warning?: string;
  hint?: ReactNode;
  unit?: string;
  placeholder?: string;
  percent?: boolean;
  readOnly?: boolean;
};

const show = (v: number | undefined) => (v === undefined ? "" : String(v));

/** A numeric input that keeps what was typed (even "3 1/" or "abc") until it reads as a number. */
export function NumberField({ id, label, value, onCommit, errors, warning, hint, unit, placeholder, percent, readOnly }: Props) {
  const [draft, setDraft] = useState(() => show(value));
  const [seen, setSeen] = useState(value);
  if (!Object.is(seen, value)) {
    // The value changed from outside: show it, unless the draft already says the same number.
    setSeen(value);
    const d = parseDraft(draft, { percent });
    const same = d.kind === "number" ? d.value === value : d.kind === "empty" && value === undefined;
    if (!same) setDraft(show(value));
  }
  const parsed = parseDraft(draft, { percent });
  const local = parsed.kind === "invalid" ? [withLabel(label, parsed.message)] : [];
  // Calc's messages describe the committed value; while the draft cannot be read, only its own reason applies.
  const all = local.length ? local : (errors ?? []).map((m) => withLabel(label, m));
  const errorId = `${id}-error`;
  const noteId = `${id}-note`;
  const invalid = all.length > 0;
  const note = warning ?? hint;
  return (
    <div className="min-w-0">
      <label htmlFor={id} className="field-label">
        {label}
        {unit ? <span className="font-normal text-ink-muted"> ({unit})</span> : null}
      </label>
      <input
        id={id}
        type="text"
        inputMode="decimal"
        autoComplete="off"
        className="field-input tabular-nums"
        value={draft}
        placeholder={placeholder}
        readOnly={readOnly}
        aria-invalid={invalid || undefined}
        aria-describedby={[invalid ? errorId : null, note ? noteId : null].filter(Boolean).join(" ") || undefined}
        onChange={(e) => {
          const text = e.target.value;
          setDraft(text);
          const d = parseDraft(text, { percent });
          if (d.kind === "invalid") return;
          const next = d.kind === "number" ? d.value : undefined;
          setSeen(next);
          if (!Object.is(next, value)) onCommit(next);
        }}
      />
      {note ? (
        <p id={noteId} className={warning ? "mt-1 rounded bg-warn-bg px-2 py-1 text-sm font-medium text-warn" : "mt-1 text-sm text-ink-muted"}>
          {warning ? <span aria-hidden="true">⚠ </span> : null}
          {note}
        </p>
      ) : null}
      <p id={errorId} aria-live="polite" className="field-error">
        {all.join(" ")}
      </p>
    </div>
  );
}
