// The input schema of analyzeHouse, shared with the API. Every number is bounded:
// NaN, infinities, negative areas, fractions outside 0–1, zero volumes and absurd
// magnitudes are refused with the field's path.
import { z } from "zod";
import type { AssemblyLayer } from "./assemblies";

const NUM = { error: (iss: { input?: unknown }) => (iss.input === undefined ? "is required" : "must be a finite number") };
const fmt = (x: number) => x.toLocaleString("en-US");

/** A finite number within bounds, checked in one pass (one zod check per field keeps parsing fast). */
function bounded(min: number, max: number, opts: { exclusiveMin?: boolean; int?: boolean; below?: string; above?: string } = {}) {
  const below = opts.below ?? (opts.exclusiveMin ? `must be greater than ${fmt(min)}` : `must be at least ${fmt(min)}`);
  const above = opts.above ?? `must be at most ${fmt(max)}`;
  return z.number(NUM).check((ctx) => {
    const v = ctx.value;
    const msg = (opts.exclusiveMin ? v <= min : v < min) ? below : v > max ? above : opts.int && !Number.isInteger(v) ? "must be a whole number" : null;
    if (msg) ctx.issues.push({ code: "custom", message: msg, input: v });
  });
}
const pos = (max: number) => bounded(0, max, { exclusiveMin: true, below: "must be greater than 0" });
const nonneg = (max: number) => bounded(0, max, { below: "must not be negative" });
const frac = () => bounded(0, 1, { below: "must be between 0 and 1", above: "must be between 0 and 1" });
const range = (min: number, max: number) => bounded(min, max, { below: `must be between ${min} and ${max}`, above: `must be between ${min} and ${max}` });
const int = (min: number, max: number) => bounded(min, max, { int: true, below: `must be between ${min} and ${max}`, above: `must be between ${min} and ${max}` });
const text = (max = 200) => z.string().check((ctx) => {
  const n = ctx.value.length;
  if (n === 0) ctx.issues.push({ code: "custom", message: "must not be empty", input: ctx.value });
  else if (n > max) ctx.issues.push({ code: "custom", message: `must be at most ${max} characters`, input: ctx.value });
});
const life = () => int(1, 100).optional();

export const surfaceKindSchema = z.enum(["wall", "ceiling", "floor"]);
const presence = z.enum(["present", "absent", "unknown"]);

const framedSpecSchema = z.strictObject({
  member: z.enum(["2x3", "2x4", "2x6", "2x8", "2x10", "2x12", "rough-2x4", "1x2-furring", "custom"]),
  depthIn: pos(24).optional(), spacingIn: range(8, 48).optional(), framingFraction: frac().optional(),
  framingMaterial: z.enum(["wood", "steel"]).optional(), cavityFill: text(100).nullable(),
  fillFraction: frac().optional(), fillRValueIP: pos(100).optional(),
});
// One object shape for both layer kinds (so errors keep their full field path), turned into the union.
const layerSchema = z
  .strictObject({ materialKey: text(100).optional(), thicknessIn: pos(48).optional(), rValueIP: pos(200).optional(), framed: framedSpecSchema.optional() })
  .refine((l) => (l.framed === undefined) !== (l.materialKey === undefined), { error: "give either materialKey (a continuous layer) or framed (the framed layer)" })
  .transform((l): AssemblyLayer => (l.framed ? { framed: l.framed } : { materialKey: l.materialKey!, thicknessIn: l.thicknessIn, rValueIP: l.rValueIP }));
export const assemblySchema = z.object({
  key: text(100), name: text(), kind: surfaceKindSchema,
  construction: z.enum(["wood-frame", "steel-frame", "masonry"]),
  method: z.enum(["parallel-path", "isothermal-planes"]).optional(),
  layers: z.array(layerSchema).min(1).max(30),
});

// Surfaces and openings are the bulk of a house (hundreds of objects): their bounds are
// checked by one check per object instead of one per field, with the same messages and paths.
type Bound = { min: number; max: number; excl?: boolean; int?: boolean; below: string; above: string };
const B = {
  pos: (max: number): Bound => ({ min: 0, max, excl: true, below: "must be greater than 0", above: `must be at most ${fmt(max)}` }),
  frac: (): Bound => ({ min: 0, max: 1, below: "must be between 0 and 1", above: "must be between 0 and 1" }),
  int: (min: number, max: number): Bound => ({ min, max, int: true, below: `must be between ${min} and ${max}`, above: `must be between ${min} and ${max}` }),
};
function boundsCheck(nums: Record<string, Bound>, texts: Record<string, number>) {
  const numKeys = Object.keys(nums);
  const textKeys = Object.keys(texts);
  return (ctx: { value: Record<string, unknown>; issues: unknown[] }) => {
    const v = ctx.value;
    for (const k of numKeys) {
      const x = v[k] as number | undefined;
      if (x === undefined) continue;
      const b = nums[k];
      const msg = (b.excl ? x <= b.min : x < b.min) ? b.below : x > b.max ? b.above : b.int && !Number.isInteger(x) ? "must be a whole number" : null;
      if (msg) ctx.issues.push({ code: "custom", message: msg, input: x, path: [k] });
    }
    for (const k of textKeys) {
      const x = v[k] as string | undefined;
      if (x === undefined) continue;
      if (x.length === 0) ctx.issues.push({ code: "custom", message: "must not be empty", input: x, path: [k] });
      else if (x.length > texts[k]) ctx.issues.push({ code: "custom", message: `must be at most ${texts[k]} characters`, input: x, path: [k] });
    }
  };
}
const n = () => z.number(NUM);

// The bounds of openings and surfaces, as tables: the zod schemas below and the fast path of
// calc/fast-surfaces.ts both read them, so the two cannot drift apart.
export const OPENING_KINDS = ["window", "door"] as const;
export const ORIENTATIONS = ["N", "NE", "E", "SE", "S", "SW", "W", "NW", "horizontal"] as const;
export const MAX_OPENINGS_PER_SURFACE = 100;
export const OPENING_NUMS = { areaFt2: B.pos(2_000), count: B.int(1, 200), uFactorIP: B.pos(2) };
export const OPENING_TEXTS = { productKey: 100, label: 200 };
export const SURFACE_NUMS = { grossAreaFt2: B.pos(20_000), heightFt: B.pos(100), bufferFactor: B.frac(), blockedBayFraction: B.frac() };
export const SURFACE_TEXTS = { id: 100, name: 200, assemblyKey: 100 };
export type { Bound };

export const openingSchema = z.object({
  kind: z.enum(OPENING_KINDS), areaFt2: n(), count: n().optional(),
  productKey: z.string().optional(), uFactorIP: n().optional(), label: z.string().optional(),
}).check(boundsCheck(OPENING_NUMS, OPENING_TEXTS));
export const surfaceSchema = z.object({
  id: z.string(), name: z.string(), kind: surfaceKindSchema,
  orientation: z.enum(ORIENTATIONS),
  grossAreaFt2: n(), assemblyKey: z.string(), heightFt: n().optional(),
  openings: z.array(openingSchema).max(MAX_OPENINGS_PER_SURFACE).default([]),
  bufferFactor: n().optional(), blockedBayFraction: n().optional(),
}).check(boundsCheck(SURFACE_NUMS, SURFACE_TEXTS));

const surfaceIds = z.array(z.string()).min(1).max(1000).check((ctx) => {
  ctx.value.forEach((id, i) => { if (id.length === 0 || id.length > 100) ctx.issues.push({ code: "custom", message: "must be 1–100 characters", input: id, path: [i] }); });
});
export const upgradeSchema = z.discriminatedUnion("type", [
  z.object({ type: z.literal("dense-pack-walls"), name: text().optional(), surfaceIds: z.union([z.literal("all-walls"), surfaceIds]), costUSD: nonneg(1e7), lifeYears: life(), rPerInchIP: pos(10).optional() }),
  z.object({ type: z.literal("attic-insulation"), name: text().optional(), surfaceIds: z.union([z.literal("all-ceilings"), surfaceIds]).default("all-ceilings"), targetRIP: pos(100), costUSD: nonneg(1e7), lifeYears: life() }),
  z.object({ type: z.literal("air-sealing"), name: text().optional(), targetCfm50: pos(100_000), costUSD: nonneg(1e7), lifeYears: life() }),
  z.object({ type: z.literal("windows"), name: text().optional(), surfaceIds: z.union([z.literal("all"), surfaceIds]).default("all"), uFactorIP: pos(2), costUSD: nonneg(1e7), lifeYears: life() }),
]);

export const climateSchema = z.discriminatedUnion("source", [
  z.object({ source: z.literal("station"), wmo: z.string().regex(/^\d{5,6}$/, { error: "must be a 5- or 6-digit WMO number" }) }),
  z.object({ source: z.literal("manual"), hdd65: nonneg(20_000), heatingDesignTempF: range(-80, 80), cdd65: nonneg(10_000).optional(), sourceText: text(500) }),
  z.object({ source: z.literal("epw"), name: text(), hdd65: nonneg(20_000), cdd65: nonneg(10_000), heatingDesign996F: range(-80, 80), heatingDesign99F: range(-80, 80), sourceText: text(500) }),
]);

/** The list rules of `surfaces`, the same for the full schema and the shell the fast path uses. */
function surfaceList<T extends z.ZodType>(item: T) {
  return z.array(item).min(1, { error: "needs at least one surface" }).max(1000);
}

export const houseInputSchema = z.object({
  name: text().optional(),
  yearBuilt: int(1600, 2100),
  stories: range(1, 4),
  floorAreaFt2: pos(100_000),
  volumeFt3: pos(2_000_000),
  bedrooms: int(0, 30),
  storeyHeightFt: pos(30).optional(),
  ventilationHeightFt: pos(100).optional(),
  indoorTempF: range(50, 90).default(70),
  indoorRH: range(0.05, 0.95).default(0.4),
  climate: climateSchema,
  designPercentile: z.enum(["99.6", "99"]).default("99"),
  heating: z.object({
    fuel: z.enum(["natural-gas", "oil", "propane", "electric-resistance", "heat-pump"]),
    efficiency: z.discriminatedUnion("kind", [
      z.object({ kind: z.literal("afue"), value: bounded(0, 1, { exclusiveMin: true, below: "must be greater than 0", above: "must be at most 1 (write 78 % as 0.78)" }) }),
      z.object({ kind: z.literal("cop"), value: pos(8) }),
      z.object({ kind: z.literal("hspf"), value: pos(20) }),
    ]),
    pricePerUnitUSD: nonneg(1_000),
  }),
  correctionFactor: pos(3).default(1),
  gridLbPerKWh: nonneg(5).optional(),
  blowerDoor: z.object({ cfm50TestIn: pos(100_000), cfm50TestOut: pos(100_000).optional() }),
  infiltration: z.object({
    method: z.enum(["n-factor", "ashrae-basic"]).default("n-factor"),
    nFactorZone: z.union([z.literal(1), z.literal(2), z.literal(3), z.literal(4)]).default(2),
    shielding: z.enum(["well-shielded", "normal", "exposed"]).default("normal"),
    nFactorOverride: pos(100).optional(),
    shelterClass: z.union([z.literal(1), z.literal(2), z.literal(3), z.literal(4), z.literal(5)]).default(4),
    flowExponent: range(0.4, 1).default(0.65),
    seasonalDeltaTF: nonneg(150).default(30),
    seasonalWindMph: nonneg(60).default(7),
    designWindMph: nonneg(100).default(15),
  }).prefault({}),
  assemblies: z.array(assemblySchema).max(200).default([]),
  surfaces: surfaceList(surfaceSchema),
  upgrades: z.array(upgradeSchema).max(30).default([]),
  economics: z.object({ discountRate: range(0, 0.3).default(0.03), fuelEscalationRate: range(-0.1, 0.2).default(0) }).prefault({}),
  densePack: z.object({ densityLbFt3: pos(10).default(3.5), bagWeightLb: pos(100).default(25), highRatio: range(1, 5).default(1.3), lowRatio: range(0.05, 1).default(0.8) }).prefault({}),
  ventilation: z.object({ wsf: pos(3).default(0.5), balanced: z.boolean().default(false) }).prefault({}),
  facts: z.object({ knobAndTube: presence.default("unknown"), vermiculite: presence.default("unknown"), combustionAppliances: z.boolean().optional() }).prefault({}),
  crewLog: z.array(z.object({ surfaceId: text(100), bagsActual: nonneg(10_000) })).max(1000).default([]),
});

/**
 * Everything but the surfaces' contents: analyzeHouse parses this with zod and the surfaces with
 * the fast path of calc/fast-surfaces.ts; any surface the fast path does not accept sends the
 * whole input back through `houseInputSchema`, so every message still comes from zod.
 */
export const houseInputShellSchema = houseInputSchema.extend({ surfaces: surfaceList(z.unknown()) });

/** What callers send (defaults optional). */
export type HouseInput = z.input<typeof houseInputSchema>;
/** After parsing, with every default filled in. */
export type HouseInputParsed = z.output<typeof houseInputSchema>;
export type UpgradeInput = z.output<typeof upgradeSchema>;
