import { z } from "zod";

const blankToUndefined = (v: unknown) => (typeof v === "string" && v.trim() === "" ? undefined : v);

type NumOpts = { int?: boolean; unit?: string };

/** A number from a form or JSON, with a message that names the field and the allowed range. */
export function num(label: string, min: number, max: number, opts: NumOpts = {}) {
  const unit = opts.unit ? ` ${opts.unit}` : "";
  const range = `${label} must be ${opts.int ? "a whole number " : ""}between ${min.toLocaleString("en-US")} and ${max.toLocaleString("en-US")}${unit}.`;
  return z.preprocess(
    blankToUndefined,
    z.coerce
      .number({ error: (issue) => (issue.input === undefined ? `Enter ${label.toLowerCase()}.` : `${label} must be a number.`) })
      .refine((n) => Number.isFinite(n), `${label} must be a number.`)
      .refine((n) => !opts.int || Number.isInteger(n), `${label} must be a whole number.`)
      .refine((n) => n >= min && n <= max, range),
  );
}

export function optionalNum(label: string, min: number, max: number, opts: NumOpts = {}) {
  return z.preprocess(blankToUndefined, num(label, min, max, opts).optional());
}

export function text(label: string, max = 200) {
  return z
    .string({ error: `Enter ${label.toLowerCase()}.` })
    .trim()
    .min(1, `Enter ${label.toLowerCase()}.`)
    .max(max, `${label} must be at most ${max} characters.`);
}

export function optionalText(label: string, max = 200) {
  return z.preprocess(blankToUndefined, z.string().trim().max(max, `${label} must be at most ${max} characters.`).optional());
}

export function optionalEmail(label = "E-mail") {
  return z.preprocess(blankToUndefined, z.string().trim().toLowerCase().email(`${label} does not look like an e-mail address.`).optional());
}

export function choice<const T extends readonly [string, ...string[]]>(label: string, values: T) {
  return z.enum(values, { error: `Choose ${label.toLowerCase()} from the list.` });
}

/** Form fields named `client.name`, `house.yearBuilt` → nested objects, so one schema serves forms and JSON. */
export function unflatten(values: Record<string, string>): Record<string, unknown> {
  const out: Record<string, unknown> = {};
  for (const [key, value] of Object.entries(values)) {
    const parts = key.split(".");
    let node = out as Record<string, unknown>;
    parts.slice(0, -1).forEach((p) => {
      node = (node[p] ??= {}) as Record<string, unknown>;
    });
    node[parts[parts.length - 1]!] = value;
  }
  return out;
}
