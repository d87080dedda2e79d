import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { centsToDollars, formatDollars, MAX_CENTS, parseDollars } from "@/lib/money";

describe("parseDollars", () => {
  it.each([
    ["12.50", 1250],
    ["12.5", 1250],
    ["12", 1200],
    ["12.", 1200],
    [".5", 50],
    ["0.29", 29], // 0.29 * 100 is 28.999999999999996 in floating point; digits give 29
    ["0.07", 7],
    ["1.10", 110],
    ["$16.50", 1650],
    ["  $ 16.50 ", 1650],
    ["+3", 300],
    ["$ 16.50", 1650],
    ["1,250", 125_000],
    ["1,250,000.75", 125_000_075],
    ["007.10", 710],
    ["0", 0],
    ["-0", 0],
    ["0.00", 0],
    [12.5, 1250],
    [19.99, 1999],
    [0, 0],
  ])("reads %j as %i cents", (input, cents) => {
    expect(parseDollars(input)).toEqual({ ok: true, cents });
  });

  it.each([
    ["", "empty"],
    ["   ", "empty"],
    [undefined, "empty"],
    [null, "empty"],
    ["-1", "negative"],
    ["-$1.00", "negative"],
    ["$-1.00", "negative"],
    ["−2.50", "negative"], // a typographic minus
    [-0.01, "negative"],
    ["1.234", "precision"],
    ["0.001", "precision"],
    [0.1 + 0.2, "precision"],
    ["abc", "format"],
    ["12,50", "format"],
    ["1,2500", "format"],
    ["1.2.3", "format"],
    ["$", "format"],
    [".", "format"],
    ["1e3", "format"],
    ["0x10", "format"],
    ["12 50", "format"], // 1250 or 12.50? Refused rather than guessed.
    ["1 250.00", "format"],
    [Number.NaN, "format"],
    [Number.POSITIVE_INFINITY, "format"],
    [1e21, "format"],
    [true, "format"],
    [{}, "format"],
  ])("refuses %j (%s)", (input, reason) => {
    expect(parseDollars(input)).toEqual({ ok: false, reason });
  });

  it("refuses amounts above the limit, by default $1 billion", () => {
    expect(parseDollars("1000000000")).toEqual({ ok: true, cents: MAX_CENTS });
    expect(parseDollars("1000000000.01")).toEqual({ ok: false, reason: "too-large" });
    expect(parseDollars("99999999999999999999")).toEqual({ ok: false, reason: "too-large" });
    expect(parseDollars("100.01", { maxCents: 10_000 })).toEqual({ ok: false, reason: "too-large" });
    expect(parseDollars("100.00", { maxCents: 10_000 })).toEqual({ ok: true, cents: 10_000 });
  });

  it("reads back whatever centsToDollars writes, plain or formatted", () => {
    fc.assert(
      fc.property(fc.integer({ min: 0, max: MAX_CENTS }), (cents) => {
        expect(parseDollars(centsToDollars(cents))).toEqual({ ok: true, cents });
        expect(parseDollars(formatDollars(cents))).toEqual({ ok: true, cents });
      }),
    );
  });
});

describe("centsToDollars", () => {
  it.each([
    [0, "0.00"],
    [5, "0.05"],
    [1650, "16.50"],
    [125_000, "1250.00"],
    [-405, "-4.05"],
  ])("writes %i cents as %s", (cents, text) => {
    expect(centsToDollars(cents)).toBe(text);
  });

  it("adds the symbol and thousands separators when asked", () => {
    expect(centsToDollars(123_456_789, { symbol: true, grouping: true })).toBe("$1,234,567.89");
    expect(centsToDollars(99_999, { grouping: true })).toBe("999.99");
    expect(formatDollars(25_000)).toBe("$250.00");
    expect(formatDollars(-405)).toBe("-$4.05");
  });

  it("refuses fractions of a cent and non-numbers rather than printing something wrong", () => {
    expect(() => centsToDollars(12.5)).toThrow(RangeError);
    expect(() => centsToDollars(Number.NaN)).toThrow(RangeError);
  });
});
