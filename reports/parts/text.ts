// Text for the PDFs: the shipped fonts are the latin subset, which has no ≈ ≤ ≥ → Δ Φ η (and the
// brief for the reports keeps "−" out too). Every string that reaches a PDF goes through `pdfText`,
// and the formatters here are the screen's (components/assessment/results/format.ts) passed
// through it, so the screen and the PDF show the same figures.
import * as f from "@/components/assessment/results/format";
import { taxRateLabel } from "@/lib/documents/snapshot";
import { formatDollars } from "@/lib/money";

const REPLACE: [RegExp, string][] = [
  [/\u2212/g, "-"], // minus sign
  [/\u2248/g, "about "], // almost equal
  [/\u2264/g, "<="],
  [/\u2265/g, ">="],
  [/\s*\u2192\s*/g, " to "], // right arrow, as in "3,900 → 2,400"
  [/\u0394/g, "delta "],
  [/\u03a6/g, "phi"],
  [/\u03b7/g, "efficiency"],
  [/\u2713/g, "yes"],
  [/\u203a/g, ">"],
];

// The characters the latin subset carries (fontkit's characterSet of the shipped WOFF files).
const IN_FONT = /[^\u0000-\u00ff\u0131\u0152\u0153\u02c6\u02da\u02dc\u2013\u2014\u2018\u2019\u201a\u201c\u201d\u201e\u2022\u2026\u2032\u2033\u2039\u20ac\u2122]/g;

/** A string the report fonts can draw: known glyphs replaced by words, anything else dropped. */
export function pdfText(x: string): string {
  let out = x;
  for (const [re, to] of REPLACE) out = out.replace(re, to);
  return out.replace(IN_FONT, "");
}

const safe = <A extends unknown[]>(fn: (...a: A) => string) => (...a: A) => pdfText(fn(...a));

export const num = safe(f.num);
export const usd = safe(f.usd);
export const usdCents = safe(f.usdCents);
export const years = safe(f.years);
export const sir = safe(f.sir);
export const percent = safe(f.percent);
export const fuel = safe(f.fuel);
export const ach = safe(f.ach);
export const achNatural = safe(f.achNatural);
export const cfm50 = safe((x: number) => f.cfm50(x, "ip"));
export const cfm50Change = safe((a: number, b: number) => f.cfm50Change(a, b, "ip"));
export const power = safe((x: number) => f.power(x, "ip"));
export const temp = safe((x: number) => f.temp(x, "ip"));
export const area = safe((x: number) => f.area(x, "ip"));
export const volume = safe((x: number) => f.volume(x, "ip"));
export const flow = safe((x: number, digits?: number) => f.flow(x, "ip", digits ?? 0));
export const co2 = safe((x: number) => f.co2(x, "ip"));
export const energy = safe((x: number) => f.energy(x, "ip"));
export const degreeDays = safe((x: number) => f.degreeDays(x, "ip"));
export const ua = safe((x: number) => f.ua(x, "ip"));
export const dollars = safe(formatDollars);

const day = new Intl.DateTimeFormat("en-US", { dateStyle: "long", timeZone: "America/New_York" });
/** A date as the homeowner reads it: "October 14, 2025". */
export const date = (ms: number) => day.format(new Date(ms));

/** A tax rate in parts per million as written: 66 250 → "6.625 %". */
export const taxRate = taxRateLabel;
