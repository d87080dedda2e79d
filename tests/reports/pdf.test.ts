// PDF documents: both render from a snapshot, parse with a PDF text extractor, have the expected
// page count, carry the headline figures as the screen formats them, the company name and
// "Page N of M" on every page, only glyphs the shipped fonts have, and turn into PNG pages.
import { execFileSync } from "node:child_process";
import { mkdtempSync, readdirSync, readFileSync, rmSync, statSync } from "node:fs";
import { createRequire } from "node:module";
import { writeFile } from "node:fs/promises";
import os from "node:os";
import path from "node:path";
import { PDFParse } from "pdf-parse";
import sharp from "sharp";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import * as f from "@/components/assessment/results/format";
import { headline, type ReportSnapshot } from "@/lib/documents/snapshot";
import { formatDollars } from "@/lib/money";
import { fontFile, woffToSfnt } from "@/reports/parts/fonts";
import { renderSnapshotPdf } from "@/reports/render";
import { demoSnapshot } from "@/tests/support/demo-snapshot";

type Parsed = { total: number; pages: { num: number; text: string }[]; text: string };

async function parse(buf: Buffer): Promise<Parsed> {
  const parser = new PDFParse({ data: new Uint8Array(buf) });
  try {
    const r = await parser.getText();
    return { total: r.total, pages: r.pages, text: r.text };
  } finally {
    await parser.destroy();
  }
}

// The PDF's figures go through the same formatter as the screen, with "−" written as "-".
const pdf = (s: string) => s.replace(/\u2212/g, "-");
// Text extraction may break a line anywhere a space is: compare with runs of whitespace folded.
const fold = (s: string) => s.replace(/\s+/g, " ");

const tmp = mkdtempSync(path.join(os.tmpdir(), "warmstead-pdf-"));
afterAll(() => rmSync(tmp, { recursive: true, force: true }));

function pngPages(buf: Buffer, name: string) {
  return (async () => {
    const file = path.join(tmp, `${name}.pdf`);
    await writeFile(file, buf);
    execFileSync("pdftoppm", ["-r", "60", "-png", file, path.join(tmp, name)]);
    return readdirSync(tmp).filter((x) => x.startsWith(`${name}-`) && x.endsWith(".png")).map((x) => path.join(tmp, x));
  })();
}

function expectHeadlines(text: string, s: ReportSnapshot) {
  const h = headline(s);
  const t = fold(text);
  expect(t).toContain(pdf(f.usd(h.yearlySavingUSD)));
  expect(h.paybackYears).not.toBeNull();
  expect(t).toContain(pdf(f.num(h.paybackYears!, 1)));
  expect(t).toContain(pdf(f.years(h.paybackYears)));
  expect(t).toContain(pdf(f.usd(h.annualCostBeforeUSD)));
  expect(t).toContain(pdf(f.usd(h.annualCostAfterUSD)));
  expect(t).toContain(f.fuel(s.analysis.package.savings.fuelUnits, s.analysis.package.savings.fuelUnit));
  const cut = (h.cfm50Before - h.cfm50After) / h.cfm50Before;
  expect(t).toContain(f.percent(cut));
}

function expectFrames(p: Parsed, company: string) {
  expect(p.pages.length).toBe(p.total);
  for (const page of p.pages) {
    expect(fold(page.text), `page ${page.num}`).toContain(company);
    expect(fold(page.text), `page ${page.num}`).toContain(`Page ${page.num} of ${p.total}`);
  }
}

// fontkit (React-PDF's own font reader) ships no types; only these members are used.
type FkFont = { hasGlyphForCodePoint(c: number): boolean; numGlyphs: number; characterSet: number[]; postscriptName: string; type: string };
const fontkit = createRequire(import.meta.url)("fontkit") as { openSync(p: string): FkFont; create(b: Uint8Array): FkFont };

// Every character the PDF draws is one the latin subset of the shipped fonts carries.
function expectGlyphsInFonts(text: string) {
  const open = (file: string) => fontkit.openSync(fontFile(file));
  const body = open("source-sans-3-latin-400-normal.woff");
  const display = open("fraunces-latin-700-normal.woff");
  const missing = new Set<string>();
  for (const ch of text) {
    const c = ch.codePointAt(0)!;
    if (c < 0x20) continue;
    if (!body.hasGlyphForCodePoint(c) || !display.hasGlyphForCodePoint(c)) missing.add(ch);
  }
  expect([...missing]).toEqual([]);
  for (const ch of ["\u2212", "\u2248", "\u2264", "\u2265", "\u0394", "\u2192"]) expect(text).not.toContain(ch);
}

describe("report fonts", () => {
  it("unpacks each shipped WOFF into the same font as a plain sfnt", () => {
    for (const name of ["source-sans-3-latin-400-normal.woff", "source-sans-3-latin-700-normal.woff", "fraunces-latin-600-normal.woff"]) {
      const woff = fontkit.openSync(fontFile(name));
      const sfnt = fontkit.create(new Uint8Array(woffToSfnt(readFileSync(fontFile(name)))));
      expect(woff.type).toBe("WOFF");
      expect(sfnt.type).toBe("TTF");
      expect(sfnt.postscriptName).toBe(woff.postscriptName);
      expect(sfnt.numGlyphs).toBe(woff.numGlyphs);
      expect(sfnt.characterSet).toEqual(woff.characterSet);
    }
  });
});

describe("savings report PDF", () => {
  const snap = demoSnapshot("savings-report");
  let buf: Buffer;
  let parsed: Parsed;
  beforeAll(async () => {
    buf = await renderSnapshotPdf(snap);
    parsed = await parse(buf);
  });

  it("is a PDF of 4 to 6 pages", () => {
    expect(buf.subarray(0, 5).toString("latin1")).toBe("%PDF-");
    expect(parsed.total).toBeGreaterThanOrEqual(4);
    expect(parsed.total).toBeLessThanOrEqual(6);
  });

  it("opens in plain words with the headline figures formatted as on screen", () => {
    const first = fold(parsed.pages[0].text);
    expect(first).toContain("Your savings report");
    expect(first).toContain("17 Alder Crescent, Millbrook Falls, NJ 07990");
    expect(first).toContain(pdf(f.usd(snap.analysis.package.savings.usd)));
    expect(first).toContain(pdf(f.num(snap.analysis.package.simplePaybackYears!, 1)));
    expectHeadlines(parsed.text, snap);
  });

  it("puts the company name and Page N of M in every page's footer", () => {
    expectFrames(parsed, "Kestrel Bay Home Performance");
    expect(parsed.pages[0].text).toContain("Page 1 of");
  });

  it("has the charts, upgrades, findings, cautions with their documents, methods and the estimates statement", () => {
    const t = fold(parsed.text);
    for (const heading of ["Heat loss by part of the house", "Heating cost a year", "Air leakage (blower door, CFM50)", "Savings add up against the cost of the work", "Your upgrades", "Moisture and fresh air", "Safety during the work", "How we calculated this", "These figures are estimates"]) {
      expect(t).toContain(heading);
    }
    for (const u of snap.analysis.upgrades) {
      expect(t).toContain(u.name);
      expect(t).toContain(pdf(f.sir(u.sir)));
    }
    for (const c of snap.analysis.cautions) expect(t).toContain(fold(c.document));
    for (const m of snap.analysis.methods) expect(t).toContain(m.topic);
    expect(t).toContain(snap.analysis.climate.name);
    expect(t).toContain("local codes and licensed practice");
    expect(t).not.toContain("leakage figures are measured");
  });

  it("draws only glyphs the shipped fonts have", () => expectGlyphsInFonts(parsed.text));

  it("turns into PNG pages with pdftoppm", async () => {
    const pngs = await pngPages(buf, "report");
    expect(pngs.length).toBe(parsed.total);
    for (const p of pngs) expect(statSync(p).size).toBeGreaterThan(5_000);
  });
});

describe("savings report PDF after test-out", () => {
  it("says the leakage figures are measured", async () => {
    const snap = demoSnapshot("savings-report", { measured: true });
    expect(snap.leakageBasis).toBe("measured");
    const p = await parse(await renderSnapshotPdf(snap));
    const t = fold(p.text);
    expect(t).toContain("The leakage figures are measured");
    expect(t).toContain(f.num(snap.analysis.final.cfm50));
    expect(t).toContain("Test-out");
  });
});

// A report that runs well past its demo length: the crew log, photos on several pages, and twice
// the cautions and methods. Pages split inside sections, so the frame and the numbering must follow
// onto every continued page, and no section or photo-group heading may be left alone at a page foot.
describe("long savings report PDF", () => {
  const base = demoSnapshot("savings-report", { measured: true });
  const DAY = 86_400_000;
  const captions = ["Attic hatch before", "Attic hatch after", "North wall before", "North wall after", "Blowing the north wall", "Infrared scan, north wall", "Plugging holes", "Infrared scan, attic", "Basement rim"];
  const tags = ["before", "after", "before", "after", "during", "thermal", "during", "thermal", "before"] as const;
  const photos = tags.map((tag, i) => ({ id: `p${i}`, tag, caption: captions[i]!, surfaceId: i < 4 ? `s${i >> 1}` : null, surfaceLabel: i < 4 ? `Surface ${i >> 1}` : null, takenAt: base.issuedAt - i * DAY, width: i % 2 ? 480 : 640, height: i % 2 ? 640 : 480 }));
  const snap: ReportSnapshot = {
    ...base,
    photos,
    crewSummary: {
      entries: 23,
      bags: { expected: 310, logged: 335.5, ratio: 1.082 },
      holes: { expected: 196, logged: 180 },
      wallsFinished: 8,
      wallsTotal: 9,
      perWall: Array.from({ length: 9 }, (_, i) => ({ surfaceId: `w${i}`, name: `Wall ${i + 1}`, expectedBags: 40 + i, loggedBags: 38 + i * 1.5, ratio: (38 + i * 1.5) / (40 + i), status: "ok", finished: i !== 3 })),
      warnings: Array.from({ length: 6 }, (_, i) => ({ wall: `Wall ${i + 1}`, kind: i % 2 ? "overfill" : "underfill", bagsAtRaise: 50 + i, raisedAt: base.issuedAt - i * DAY, state: (["open", "resolved", "cleared"] as const)[i % 3], resolution: i % 3 === 1 ? { note: "Chase open to the attic, blocked and re-blown", by: "Sam", at: base.issuedAt - i * DAY + 3_600_000 } : null })),
      testOut: { testInCfm50: 3900, predictedCfm50: 2400, measuredCfm50: 2250, measuredReductionPct: 42, testedAt: base.issuedAt + 30 * DAY },
    },
    analysis: {
      ...base.analysis,
      cautions: [...base.analysis.cautions, ...base.analysis.cautions.map((c) => ({ ...c, id: `${c.id}-again` }))],
      methods: [...base.analysis.methods, ...base.analysis.methods] as unknown as typeof base.analysis.methods,
    },
  };
  const headings = [
    "What the crew did", "Your upgrades", "Moisture and fresh air", "Fresh air (ASHRAE 62.2-2016)", "Moisture in walls and ceilings after the work", "Safety during the work",
    "How we calculated this", "Inputs", "Climate data", "Notes on the inputs", "Methods and sources", "Photos from your house", "Before and after", "During the work", "Thermal image", "Before",
  ];
  let parsed: Parsed;
  beforeAll(async () => {
    const images: Record<string, Buffer> = {};
    for (const ph of photos) images[ph.id] = await sharp({ create: { width: ph.width, height: ph.height, channels: 3, background: "#806040" } }).jpeg().toBuffer();
    parsed = await parse(await renderSnapshotPdf(snap, { images }));
  });

  it("carries the frame and Page N of M onto every continued page", () => {
    expect(parsed.total).toBeGreaterThanOrEqual(8);
    expectFrames(parsed, "Kestrel Bay Home Performance");
    const t = fold(parsed.text);
    for (const c of captions) expect(t).toContain(c);
    for (let i = 1; i <= 9; i++) expect(t).toContain(`Wall ${i}`);
  });

  it("never leaves a heading alone at the foot of a page", () => {
    // The frame's text (title band, company, page number) is dropped wherever extraction puts it.
    const unframed = (line: string) => line.replace(/^SAVINGS REPORT .*$/, "").replace("Kestrel Bay Home Performance", "").replace(/Page \d+ of \d+/, "").trim();
    for (const page of parsed.pages.slice(0, -1)) {
      const lines = page.text.split("\n").map(unframed).filter(Boolean);
      expect(headings, `page ${page.num} ends with "${lines.at(-1)}"`).not.toContain(lines.at(-1));
    }
  });
});

describe("proposal PDF", () => {
  const snap = demoSnapshot("proposal");
  let buf: Buffer;
  let parsed: Parsed;
  beforeAll(async () => {
    buf = await renderSnapshotPdf(snap);
    parsed = await parse(buf);
  });

  it("has six priced lines in the demo snapshot", () => {
    expect(snap.proposal?.lines).toHaveLength(6);
    const p = snap.proposal!;
    expect(p.lines.reduce((a, l) => a + l.totalCents, 0)).toBe(p.subtotalCents);
    expect(p.subtotalCents + p.taxCents).toBe(p.totalCents);
  });

  it("is the proposal pages followed by the savings report pages", async () => {
    const report = await parse(await renderSnapshotPdf(demoSnapshot("savings-report")));
    expect(parsed.total).toBeGreaterThanOrEqual(report.total + 1);
    expect(parsed.total).toBeLessThanOrEqual(report.total + 2);
    expect(fold(parsed.pages[0].text)).toContain("Proposal");
    const firstReportPage = parsed.pages.findIndex((p) => fold(p.text).includes("Your savings report"));
    expect(firstReportPage).toBe(parsed.total - report.total);
  });

  it("lists every line with quantity, unit, unit price and total, then subtotal, tax, total, deposit and validity", () => {
    const p = snap.proposal!;
    const t = fold(parsed.text);
    for (const l of p.lines) {
      expect(t).toContain(fold(l.description).slice(0, 30));
      expect(t).toContain(formatDollars(l.unitPriceCents));
      expect(t).toContain(formatDollars(l.totalCents));
    }
    expect(t).toContain(formatDollars(p.subtotalCents));
    expect(t).toContain("6.625 %");
    expect(t).toContain(formatDollars(p.taxCents));
    expect(t).toContain(formatDollars(headline(snap).totalCents!));
    expect(t).toContain(formatDollars(p.depositCents));
    expect(t).toContain("Valid until November 13, 2025");
    expect(t).toContain(snap.company.licenseLine!);
    expect(t).toContain(snap.company.insuranceLine!);
    expect(t).toContain("Accept in your Warmstead portal");
  });

  it("carries the savings report's headline figures and the footer on every page", () => {
    expectHeadlines(parsed.text, snap);
    expectFrames(parsed, "Kestrel Bay Home Performance");
    expect(parsed.pages[0].text).toContain("Page 1 of");
    expectGlyphsInFonts(parsed.text);
  });

  it("turns into PNG pages with pdftoppm", async () => {
    const pngs = await pngPages(buf, "proposal");
    expect(pngs.length).toBe(parsed.total);
  });
});
