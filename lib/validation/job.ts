import { z } from "zod";
import { choice, num, optionalEmail, optionalNum, optionalText, text } from "./fields";

import { jobStages } from "@/lib/stages";

export const stageValues = jobStages;
export const storiesValues = ["1", "1.5", "2", "2.5", "3"] as const;
export const foundationValues = ["basement", "crawlspace", "slab", "other"] as const;
export const shieldingValues = ["well-shielded", "normal", "exposed"] as const;

export const clientSchema = z.object({
  name: text("Client name", 120),
  email: optionalEmail("Client e-mail"),
  phone: optionalText("Phone", 40),
});

// Ranges are wide enough for any real house and narrow enough to catch a slipped digit.
export const houseFactsSchema = z
  .object({
    street: text("Street address", 160),
    city: text("Town or city", 80),
    state: z.string().trim().toUpperCase().regex(/^[A-Z]{2}$/, "State must be a two-letter code, e.g. NJ."),
    postalCode: z.string().trim().regex(/^\d{5}(-\d{4})?$/, "ZIP code must be five digits (or ZIP+4)."),
    yearBuilt: num("Year built", 1700, 2030, { int: true }),
    stories: choice("Stories", storiesValues).transform(Number),
    conditionedAreaFt2: num("Conditioned floor area", 100, 50_000, { unit: "ft²" }),
    ceilingHeightFt: optionalNum("Ceiling height", 6, 20, { unit: "ft" }),
    volumeFt3: optionalNum("Conditioned volume", 600, 1_000_000, { unit: "ft³" }),
    bedrooms: num("Bedrooms", 0, 20, { int: true }),
    foundation: choice("Foundation", foundationValues),
    shielding: choice("Shielding", shieldingValues),
    climateStationWmo: optionalText("Climate station", 12),
  })
  .refine((h) => h.volumeFt3 !== undefined || h.ceilingHeightFt !== undefined, {
    path: ["volumeFt3"],
    message: "Enter the conditioned volume, or a ceiling height to compute it.",
    // Say so alongside other field errors, unless those two fields are themselves the problem.
    when: (p) => !p.issues.some((i) => i.path?.[0] === "volumeFt3" || i.path?.[0] === "ceilingHeightFt"),
  })
  .transform((h) => ({
    ...h,
    volumeFt3: h.volumeFt3 ?? Math.round(h.conditionedAreaFt2 * (h.ceilingHeightFt ?? 0)),
  }));

export const newJobSchema = z.object({
  title: optionalText("Job title", 120),
  client: clientSchema,
  house: houseFactsSchema,
});
export type NewJobInput = z.infer<typeof newJobSchema>;

export const jobPatchSchema = z
  .object({
    version: z.number({ error: "Send the version of the job you edited." }).int().positive(),
    title: optionalText("Job title", 120),
    stage: choice("Stage", stageValues).optional(),
    stageNote: optionalText("Note", 500),
    auditorId: z.string().min(1).nullable().optional(),
    crewIds: z.array(z.string().min(1)).max(20, "At most 20 crew members.").optional(),
  })
  .strict();
export type JobPatch = z.infer<typeof jobPatchSchema>;

export const jobListQuerySchema = z.object({
  q: z.string().trim().max(100, "Search must be at most 100 characters.").optional(),
  stage: choice("Stage", stageValues).optional(),
  sort: z.enum(["updated", "number", "client", "stage"], { error: "Sort by updated, number, client or stage." }).default("updated"),
  dir: z.enum(["asc", "desc"], { error: "Direction must be asc or desc." }).default("desc"),
  page: z.coerce.number({ error: "Page must be a number." }).int("Page must be a whole number.").min(1, "Page starts at 1.").max(100_000).default(1),
  pageSize: z.coerce.number({ error: "Page size must be a number." }).int().min(1).max(100, "Page size must be at most 100.").default(25),
});
export type JobListQuery = z.infer<typeof jobListQuerySchema>;
