// A fast path for the bulk of a house input: its surfaces and their openings (a 60-surface house
// is ~180 objects, and zod's per-object cost was most of analyzeHouse's time).
//
// It only ever answers "every surface is plainly valid, here is exactly what zod would output"
// or "not sure" (undefined). On "not sure" the caller parses the whole input with zod, so every
// error message still comes from `surfaceSchema`. The bounds come from the same tables as the
// zod schema (calc/schema.ts); tests/calc/fast-surfaces.test.ts checks on generated inputs that
// whenever this path accepts, zod accepts and returns the same value.
import { MAX_OPENINGS_PER_SURFACE, OPENING_KINDS, OPENING_NUMS, OPENING_TEXTS, ORIENTATIONS, SURFACE_NUMS, SURFACE_TEXTS, surfaceKindSchema, type Bound } from "./schema";
import type { HouseInputParsed } from "./schema";

type SurfaceParsed = HouseInputParsed["surfaces"][number];
type OpeningParsed = SurfaceParsed["openings"][number];

const SURFACE_KIND_SET = new Set<string>(surfaceKindSchema.options);
const ORIENTATION_SET = new Set<string>(ORIENTATIONS);
const OPENING_KIND_SET = new Set<string>(OPENING_KINDS);

const isRecord = (v: unknown): v is Record<string, unknown> => typeof v === "object" && v !== null && !Array.isArray(v);

/** A finite number within the bound, the same test as boundsCheck in schema.ts. */
function inBound(x: unknown, b: Bound): x is number {
  if (typeof x !== "number" || !Number.isFinite(x)) return false;
  if (b.excl ? x <= b.min : x < b.min) return false;
  if (x > b.max) return false;
  return !b.int || Number.isInteger(x);
}
const textOk = (x: unknown, max: number): x is string => typeof x === "string" && x.length > 0 && x.length <= max;
const optNum = (x: unknown, b: Bound) => x === undefined || inBound(x, b);
const optText = (x: unknown, max: number) => x === undefined || textOk(x, max);

function opening(o: unknown): OpeningParsed | undefined {
  if (!isRecord(o)) return undefined;
  const { kind, areaFt2, count, productKey, uFactorIP, label } = o;
  if (typeof kind !== "string" || !OPENING_KIND_SET.has(kind)) return undefined;
  if (!inBound(areaFt2, OPENING_NUMS.areaFt2) || !optNum(count, OPENING_NUMS.count) || !optNum(uFactorIP, OPENING_NUMS.uFactorIP)) return undefined;
  if (!optText(productKey, OPENING_TEXTS.productKey) || !optText(label, OPENING_TEXTS.label)) return undefined;
  // zod's output: the schema's keys in its order, optional keys only when the input has them, unknown keys dropped
  // (a defined value is a present key, so `in` is asked only of an undefined one).
  const out: Record<string, unknown> = { kind, areaFt2 };
  if (count !== undefined || "count" in o) out.count = count;
  if (productKey !== undefined || "productKey" in o) out.productKey = productKey;
  if (uFactorIP !== undefined || "uFactorIP" in o) out.uFactorIP = uFactorIP;
  if (label !== undefined || "label" in o) out.label = label;
  return out as OpeningParsed;
}

function surface(s: unknown): SurfaceParsed | undefined {
  if (!isRecord(s)) return undefined;
  const { id, name, kind, orientation, grossAreaFt2, assemblyKey, heightFt, openings, bufferFactor, blockedBayFraction } = s;
  if (!textOk(id, SURFACE_TEXTS.id) || !textOk(name, SURFACE_TEXTS.name) || !textOk(assemblyKey, SURFACE_TEXTS.assemblyKey)) return undefined;
  if (typeof kind !== "string" || !SURFACE_KIND_SET.has(kind) || typeof orientation !== "string" || !ORIENTATION_SET.has(orientation)) return undefined;
  if (!inBound(grossAreaFt2, SURFACE_NUMS.grossAreaFt2) || !optNum(heightFt, SURFACE_NUMS.heightFt)) return undefined;
  if (!optNum(bufferFactor, SURFACE_NUMS.bufferFactor) || !optNum(blockedBayFraction, SURFACE_NUMS.blockedBayFraction)) return undefined;
  let outOpenings: OpeningParsed[] = [];
  if (openings !== undefined) {
    if (!Array.isArray(openings) || openings.length > MAX_OPENINGS_PER_SURFACE) return undefined;
    outOpenings = new Array(openings.length);
    for (let j = 0; j < openings.length; j++) {
      const o = opening(openings[j]);
      if (!o) return undefined;
      outOpenings[j] = o;
    }
  }
  const out: Record<string, unknown> = { id, name, kind, orientation, grossAreaFt2, assemblyKey };
  if (heightFt !== undefined || "heightFt" in s) out.heightFt = heightFt;
  out.openings = outOpenings;
  if (bufferFactor !== undefined || "bufferFactor" in s) out.bufferFactor = bufferFactor;
  if (blockedBayFraction !== undefined || "blockedBayFraction" in s) out.blockedBayFraction = blockedBayFraction;
  return out as SurfaceParsed;
}

/** The surfaces as `surfaceSchema` would output them, or undefined when any one needs zod's verdict. */
export function fastParseSurfaces(list: readonly unknown[]): SurfaceParsed[] | undefined {
  const out: SurfaceParsed[] = new Array(list.length);
  for (let i = 0; i < list.length; i++) {
    const s = surface(list[i]);
    if (!s) return undefined;
    out[i] = s;
  }
  return out;
}
