// Validate an assembly with calc's own schema, then compute it; never throws.
import { computeAssembly, type AssemblyDef, type AssemblyResult } from "@/calc/assemblies";
import { CalcInputError } from "@/calc/errors";
import { assemblySchema } from "@/calc/schema";
import { addIssue, issuePath, type FieldIssues } from "./model";

export interface Evaluation {
  /** Messages keyed by field path ("layers.2.thicknessIn"), shown beside the field. */
  issues: FieldIssues;
  /** The result when the assembly can be calculated. */
  result?: AssemblyResult;
  /** Set when calc failed in a way no field explains. */
  failure?: string;
}

export function evaluateAssembly(def: AssemblyDef): Evaluation {
  const issues: FieldIssues = {};
  try {
    const parsed = assemblySchema.safeParse(def);
    if (!parsed.success) {
      for (const i of parsed.error.issues) addIssue(issues, issuePath(i.path), i.message);
      return { issues };
    }
    const result = computeAssembly(def);
    if (!Number.isFinite(result.uFactorIP) || !Number.isFinite(result.parallelPath.uFactorIP) || !Number.isFinite(result.isothermalPlanes.uFactorIP))
      return { issues, failure: "These layers give no finite U-factor: check the thicknesses and R-values." };
    return { issues, result };
  } catch (e) {
    if (e instanceof CalcInputError) {
      for (const i of e.issues) addIssue(issues, issuePath(i.path), i.message);
      return { issues };
    }
    return { issues, failure: e instanceof Error ? e.message : "This assembly could not be calculated." };
  }
}

const FIELD_NAMES: Record<string, string> = {
  materialKey: "material", thicknessIn: "thickness", rValueIP: "R-value", member: "framing member", depthIn: "depth",
  spacingIn: "spacing", framingFraction: "framing fraction", framingMaterial: "framing material", cavityFill: "cavity fill",
  fillFraction: "fill fraction", fillRValueIP: "fill R-value", key: "key", name: "name", kind: "kind", construction: "construction", method: "method",
};

/** "layers.3.framed.spacingIn" → "Layer 4 (framed), spacing", for the summary beside the figures. */
export function describePath(path: string): string {
  const parts = path.split(".").filter((p) => p !== "framed");
  if (parts[0] === "layers" && parts.length > 1 && /^\d+$/.test(parts[1])) {
    const field = parts[2] ? `, ${FIELD_NAMES[parts[2]] ?? parts[2]}` : "";
    return `Layer ${Number(parts[1]) + 1}${field}`;
  }
  if (parts[0] === "layers" || parts[0] === "") return "Layers";
  return (FIELD_NAMES[parts[0]] ?? parts[0]).replace(/^./, (c) => c.toUpperCase());
}

/** Every issue as one line for a summary list. */
export function issueLines(issues: FieldIssues): string[] {
  return Object.entries(issues).flatMap(([path, msgs]) => msgs.map((m) => `${describePath(path)} ${m}`));
}
