import { readFileSync } from "node:fs";
import path from "node:path";
import { describe, expect, it } from "vitest";

// WCAG 2.1 relative luminance and contrast ratio, success criterion 1.4.3 (>= 4.5:1 for body text).
function luminance(hex: string) {
  const [r, g, b] = [1, 3, 5].map((i) => parseInt(hex.slice(i, i + 2), 16) / 255).map((c) => (c <= 0.04045 ? c / 12.92 : ((c + 0.055) / 1.055) ** 2.4));
  return 0.2126 * r + 0.7152 * g + 0.0722 * b;
}
function contrast(a: string, b: string) {
  const [hi, lo] = [luminance(a), luminance(b)].sort((x, y) => y - x);
  return (hi + 0.05) / (lo + 0.05);
}

const css = readFileSync(path.resolve(__dirname, "../../app/globals.css"), "utf8");
const colour = (name: string) => {
  const m = css.match(new RegExp(`--color-${name}:\\s*(#[0-9a-f]{6})`, "i"));
  if (!m) throw new Error(`--color-${name} not in globals.css`);
  return m[1];
};

describe("palette contrast (WCAG 2.1 SC 1.4.3)", () => {
  it("checks the formula on a known pair: black on white is 21:1", () => {
    expect(contrast("#000000", "#ffffff")).toBeCloseTo(21, 5);
  });

  const textOnBackgrounds: [string, string][] = [
    ["charcoal", "paper"],
    ["ink-muted", "paper"],
    ["ink-muted", "paper-deep"],
    ["spruce-700", "paper"],
    ["spruce-800", "paper"],
    ["ember-700", "paper"],
    ["danger", "paper"],
    ["danger", "danger-bg"],
    ["warn", "warn-bg"],
  ];
  it.each(textOnBackgrounds)("%s text on %s is at least 4.5:1", (fg, bg) => {
    expect(contrast(colour(fg), colour(bg))).toBeGreaterThanOrEqual(4.5);
  });

  it.each([["spruce-700"], ["ember-600"]])("white button text on %s is at least 4.5:1", (bg) => {
    expect(contrast("#ffffff", colour(bg))).toBeGreaterThanOrEqual(4.5);
  });
});
