// The results panel renders the analysis it is given: headline figures, every section and its
// "how" disclosures, in IP and SI. Rendered to static markup (the chart is client-only, so absent).
import { renderToStaticMarkup } from "react-dom/server";
import { describe, expect, it } from "vitest";
import { analyzeHouse, demoHouseInput, toSI } from "@/calc";
import { ResultsPanel } from "@/components/assessment/results";
import * as f from "@/components/assessment/results/format";

const analysis = analyzeHouse(demoHouseInput);
const render = (units: f.Units) => renderToStaticMarkup(<ResultsPanel analysis={analysis} units={units} />);

const decode = (s: string) =>
  s.replace(/&#x27;/g, "'").replace(/&quot;/g, '"').replace(/&lt;/g, "<").replace(/&gt;/g, ">").replace(/&amp;/g, "&");
const text = (html: string) => decode(html.replace(/<[^>]+>/g, " ")).replace(/\s+/g, " ");
/** Text of the element carrying data-testid (up to the close of its tag name). */
function byTestId(html: string, id: string): string {
  const m = html.match(new RegExp(`<(\\w+)[^>]*data-testid="${id}"[^>]*>`));
  if (!m || m.index === undefined) throw new Error(`no element with data-testid="${id}"`);
  const rest = html.slice(m.index);
  return text(rest.slice(0, rest.indexOf(`</${m[1]}>`))).trim();
}

const headings = [
  "Results", "What the plan saves", "Heat load and yearly energy", "Upgrades, in order", "Where the heat goes",
  "Air leakage", "Natural air changes per hour", "Ventilation", "Moisture in upgraded walls", "Dense-pack estimate",
  "Cautions", "Check these entries",
];

describe("ResultsPanel on the demo house, IP", () => {
  const html = render("ip");
  const all = text(html);
  const pkg = analysis.package;

  it("shows the headline figures of the analysis as large numerals", () => {
    expect(byTestId(html, "results-yearly-saving")).toBe(`${f.usd(pkg.savings.usd)} a year`);
    expect(f.usd(pkg.savings.usd)).toBe(`$${Math.round(pkg.savings.usd).toLocaleString("en-US")}`);
    expect(byTestId(html, "results-payback")).toBe(`${pkg.simplePaybackYears!.toFixed(1)} years`);
    const cut = (analysis.baseline.cfm50 - analysis.final.cfm50) / analysis.baseline.cfm50;
    expect(byTestId(html, "results-leakage-cut")).toBe(`${Math.round(cut * 100)} % less leakage`);
    expect(byTestId(html, "results-package-sir")).toBe(pkg.sir!.toFixed(2));
  });

  it("has every section heading", () => {
    for (const h of headings) expect(html).toMatch(new RegExp(`<h[234][^>]*>${h.replace(/[,.]/g, "\\$&")}</h[234]>`));
  });

  it("shows load, fuel, cost and CO2 before and after", () => {
    for (const e of [analysis.baseline, analysis.final]) {
      expect(all).toContain(f.power(e.designLoad.totalBtuh, "ip"));
      expect(all).toContain(f.fuel(e.energy.fuelUnits, e.energy.fuelUnit));
      expect(all).toContain(f.usd(e.energy.costUSD));
      expect(all).toContain(f.co2(e.energy.co2Lb, "ip"));
    }
    expect(f.power(analysis.baseline.designLoad.totalBtuh, "ip")).toBe(`${(Math.round(analysis.baseline.designLoad.totalBtuh / 100) * 100).toLocaleString("en-US")} Btu/h`);
  });

  it("gives each upgrade its sequenced saving, payback and SIR", () => {
    for (const u of analysis.upgrades) {
      const row = byTestId(html, `results-upgrade-${u.index}`);
      expect(row).toContain(u.name);
      expect(row).toContain(f.usd(u.savings.usd));
      expect(row).toContain(`${u.simplePaybackYears!.toFixed(1)} years`);
      expect(row).toContain(u.sir!.toFixed(2));
    }
  });

  it("shows leakage before and after with natural ACH by both methods", () => {
    for (const e of [analysis.baseline, analysis.final]) {
      expect(all).toContain(`${e.cfm50.toLocaleString("en-US")} CFM50`);
      expect(all).toContain(e.infiltration.ach50.toFixed(1));
      expect(all).toContain(e.infiltration.nFactor.achNat.toFixed(2));
      expect(all).toContain(e.infiltration.ashraeBasic.seasonal.ach.toFixed(2));
    }
  });

  it("shows the ventilation check, a moisture screen per upgraded wall stack, and the dense-pack estimate", () => {
    expect(byTestId(html, "results-ventilation-after")).toBe(analysis.ventilation.after.needsFan ? `Fan needed: ${f.flow(analysis.ventilation.after.fanCfm, "ip")} continuous` : "No fan needed");
    const wallStacks = new Set(analysis.final.envelope.surfaces.filter((s, i) => s.kind === "wall" && s.assemblyKey !== analysis.baseline.envelope.surfaces[i].assemblyKey).map((s) => s.assemblyKey));
    expect(html.match(/data-testid="results-moisture-wall"/g)?.length).toBe(wallStacks.size);
    expect(analysis.densePack.length).toBeGreaterThan(0);
    for (const w of analysis.densePack) {
      const row = byTestId(html, `results-dense-pack-${w.surfaceId}`);
      expect(row).toBe(`${w.surfaceName} ${Math.round(w.pounds).toLocaleString("en-US")} ${w.bagsRoundedUp} ${w.holes}`);
    }
  });

  it("lists each caution with its document and the local-codes line, and the soft warnings", () => {
    for (const c of analysis.cautions) {
      const item = byTestId(html, `results-caution-${c.id}`);
      expect(item).toContain(c.document);
      expect(item).toContain("Follow local codes and licensed practice.");
    }
    for (const w of analysis.warnings) expect(all).toContain(w.message);
  });

  it("has a how disclosure per figure with the sources of the analysis", () => {
    expect(html.match(/<details/g)?.length).toBeGreaterThanOrEqual(10);
    for (const s of [analysis.climate.designSource, analysis.climate.degreeDaySource, ...analysis.methods.filter((m) => m.topic !== "Material R-values").map((m) => m.source)]) {
      expect(all).toContain(s);
    }
  });

  it("gives every table header a scope and leaves the chart to the browser", () => {
    const ths = html.match(/<th[ >][^>]*>/g) ?? [];
    expect(ths.length).toBeGreaterThan(20);
    for (const t of ths) expect(t).toMatch(/scope="(col|row)"/);
    expect(html).toContain('aria-label="Bar chart of heat loss by component');
    expect(html).not.toContain("recharts");
  });
});

describe("ResultsPanel in SI", () => {
  const html = render("si");
  const all = text(html);
  it("converts through calc/units and keeps money as it is", () => {
    const b = analysis.baseline;
    expect(all).toContain(`${(toSI.power(b.designLoad.totalBtuh) / 1000).toFixed(1)} kW`);
    expect(all).toContain(`${Math.round(toSI.airflow(b.cfm50)).toLocaleString("en-US")} L/s at 50 Pa`);
    expect(all).toContain(f.co2(b.energy.co2Lb, "si"));
    expect(f.co2(b.energy.co2Lb, "si")).toMatch(/ kg CO2$/);
    expect(all).toContain(`design ${toSI.temperature(analysis.climate.heatingDesignTempF).toFixed(1).replace("-", "−")} °C`);
    expect(byTestId(html, "results-yearly-saving")).toBe(`${f.usd(analysis.package.savings.usd)} a year`);
    expect(all).not.toContain("Btu/h");
    for (const h of headings) expect(all).toContain(h);
  });
});

describe("ResultsPanel without results", () => {
  it("lists the fields to fix instead of results", () => {
    const html = renderToStaticMarkup(<ResultsPanel analysis={null} units="ip" error={[{ path: "surfaces.0.grossAreaFt2", message: "must be greater than 0" }]} />);
    const all = text(html);
    expect(all).toContain("Fix these fields to see results");
    expect(all).toContain("surfaces › 1 › gross area (ft²) must be greater than 0");
    expect(all).not.toContain("What the plan saves");
  });

  it("says what it is waiting for when there is no analysis yet", () => {
    expect(text(renderToStaticMarkup(<ResultsPanel analysis={null} units="ip" />))).toContain("Results appear here");
  });

  it("renders a house with no upgrades", () => {
    const bare = analyzeHouse({ ...demoHouseInput, upgrades: [] });
    const all = text(renderToStaticMarkup(<ResultsPanel analysis={bare} units="ip" />));
    expect(all).toContain("No upgrades are planned yet");
    expect(all).toContain("No dense-pack upgrade in this plan.");
    expect(all).toContain("No wall is upgraded in this plan.");
  });
});
