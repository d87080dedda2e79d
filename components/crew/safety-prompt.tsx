"use client";

import { useState } from "react";
import type { CautionView } from "@/lib/data/crew-log";

/** The start-of-day prompt: one box per caution of the job; "I have read these" records the acknowledgement. */
export function SafetyPrompt({ cautions, onAcknowledge }: { cautions: CautionView[]; onAcknowledge: (keys: string[]) => void }) {
  const [ticked, setTicked] = useState<Set<string>>(new Set());
  const all = cautions.every((c) => ticked.has(c.id));
  const toggle = (id: string) =>
    setTicked((t) => {
      const next = new Set(t);
      if (next.has(id)) next.delete(id);
      else next.add(id);
      return next;
    });
  return (
    <section className="rounded-lg border-2 border-ember-500 bg-white p-4 shadow-sm" aria-labelledby="safety-title" data-testid="safety-prompt">
      <h2 id="safety-title" className="text-2xl font-bold text-spruce-900">Before you start today</h2>
      <p className="mt-1 text-ink-muted">This house has these cautions. Tick each one once you have read it and have what it needs on site.</p>
      {cautions.length === 0 ? <p className="mt-3">No house-specific cautions were found in the assessment.</p> : null}
      <ul className="mt-3 space-y-2">
        {cautions.map((c) => (
          <li key={c.id}>
            <label className={`flex min-h-14 cursor-pointer gap-3 rounded-md border p-3 ${ticked.has(c.id) ? "border-spruce-600 bg-spruce-50" : "border-line"}`}>
              <input type="checkbox" className="mt-0.5 size-7 shrink-0 accent-spruce-700" checked={ticked.has(c.id)} onChange={() => toggle(c.id)} data-testid={`caution-${c.id}`} />
              <span>
                <span className="block text-lg font-semibold">{c.hazard}</span>
                <span className="block">{c.message}</span>
                <span className="mt-1 block text-sm text-ink-muted">Why: {c.because}. See {c.document}.</span>
              </span>
            </label>
          </li>
        ))}
      </ul>
      <p className="mt-3 text-sm text-ink-muted">
        These prompts are reminders, not a safety programme: local codes, the product instructions and licensed professionals (electricians, certified renovators, combustion-safety testers) decide what is safe on this house.
      </p>
      <button type="button" className="btn-primary mt-3 min-h-14 w-full text-lg" disabled={!all} onClick={() => onAcknowledge(cautions.map((c) => c.id))}>
        I have read these
      </button>
      {!all ? <p className="mt-2 text-center text-sm text-ink-muted">Tick every caution to continue.</p> : null}
    </section>
  );
}
