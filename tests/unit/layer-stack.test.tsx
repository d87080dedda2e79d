// Static render of the layer-stack builder: the figures shown are calc's, the section has a band per layer.
import { renderToStaticMarkup } from "react-dom/server";
import { describe, expect, it } from "vitest";
import { computeAssembly, type AssemblyDef } from "@/calc/assemblies";
import { builtInAssemblies } from "@/calc/built-in-assemblies";
import { toSI } from "@/calc/units";
import { AssemblyLibrary, LayerSection, LayerStackEditor } from "@/components/assessment/layer-stack";

const noop = () => {};
const builtIn = (key: string) => builtInAssemblies.find((a) => a.key === key)!;
const render = (value: AssemblyDef, units: "ip" | "si" = "ip") => renderToStaticMarkup(<LayerStackEditor value={value} onChange={noop} units={units} />);
const attr = (html: string, re: RegExp) => [...html.matchAll(re)].map((m) => m[1]);
const shownU = (html: string, method: string) => new RegExp(`data-testid="u-${method}">([^<]*)<`).exec(html)?.[1];
const svgOf = (html: string) => /<svg[^>]*role="img"[\s\S]*?<\/svg>/.exec(html)?.[0] ?? "";
const unescape = (s: string) => s.replace(/&quot;/g, '"').replace(/&amp;/g, "&").replace(/&#x27;/g, "'");

describe("LayerStackEditor on a built-in wall", () => {
  for (const key of ["wall-1920s-2x4-half-filled", "wall-2x4-r13", "wall-steel-2x4-r13"]) {
    it(`${key}: U by both methods equals computeAssembly's`, () => {
      const def = builtIn(key);
      const r = computeAssembly(def);
      const html = render(def);
      expect(Number(attr(html, /data-method="parallel-path" data-u-ip="([^"]+)"/g)[0])).toBe(r.parallelPath.uFactorIP);
      expect(Number(attr(html, /data-method="isothermal-planes" data-u-ip="([^"]+)"/g)[0])).toBe(r.isothermalPlanes.uFactorIP);
      expect(shownU(html, "parallel-path")).toBe(r.parallelPath.uFactorIP.toFixed(3));
      expect(shownU(html, "isothermal-planes")).toBe(r.isothermalPlanes.uFactorIP.toFixed(3));
      // R of each path through the framing, as calc gives it
      expect(attr(html, /data-r-ip="([^"]+)"/g).map(Number)).toEqual(r.framing!.paths.map((p) => p.totalRIP));
    });
  }

  it("marks the construction's default method and the one used", () => {
    const html = render(builtIn("wall-2x4-r13"));
    const card = (m: string) => new RegExp(`data-method="${m}"[\\s\\S]*?</div></div>`).exec(html)?.[0] ?? "";
    expect(card("parallel-path")).toContain("Default for wood-frame");
    expect(card("parallel-path")).toContain("Used in results");
    expect(card("isothermal-planes")).not.toContain("Default for");
    const steel = render(builtIn("wall-steel-2x4-r13"));
    expect(/data-method="isothermal-planes"[\s\S]*?Default for steel-frame/.test(steel)).toBe(true);
  });

  it("shows U in W/m²·K through calc's toSI when units are SI", () => {
    const def = builtIn("wall-1920s-2x4-empty");
    const r = computeAssembly(def);
    const html = render(def, "si");
    expect(shownU(html, "parallel-path")).toBe(toSI.uFactor(r.parallelPath.uFactorIP).toFixed(3));
    expect(shownU(html, "isothermal-planes")).toBe(toSI.uFactor(r.isothermalPlanes.uFactorIP).toFixed(3));
    expect(html).toContain("W/m²·K");
  });

  it("draws one band per layer, in order, with an accessible description", () => {
    const def = builtIn("wall-1920s-2x4-half-filled");
    const svg = svgOf(render(def));
    expect(attr(svg, /data-band="(\d+)"/g)).toEqual(def.layers.map((_, i) => String(i)));
    expect(attr(svg, /data-kind="([a-z]+)"/g)).toEqual(["film", "siding", "board", "framed", "board", "film"]);
    const label = unescape(/aria-label="([^"]+)"/.exec(svg)![1]);
    expect(label).toMatch(/^Section of 1920s wall.*6 layers from outside \(left\) to inside \(right\): 1, Outside air film, 15 mph wind \(winter\); 2, Wood bevel siding.*; 4, 2×4 wood framing at 16 in. o.c., Glass-fibre batt R-11, 3½ in., filling 50 % of the cavity; /);
    expect(svg).toContain('data-part="fill"');
  });

  it("gives the layer controls names that say which layer and which way", () => {
    const html = render(builtIn("wall-2x4-r13"));
    expect(html).toContain('aria-label="Move layer 3 (OSB ⁷⁄₁₆ in. (dataset waferboard)) toward the inside"');
    expect(html).toContain('aria-label="Remove layer 1 (Outside air film, 15 mph wind (winter))"');
    expect(html).toContain("Layers, outside to inside");
  });

  it("has no controls when read-only", () => {
    const html = renderToStaticMarkup(<LayerStackEditor value={builtIn("wall-2x4-r13")} onChange={noop} readOnly />);
    expect(html).not.toContain("Remove layer");
    expect(html).not.toContain("Add layer");
  });
});

describe("LayerStackEditor never crashes and puts reasons beside fields", () => {
  const wall = builtIn("wall-1920s-2x4-empty");
  const withFramed = (patch: object): AssemblyDef => ({ ...wall, layers: wall.layers.map((l) => ("framed" in l ? { framed: { ...l.framed, ...patch } } : l)) });

  it("warns, without refusing, on a framing fraction of 0.45", () => {
    const html = render(withFramed({ framingFraction: 0.45 }));
    expect(html).toContain("0.45 is above 0.4");
    expect(html).toContain('data-testid="u-parallel-path"');
  });

  it("puts the schema's reason beside a bad thickness and calc's beside a missing one", () => {
    const bad: AssemblyDef = { ...wall, layers: [...wall.layers.slice(0, -1), { materialKey: "xps-per-inch", thicknessIn: -1 }, wall.layers.at(-1)!] };
    expect(render(bad)).toContain("Thickness must be greater than 0");
    const missing: AssemblyDef = { ...wall, layers: [{ materialKey: "xps-per-inch" }, ...wall.layers] };
    const html = render(missing);
    expect(html).toContain("is rated per inch: give its thickness in inches");
    expect(html).not.toContain('data-testid="u-parallel-path"');
  });

  it("renders odd input: no layers, unknown materials, a custom member without depth, two framed layers", () => {
    const odd: AssemblyDef[] = [
      { ...wall, layers: [] },
      { ...wall, layers: [{ materialKey: "no-such-thing" }] },
      withFramed({ member: "custom" }),
      { ...wall, layers: [...wall.layers, { framed: { member: "2x6", cavityFill: "nope" } }] },
      { key: "", name: "", kind: "roof" as never, construction: "adobe" as never, layers: null as never },
    ];
    for (const def of odd) expect(() => render(def)).not.toThrow();
    expect(render(odd[2])).toContain("a custom framing member needs its depth in inches".replace(/^a/, "A"));
    expect(render(odd[1])).toContain("Unknown material");
  });
});

describe("LayerSection and AssemblyLibrary", () => {
  it("LayerSection alone is an image with a band per layer", () => {
    const def = builtIn("ceiling-attic-2x6-r38");
    const svg = renderToStaticMarkup(<LayerSection value={def} />);
    expect(svg).toContain('role="img"');
    expect(attr(svg, /data-band="(\d+)"/g)).toHaveLength(def.layers.length);
  });

  it("lists built-ins with Clone to edit and the company's own without it", () => {
    const company: AssemblyDef[] = [{ ...builtIn("wall-2x4-r13"), key: "kb-wall", name: "Kestrel Bay north wall" }];
    const html = renderToStaticMarkup(<AssemblyLibrary builtIns={builtInAssemblies} company={company} onPick={noop} onClone={noop} />);
    expect(attr(html, /data-assembly="([^"]+)"/g)).toEqual(["kb-wall", ...builtInAssemblies.map((a) => a.key)]);
    expect(html.match(/>Clone to edit</g)).toHaveLength(builtInAssemblies.length);
    expect(html).toContain("Kestrel Bay north wall");
  });
});
