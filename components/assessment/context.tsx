"use client";

import { createContext, memo, useContext, type ReactNode } from "react";
import type { HouseAnalysis } from "@/calc/analyze";
import type { AssessmentDoc } from "@/lib/assessment/doc";
import type { JobPricing } from "@/lib/documents/proposal-lines";
import type { Issue } from "@/lib/hooks/use-assessment";

export type AssessmentCtx = {
  doc: AssessmentDoc;
  update: (change: (d: AssessmentDoc) => AssessmentDoc) => void;
  readOnly: boolean;
  pricesVisible: boolean;
  units: "ip" | "si";
  /** Reasons keyed by the document path of the field they belong to. */
  issues: Map<string, string[]>;
  warnings: Map<string, string[]>;
  /** The live analysis the results panel shows (null while the input has errors), for per-surface figures. */
  analysis?: HouseAnalysis | null;
  /** The upgrades priced from the price book with the same analysis (null until it and the price book are there). */
  pricing?: JobPricing | null;
};

const Ctx = createContext<AssessmentCtx | null>(null);
export const AssessmentProvider = Ctx.Provider;

export function useAssessmentCtx() {
  const c = useContext(Ctx);
  if (!c) throw new Error("useAssessmentCtx outside AssessmentProvider");
  return c;
}

/**
 * A string of the reasons and warnings whose path starts with one of `heads` (the document's
 * top-level keys a section edits), so a section can tell whether its messages changed.
 */
export function issueSignature(ctx: Pick<AssessmentCtx, "issues" | "warnings">, heads: readonly string[]): string {
  let sig = "";
  for (const [tag, m] of [["e", ctx.issues], ["w", ctx.warnings]] as const) {
    for (const [path, msgs] of m) {
      const dot = path.indexOf(".");
      if (heads.includes(dot < 0 ? path : path.slice(0, dot))) sig += `|${tag}:${path}=${msgs.join("¦")}`;
    }
  }
  return sig;
}

const same = (a: readonly unknown[], b: readonly unknown[]) => a.length === b.length && a.every((x, i) => Object.is(x, b[i]));

/**
 * One section of the workspace, re-rendered only when something it shows has changed (`deps`:
 * the parts of the document it edits, its messages' signature, the live figures it prints).
 * It gives its section its own provider, so a change elsewhere in the document does not reach it.
 */
export const SectionGate = memo(
  function SectionGate({ ctx, children }: { ctx: AssessmentCtx; deps: readonly unknown[]; children: ReactNode }) {
    return <Ctx.Provider value={ctx}>{children}</Ctx.Provider>;
  },
  (a, b) => a.ctx.update === b.ctx.update && a.ctx.readOnly === b.ctx.readOnly && a.ctx.pricesVisible === b.ctx.pricesVisible && a.ctx.units === b.ctx.units && same(a.deps, b.deps),
);

export function groupIssues(list: Issue[]): Map<string, string[]> {
  const m = new Map<string, string[]>();
  for (const i of list) m.set(i.path, [...(m.get(i.path) ?? []), i.message]);
  return m;
}

/** Immutable update of a nested value by path ("surfaces.2.grossAreaFt2"). */
export function setAt<T>(obj: T, path: (string | number)[], value: unknown): T {
  if (path.length === 0) return value as T;
  const [head, ...rest] = path;
  const src = obj as Record<string | number, unknown>;
  const copy = (Array.isArray(obj) ? [...(obj as unknown[])] : { ...src }) as Record<string | number, unknown>;
  copy[head!] = setAt(src[head!], rest, value);
  return copy as T;
}
