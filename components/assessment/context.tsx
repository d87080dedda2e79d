"use client";

import { createContext, useContext } from "react";
import type { HouseAnalysis } from "@/calc/analyze";
import type { AssessmentDoc } from "@/lib/assessment/doc";
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
};

const Ctx = createContext<AssessmentCtx | null>(null);
export const AssessmentProvider = Ctx.Provider;

export function useAssessmentCtx() {
  const c = useContext(Ctx);
  if (!c) throw new Error("useAssessmentCtx outside AssessmentProvider");
  return c;
}

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
