"use client";

import { useId, type ReactNode } from "react";
import type { HouseAnalysis } from "@/calc/analyze";
import type { Units } from "./format";

export type SectionProps = { analysis: HouseAnalysis; units: Units };

type Topic = HouseAnalysis["methods"][number]["topic"];
/** The "how we calculated this" line of the analysis for one topic. */
export function methodNote(analysis: HouseAnalysis, topic: Topic) {
  const note = analysis.methods.find((m) => m.topic === topic);
  return note ?? { topic, method: "", source: "" };
}

/** A card with its own heading, labelled for assistive technology. */
export function Section({ title, children, className = "" }: { title: string; children: ReactNode; className?: string }) {
  const id = useId();
  return (
    <section aria-labelledby={id} className={`card space-y-3 p-4 @md:p-5 ${className}`}>
      <h3 id={id} className="text-lg font-semibold text-spruce-800">{title}</h3>
      {children}
    </section>
  );
}

type Inputs = [string, ReactNode][];
export type HowProps = {
  /** What the figure is, shown in the summary ("the design heat load"). */
  what: string;
  inputs: Inputs;
  /** Further inputs under their own titles (one group per upgrade or wall). */
  groups?: { title: string; inputs: Inputs }[];
  method: ReactNode;
  sources: string[];
};

function InputList({ inputs }: { inputs: Inputs }) {
  return (
    <dl className="space-y-1">
      {inputs.map(([k, v], i) => (
        <div key={i} className="flex flex-wrap justify-between gap-x-3">
          <dt className="text-ink-muted">{k}</dt>
          <dd className="ml-auto text-right tabular-nums">{v}</dd>
        </div>
      ))}
    </dl>
  );
}

/** The "how" disclosure under a figure: its inputs, the method and where the method comes from. */
export function How({ what, inputs, groups = [], method, sources }: HowProps) {
  return (
    <details className="text-sm">
      <summary className="cursor-pointer py-2 font-semibold text-spruce-700 hover:text-spruce-800">How we got {what}</summary>
      <div className="space-y-2 rounded-md bg-paper p-3 text-charcoal">
        {inputs.length > 0 ? <InputList inputs={inputs} /> : null}
        {groups.map((g) => (
          <div key={g.title} className="border-t border-line pt-2">
            <p className="font-semibold">{g.title}</p>
            <InputList inputs={g.inputs} />
          </div>
        ))}
        <p><span className="font-semibold">Method: </span>{method}</p>
        {sources.filter(Boolean).map((s) => (
          <p key={s} className="text-ink-muted"><span className="font-semibold">Source: </span>{s}</p>
        ))}
      </div>
    </details>
  );
}

/** A large numeral for the figures a homeowner cares about, with its unit small beneath; use inside a <dl>. */
export function BigFigure({ label, value, unit, detail, testId }: { label: string; value: string; unit?: string; detail?: ReactNode; testId?: string }) {
  return (
    <div className="min-w-0">
      <dt className="text-sm font-semibold text-ink-muted">{label}</dt>
      <dd className="font-display text-[clamp(1.6rem,10cqw,2.75rem)] leading-tight font-semibold text-spruce-800 tabular-nums" data-testid={testId}>
        {value}
        {unit ? <span className="block font-sans text-sm font-semibold text-spruce-700">{unit}</span> : null}
      </dd>
      {detail ? <dd className="text-sm text-ink-muted">{detail}</dd> : null}
    </div>
  );
}

/** Table cell classes shared by the panel's tables. */
export const th = "px-2 py-1.5 text-left text-sm font-semibold text-ink-muted";
export const thNum = "px-2 py-1.5 text-right text-sm font-semibold text-ink-muted";
export const tdNum = "px-2 py-1.5 text-right whitespace-nowrap tabular-nums";
export const rowHead = "px-2 py-1.5 text-left font-normal";
