// The assessment of one job as the browser edits it: the house facts, heating, blower-door readings,
// surfaces with their openings, the job's own layer stacks and the ordered upgrades. Field names
// follow calc's house input where they mean the same thing, so calc's error paths point at fields.
import { z } from "zod";
import { assemblySchema, climateSchema, houseInputSchema, surfaceSchema, upgradeSchema, type HouseInput } from "@/calc/schema";

// Bounds come from calc's own schema, so the browser, the API and the engine agree on every field.
const hs = houseInputSchema.shape;

const presence = z.enum(["present", "absent", "unknown"]);

export const leakageTestSchema = z.object({
  id: z.string().min(1).max(100),
  phase: z.enum(["test-in", "test-out"]),
  cfm50: hs.blowerDoor.shape.cfm50TestIn,
  testedAt: z.number().int(),
  outdoorTempF: z.number().nullable().optional(),
  windMph: z.number().nullable().optional(),
  notes: z.string().max(1000).nullable().optional(),
});

// Per-job changes to an upgrade's priced lines (lib/documents/proposal-lines.ts): quantities and
// unit prices by line key, and an override of the whole installed cost that must say why.
const lineOverrideSchema = z.object({
  quantity: z.number({ error: "quantity must be a number" }).min(0, "quantity cannot be negative").max(1_000_000, "quantity must be at most 1,000,000").optional(),
  unitPriceCents: z.number({ error: "unit price must be a number" }).int("unit price must be whole cents").min(0, "unit price cannot be negative").max(100_000_000, "unit price must be at most $1,000,000").optional(),
});
export const upgradePricingSchema = z.object({
  lines: z.record(z.string().min(1).max(40), lineOverrideSchema).optional(),
  totalOverride: z
    .object({
      cents: z.number({ error: "installed cost must be a number" }).int("installed cost must be whole cents").min(0, "installed cost cannot be negative").max(1_000_000_000, "installed cost must be at most $10,000,000"),
      reason: z.string().trim().min(1, "say why the total is overridden").max(300, "reason must be at most 300 characters"),
    })
    .nullable()
    .optional(),
});

export const assessmentDocSchema = z.object({
  house: z.object({
    yearBuilt: hs.yearBuilt,
    stories: hs.stories,
    floorAreaFt2: hs.floorAreaFt2,
    volumeFt3: hs.volumeFt3,
    ceilingHeightFt: hs.storeyHeightFt.nullable(),
    bedrooms: hs.bedrooms,
    foundation: z.enum(["basement", "crawlspace", "slab", "other"]),
    shielding: z.enum(["well-shielded", "normal", "exposed"]),
    indoorTempF: hs.indoorTempF.unwrap(),
    indoorRH: hs.indoorRH.unwrap(),
    climate: climateSchema.nullable(),
    hazards: z.object({
      knobAndTube: presence,
      vermiculite: presence,
      leadPaint: presence.optional(),
      combustionAppliances: z.array(z.string().max(200)).max(20),
    }),
  }),
  heating: hs.heating,
  leakage: z.object({ tests: z.array(leakageTestSchema).max(50), targetCfm50: hs.blowerDoor.shape.cfm50TestIn.nullable().optional() }),
  // Surfaces keep calc's shape plus an id per opening; calc checks every number of them on save.
  surfaces: z.array(z.intersection(surfaceSchema, z.object({ openings: z.array(z.looseObject({ id: z.string().max(100).optional() })).max(100).default([]) }))).max(1000),
  assemblies: z.array(assemblySchema).max(200),
  upgrades: z.array(z.intersection(upgradeSchema, z.object({ id: z.string().min(1).max(100), priceBookItemId: z.string().nullable().optional(), pricing: upgradePricingSchema.nullable().optional() }))).max(30),
});

type CalcSurface = HouseInput["surfaces"][number];
export type AssessmentOpening = NonNullable<CalcSurface["openings"]>[number] & { id?: string };
export type AssessmentDoc = Omit<z.input<typeof assessmentDocSchema>, "surfaces"> & {
  surfaces: (Omit<CalcSurface, "openings"> & { openings: AssessmentOpening[] })[];
};
export type AssessmentSurface = AssessmentDoc["surfaces"][number];
export type AssessmentUpgrade = AssessmentDoc["upgrades"][number];
export type LeakageTest = z.input<typeof leakageTestSchema>;

/** The newest reading of a phase, or undefined. */
export function latestTest(doc: Pick<AssessmentDoc, "leakage">, phase: "test-in" | "test-out") {
  return doc.leakage.tests.filter((t) => t.phase === phase).sort((a, b) => b.testedAt - a.testedAt)[0];
}
