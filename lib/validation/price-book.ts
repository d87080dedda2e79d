import { z } from "zod";
import type { PriceBookKind, PriceBookUnit } from "@/db/schema";
import { centsToDollars, parseDollars, type DollarsRefusal } from "@/lib/money";
import { choice, optionalText, text } from "./fields";

// The enum values repeat db/schema.ts so client components can import this file without the
// database layer; the checks below fail to compile if the two lists ever drift apart.
export const priceBookKindValues = ["material", "labour", "other"] as const;
export const priceBookUnitValues = ["bag", "hour", "hole", "ft2", "ft", "each", "permit"] as const;
type Same<A, B> = [A] extends [B] ? ([B] extends [A] ? true : false) : false;
const kindsMatch: Same<(typeof priceBookKindValues)[number], PriceBookKind> = true;
const unitsMatch: Same<(typeof priceBookUnitValues)[number], PriceBookUnit> = true;
void kindsMatch;
void unitsMatch;

export const priceBookKindLabels: Record<PriceBookKind, string> = { material: "Material", labour: "Labour", other: "Other" };
export const priceBookUnitLabels: Record<PriceBookUnit, string> = {
  bag: "bag",
  hour: "hour",
  hole: "hole",
  ft2: "ft²",
  ft: "ft",
  each: "each",
  permit: "permit",
};

/** The dearest unit price a price book accepts: $100,000.00. Anything above is a slipped digit. */
export const MAX_UNIT_PRICE_CENTS = 10_000_000;

function dollarsMessage(label: string, reason: DollarsRefusal, maxCents: number) {
  switch (reason) {
    case "empty":
      return `Enter ${label.toLowerCase()} in dollars, e.g. 12.50.`;
    case "format":
      return `${label} must be an amount in dollars, e.g. 12.50.`;
    case "negative":
      return `${label} cannot be negative.`;
    case "precision":
      return `${label} can have at most two decimal places (whole cents).`;
    case "too-large":
      return `${label} must be at most $${centsToDollars(maxCents, { grouping: true })}.`;
  }
}

/** Dollars as typed ("12.50", "$1,250", or a JSON number) → integer cents, with a message naming the field. */
export function dollars(label: string, maxCents: number) {
  return z.unknown().transform((value, ctx) => {
    const result = parseDollars(value, { maxCents });
    if (result.ok) return result.cents;
    ctx.addIssue({ code: "custom", message: dollarsMessage(label, result.reason, maxCents) });
    return z.NEVER;
  });
}

/** true/false from JSON, or "true"/"false"/"on"/"off"/"1"/"0" from a form. */
function flag(label: string) {
  return z.preprocess(
    (v) => {
      if (typeof v !== "string") return v;
      const s = v.trim().toLowerCase();
      if (["true", "on", "1", "yes"].includes(s)) return true;
      if (["false", "off", "0", "no"].includes(s)) return false;
      return v;
    },
    z.boolean({ error: `${label} must be yes or no.` }),
  );
}

export const codeField = z
  .string({ error: "Enter code." })
  .trim()
  .toUpperCase()
  .min(1, "Enter code.")
  .max(32, "Code must be at most 32 characters.")
  .regex(/^(?:[A-Z0-9][A-Z0-9._-]*)?$/, "Code may use only letters, digits, dots, dashes and underscores, and must start with a letter or digit.");

const fields = {
  code: codeField,
  name: text("Name", 120),
  description: optionalText("Description", 500),
  kind: choice("Kind", priceBookKindValues),
  unit: choice("Unit", priceBookUnitValues),
  unitPrice: dollars("Unit price", MAX_UNIT_PRICE_CENTS),
};

/** Object-level messages: an unknown key is named; a body that is not an object says what to send. */
function unknownKeys(issue: { code?: string; keys?: string[] }) {
  if (issue.code === "unrecognized_keys" && issue.keys?.length) return `Unknown field${issue.keys.length > 1 ? "s" : ""}: ${issue.keys.join(", ")}.`;
  if (issue.code === "invalid_type") return "Send the price book item as a JSON object.";
  return undefined;
}

export const newPriceBookItemSchema = z
  .strictObject({ ...fields, taxable: flag("Taxable").default(true) }, { error: unknownKeys })
  .transform(({ unitPrice, description, ...rest }) => ({ ...rest, description: description ?? null, unitPriceCents: unitPrice }));
export type NewPriceBookItemInput = z.infer<typeof newPriceBookItemSchema>;

export const priceBookPatchSchema = z
  .strictObject(
    {
      code: codeField.optional(),
      name: fields.name.optional(),
      // Sent blank, the description is cleared; left out, it is kept.
      description: z.union([z.null(), z.string().trim().max(500, "Description must be at most 500 characters.")], { error: "Description must be text." }).optional(),
      kind: fields.kind.optional(),
      unit: fields.unit.optional(),
      unitPrice: z.preprocess((v) => (v === null ? "" : v), fields.unitPrice).optional(),
      taxable: flag("Taxable").optional(),
      active: flag("Active").optional(),
      updatedAt: z
        .number({ error: "Send updatedAt as the item's last-changed time in milliseconds." })
        .int("Send updatedAt as whole milliseconds.")
        .nonnegative("Send updatedAt as the item's last-changed time in milliseconds.")
        .optional(),
    },
    { error: unknownKeys },
  )
  .refine((p) => Object.keys(p).some((k) => k !== "updatedAt" && p[k as keyof typeof p] !== undefined), { message: "Change at least one field.", when: (p) => p.issues.length === 0 })
  .transform(({ unitPrice, description, ...rest }) => ({
    ...rest,
    ...(description !== undefined ? { description: description === null || description === "" ? null : description } : {}),
    ...(unitPrice !== undefined ? { unitPriceCents: unitPrice } : {}),
  }));
export type PriceBookPatch = z.infer<typeof priceBookPatchSchema>;

export const priceBookQuerySchema = z.object({
  active: z.enum(["all", "true", "false"], { error: "Active must be all, true or false." }).default("all"),
});
export type PriceBookQuery = z.infer<typeof priceBookQuerySchema>;

/** The highest sales tax rate the company setting accepts: 25 %. */
export const MAX_TAX_RATE_PPM = 250_000;

/**
 * A sales tax rate typed as a percentage ("6.625", "6.625 %", or a JSON number) → parts per
 * million, read digit by digit so 6.625 is exactly 66 250 (up to four decimal places).
 */
export function parseTaxRatePercent(input: unknown): { ok: true; ppm: number } | { ok: false; message: string } {
  const text = typeof input === "number" ? (Number.isFinite(input) ? String(input) : "") : typeof input === "string" ? input.trim().replace(/\s*%$/, "") : null;
  if (text === null) return { ok: false, message: "Sales tax rate must be a percentage, e.g. 6.625." };
  if (text === "") return { ok: false, message: "Enter the sales tax rate as a percentage, e.g. 6.625 (0 for none)." };
  if (text.startsWith("-")) return { ok: false, message: "Sales tax rate cannot be negative." };
  const m = /^(\d{1,3})(?:\.(\d*))?$/.exec(text) ?? /^()\.(\d+)$/.exec(text);
  if (!m) return { ok: false, message: "Sales tax rate must be a percentage, e.g. 6.625." };
  const frac = m[2] ?? "";
  if (frac.length > 4) return { ok: false, message: "Sales tax rate can have at most four decimal places (e.g. 6.6250)." };
  const ppm = Number(m[1] || "0") * 10_000 + Number(frac.padEnd(4, "0"));
  if (ppm > MAX_TAX_RATE_PPM) return { ok: false, message: "Sales tax rate must be at most 25 %." };
  return { ok: true, ppm };
}

export const taxRateSchema = z.strictObject(
  {
    taxRatePercent: z.unknown().transform((value, ctx) => {
      const r = parseTaxRatePercent(value);
      if (r.ok) return r.ppm;
      ctx.addIssue({ code: "custom", message: r.message });
      return z.NEVER;
    }),
  },
  { error: (issue) => (issue.code === "unrecognized_keys" ? `Unknown field: ${(issue as { keys?: string[] }).keys?.join(", ")}.` : "Send { taxRatePercent } as a JSON object.") },
);
