"use client";

import { useId } from "react";
import { fieldPath } from "./format";

type Issue = { path: string; message: string };

/** Shown instead of results while the input is invalid: what to fix, calmly, field by field. */
export function InputErrors({ issues }: { issues: Issue[] }) {
  const id = useId();
  return (
    <section aria-labelledby={id} className="card space-y-2 border-line p-4 @md:p-5" data-testid="results-input-errors">
      <h3 id={id} className="text-lg font-semibold text-spruce-800">Fix these fields to see results</h3>
      <p className="text-sm text-ink-muted">The results come back as soon as every field below has a usable value.</p>
      <ul className="space-y-2">
        {issues.map((i, n) => (
          <li key={`${i.path}-${n}`} className="rounded-md border-l-4 border-danger/60 bg-paper px-3 py-2 text-sm">
            <span className="block font-semibold text-charcoal">{fieldPath(i.path) || "the house"}</span>
            <span className="text-charcoal">{i.message}</span>
          </li>
        ))}
      </ul>
    </section>
  );
}

/** Soft warnings: legal but unusual values worth a second look. */
export function SoftWarnings({ warnings }: { warnings: Issue[] }) {
  const id = useId();
  if (warnings.length === 0) return null;
  return (
    <section aria-labelledby={id} className="rounded-lg border border-warn/30 bg-warn-bg p-4 @md:p-5" data-testid="results-warnings">
      <h3 id={id} className="text-lg font-semibold text-warn">Check these entries</h3>
      <ul className="mt-2 space-y-2 text-sm text-charcoal">
        {warnings.map((w, n) => (
          <li key={`${w.path}-${n}`}>
            <span className="font-semibold">{fieldPath(w.path)}: </span>
            {w.message}
          </li>
        ))}
      </ul>
    </section>
  );
}
