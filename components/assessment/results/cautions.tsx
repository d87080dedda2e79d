"use client";

import { Section, type SectionProps } from "./parts";

/** The safety cautions that apply to this house and plan, each with its governing document. */
export function Cautions({ analysis: a }: Pick<SectionProps, "analysis">) {
  return (
    <Section title="Cautions">
      {a.cautions.length === 0 ? (
        <p className="text-ink-muted">None of the listed hazards applies to this house and plan. Follow local codes and licensed practice.</p>
      ) : (
        <ul className="space-y-3">
          {a.cautions.map((c) => (
            <li key={c.id} className="rounded-md border-l-4 border-ember-500 bg-ember-50 px-3 py-2" data-testid={`results-caution-${c.id}`}>
              <p className="font-semibold text-charcoal">{c.hazard}</p>
              <p className="text-sm text-ink-muted">Applies because: {c.because}.</p>
              <p className="mt-1 text-sm text-charcoal">{c.message}</p>
              <p className="mt-1 text-sm text-charcoal"><span className="font-semibold">Governing document: </span>{c.document}</p>
            </li>
          ))}
        </ul>
      )}
    </Section>
  );
}
