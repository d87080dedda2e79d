// Money is held in integer cents everywhere; dollars exist only as text typed by a person or shown
// to one. Both directions work on digits, never on floating-point arithmetic, so "0.29" is 29 cents.

/** Why a typed amount was refused. */
export type DollarsRefusal = "empty" | "format" | "negative" | "precision" | "too-large";

export type DollarsResult = { ok: true; cents: number } | { ok: false; reason: DollarsRefusal };

/** The largest amount `parseDollars` accepts unless told a smaller limit: $1 billion. */
export const MAX_CENTS = 100_000_000_000;

const plain = /^(\d*)(?:\.(\d*))?$/;
const grouped = /^(\d{1,3}(?:,\d{3})+)(?:\.(\d*))?$/;

/**
 * Reads dollars as a person types them — "12.50", "$12.50", "1,250", "12", ".5", or a JSON number —
 * into integer cents. Refuses negatives, more than two decimal places, anything that is not a plain
 * amount, and amounts above `maxCents` (default $1 billion).
 */
export function parseDollars(input: unknown, opts: { maxCents?: number } = {}): DollarsResult {
  const maxCents = opts.maxCents ?? MAX_CENTS;
  let text: string;
  if (typeof input === "number") {
    if (!Number.isFinite(input)) return { ok: false, reason: "format" };
    if (input < 0) return { ok: false, reason: "negative" };
    // String(1e21) is "1e+21": exponent forms fall through to the format check below.
    text = String(input);
  } else if (typeof input === "string") {
    text = input;
  } else {
    return { ok: false, reason: input === undefined || input === null ? "empty" : "format" };
  }

  let s = text.trim();
  if (s === "") return { ok: false, reason: "empty" };
  // A sign and a dollar symbol may lead, in either order, with spaces after them ("- $ 5" reads
  // as negative); spaces inside the digits are refused, since "12 50" could mean 1250 or 12.50.
  let negative = false;
  const strip = (re: RegExp) => {
    const m = re.exec(s);
    if (m) s = s.slice(m[0].length);
    return Boolean(m);
  };
  if (strip(/^[-−]\s*/)) negative = true;
  else strip(/^\+\s*/);
  strip(/^\$\s*/);
  if (!negative && strip(/^[-−]\s*/)) negative = true;

  const match = plain.exec(s) ?? grouped.exec(s);
  if (!match) return { ok: false, reason: "format" };
  const whole = (match[1] ?? "").replace(/,/g, "");
  const fraction = match[2] ?? "";
  if (whole === "" && fraction === "") return { ok: false, reason: "format" };
  if (negative && /[1-9]/.test(whole + fraction)) return { ok: false, reason: "negative" };
  if (fraction.length > 2) return { ok: false, reason: "precision" };

  const digits = whole.replace(/^0+(?=\d)/, "");
  // More whole-dollar digits than any limit could allow: refuse before the number loses precision.
  if (digits.length > 15) return { ok: false, reason: "too-large" };
  const cents = Number(digits || "0") * 100 + Number(fraction.padEnd(2, "0"));
  if (cents > maxCents) return { ok: false, reason: "too-large" };
  return { ok: true, cents };
}

type FormatOpts = { symbol?: boolean; grouping?: boolean };

/**
 * Integer cents → dollars text. Plain by default ("1250.00"), which reads back through
 * `parseDollars` unchanged, so it suits an input's value; `{ symbol: true, grouping: true }` gives
 * "$1,250.00" for display.
 */
export function centsToDollars(cents: number, opts: FormatOpts = {}): string {
  if (!Number.isSafeInteger(cents)) throw new RangeError(`centsToDollars needs whole cents, got ${cents}.`);
  const sign = cents < 0 ? "-" : "";
  const abs = Math.abs(cents);
  let whole = String(Math.floor(abs / 100));
  if (opts.grouping) whole = whole.replace(/\B(?=(\d{3})+(?!\d))/g, ",");
  const fraction = String(abs % 100).padStart(2, "0");
  return `${sign}${opts.symbol ? "$" : ""}${whole}.${fraction}`;
}

/** Cents as a person reads them: "$1,250.00", "-$4.05". */
export function formatDollars(cents: number): string {
  return centsToDollars(cents, { symbol: true, grouping: true });
}
