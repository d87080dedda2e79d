import type { InputHTMLAttributes, ReactNode } from "react";

type Props = {
  name: string;
  label: string;
  errors?: string[];
  hint?: ReactNode;
  children?: ReactNode;
} & InputHTMLAttributes<HTMLInputElement>;

/** A labelled input whose reasons sit beside it in a live region tied by aria-describedby. */
export function Field({ name, label, errors, hint, children, id, ...input }: Props) {
  const fieldId = id ?? `f-${name.replace(/\W+/g, "-")}`;
  const errorId = `${fieldId}-error`;
  const hintId = hint ? `${fieldId}-hint` : undefined;
  const invalid = Boolean(errors?.length);
  return (
    <div>
      <label htmlFor={fieldId} className="field-label">
        {label}
      </label>
      {children ?? (
        <input
          id={fieldId}
          name={name}
          className="field-input"
          aria-invalid={invalid || undefined}
          aria-describedby={[invalid ? errorId : null, hintId].filter(Boolean).join(" ") || undefined}
          {...input}
        />
      )}
      {hint ? (
        <p id={hintId} className="mt-1 text-sm text-ink-muted">
          {hint}
        </p>
      ) : null}
      <p id={errorId} aria-live="polite" className="field-error" data-testid={`error-${name}`}>
        {errors?.join(" ")}
      </p>
    </div>
  );
}

export function FormMessage({ message, ok }: { message?: string; ok?: boolean }) {
  if (!message) return null;
  return (
    <p role="status" aria-live="polite" data-testid="form-message" className={`rounded-md px-3 py-2 text-sm font-medium ${ok ? "bg-spruce-50 text-spruce-800" : "bg-danger-bg text-danger"}`}>
      {message}
    </p>
  );
}
