"use client";

import { useId } from "react";

type Props = {
  label: string;
  value: string;
  onChange: (value: string) => void;
  steps: number[];
  decimals?: boolean;
  max: number;
  error?: string;
  testId?: string;
};

const fmt = (n: number) => String(Math.round(n * 100) / 100);

/**
 * A number with big − / + buttons (48 px and up, for gloves) and a field for typing; the typed text
 * is kept as typed, so "2." on the way to "2.5" is not thrown away.
 */
export function Stepper({ label, value, onChange, steps, decimals = false, max, error, testId }: Props) {
  const id = useId();
  const n = Number(value === "" ? 0 : value);
  const bump = (d: number) => {
    const base = Number.isFinite(n) ? n : 0;
    onChange(fmt(Math.min(max, Math.max(0, base + d))));
  };
  const down = [...steps].sort((a, b) => b - a);
  return (
    <div data-testid={testId}>
      <label htmlFor={id} className="field-label">{label}</label>
      <div className="flex items-stretch gap-1.5">
        {down.map((s) => (
          <button key={`-${s}`} type="button" className="btn-ghost min-h-12 min-w-12 px-2 text-lg" onClick={() => bump(-s)} disabled={!(n > 0)} aria-label={`${label} minus ${s}`}>
            −{s}
          </button>
        ))}
        <input
          id={id}
          inputMode={decimals ? "decimal" : "numeric"}
          className="field-input min-h-12 min-w-0 flex-1 text-center text-xl font-bold tabular-nums"
          value={value}
          onChange={(e) => onChange(e.target.value.replace(",", "."))}
          onFocus={(e) => e.target.select()}
          aria-invalid={error ? true : undefined}
          aria-describedby={error ? `${id}-error` : undefined}
        />
        {steps.map((s) => (
          <button key={`+${s}`} type="button" className="btn-ghost min-h-12 min-w-12 px-2 text-lg" onClick={() => bump(s)} aria-label={`${label} plus ${s}`}>
            +{s}
          </button>
        ))}
      </div>
      <p id={`${id}-error`} aria-live="polite" className="field-error">{error}</p>
    </div>
  );
}
