// Pure helpers of the layer-stack builder (common practice: list edits, parsing what was typed, drawing widths).
import { describe, expect, it } from "vitest";
import { builtInAssemblies } from "@/calc/built-in-assemblies";
import { materials } from "@/calc/materials";
import { groupMaterials } from "@/components/assessment/layer-stack/catalog";
import { describePath, evaluateAssembly, issueLines } from "@/components/assessment/layer-stack/evaluate";
import { formatR, formatU } from "@/components/assessment/layer-stack/format";
import {
  cloneAssembly, framingFractionWarning, initialKeys, insertionIndex, insertItem, issuePath, moveItem, newLayer, parseDraft, removeItem, syncKeys, withLabel,
} from "@/components/assessment/layer-stack/model";
import { drawnThicknessIn, layoutBands, numberRows } from "@/components/assessment/layer-stack/section-geometry";

const wall = builtInAssemblies.find((a) => a.key === "wall-1920s-2x4-empty")!;

describe("list edits", () => {
  it("moves one place up or down and ignores moves off either end", () => {
    expect(moveItem(["a", "b", "c"], 1, -1)).toEqual(["b", "a", "c"]);
    expect(moveItem(["a", "b", "c"], 1, 1)).toEqual(["a", "c", "b"]);
    expect(moveItem(["a", "b", "c"], 0, -1)).toEqual(["a", "b", "c"]);
    expect(moveItem(["a", "b", "c"], 2, 1)).toEqual(["a", "b", "c"]);
    expect(moveItem(["a"], 5, 1)).toEqual(["a"]);
  });
  it("removes and inserts without touching the original", () => {
    const l = Object.freeze(["a", "b", "c"]);
    expect(removeItem(l, 1)).toEqual(["a", "c"]);
    expect(insertItem(l, 1, "x")).toEqual(["a", "x", "b", "c"]);
    expect(insertItem(l, 99, "x")).toEqual(["a", "b", "c", "x"]);
    expect(insertItem(l, -3, "x")).toEqual(["x", "a", "b", "c"]);
  });
  it("adds a new layer just outside the inside air film", () => {
    expect(insertionIndex(wall.layers)).toBe(wall.layers.length - 1);
    expect(insertionIndex([{ materialKey: "plywood-0.5in" }])).toBe(1);
    expect(insertionIndex([])).toBe(0);
  });
  it("gives a per-inch material a thickness and a fixed-R one none", () => {
    expect(newLayer(materials.find((m) => m.key === "xps-per-inch")!)).toEqual({ materialKey: "xps-per-inch", thicknessIn: 1 });
    expect(newLayer(materials.find((m) => m.key === "film-outside")!)).toEqual({ materialKey: "film-outside" });
  });
  it("keeps React keys in step with the layer count", () => {
    const s = initialKeys(2);
    expect(syncKeys(s, 2)).toBe(s);
    expect(syncKeys(s, 4)).toEqual({ keys: ["k0", "k1", "k2", "k3"], next: 4 });
    expect(syncKeys(s, 1)).toEqual({ keys: ["k0"], next: 2 });
  });
});

describe("cloneAssembly", () => {
  it("gives a new key and a (copy) name, and copies deeply", () => {
    const c = cloneAssembly(wall, builtInAssemblies.map((a) => a.key));
    expect(c.key).toBe("wall-1920s-2x4-empty-copy");
    expect(c.name).toBe(`${wall.name} (copy)`);
    expect(c.layers).toEqual(wall.layers);
    const i = wall.layers.findIndex((l) => "framed" in l);
    expect(c.layers[i]).not.toBe(wall.layers[i]);
    expect((c.layers[i] as { framed: object }).framed).not.toBe((wall.layers[i] as { framed: object }).framed);
  });
  it("steps the key past ones already taken", () => {
    expect(cloneAssembly(wall, [wall.key, `${wall.key}-copy`, `${wall.key}-copy-2`]).key).toBe(`${wall.key}-copy-3`);
  });
});

describe("parseDraft", () => {
  it.each([
    ["3.5", 3.5], [" .5 ", 0.5], ["3,5", 3.5], ["3 1/2", 3.5], ["3-1/2", 3.5], ["1/2", 0.5], ["0", 0], ["-1", -1], ["1e1", 10],
  ])("reads %j as %d", (s, v) => expect(parseDraft(s)).toEqual({ kind: "number", value: v }));
  it("reads a percentage only where allowed", () => {
    expect(parseDraft("45 %", { percent: true })).toEqual({ kind: "number", value: 0.45 });
    expect(parseDraft("45%").kind).toBe("invalid");
  });
  it("keeps half-typed and wrong text as invalid, with a reason, and blank as empty", () => {
    for (const s of ["3 1/", "abc", "3..5", "1/0", "--2", "Infinity", "1e999"]) expect(parseDraft(s).kind).toBe("invalid");
    expect(parseDraft("  ")).toEqual({ kind: "empty" });
    expect(parseDraft("x")).toMatchObject({ message: expect.stringContaining("must be a number") });
  });
});

describe("messages and warnings", () => {
  it("warns on unusual wood framing fractions only", () => {
    expect(framingFractionWarning(0.45, "wood")).toMatch(/above 0.4/);
    expect(framingFractionWarning(0.02, "wood")).toMatch(/below 0.05/);
    expect(framingFractionWarning(0.25, "wood")).toBeUndefined();
    expect(framingFractionWarning(undefined, "wood")).toBeUndefined();
    expect(framingFractionWarning(0.003, "steel")).toBeUndefined();
    expect(framingFractionWarning(1.5, "wood")).toBeUndefined(); // out of range: the schema's error says it
  });
  it("puts zod and calc paths in one form and names them", () => {
    expect(issuePath(["layers", 3, "framed", "spacingIn"])).toBe("layers.3.framed.spacingIn");
    expect(issuePath("assembly.layers.3.thicknessIn")).toBe("layers.3.thicknessIn");
    expect(describePath("layers.3.framed.spacingIn")).toBe("Layer 4, spacing");
    expect(describePath("name")).toBe("Name");
    expect(withLabel("Depth", "must be greater than 0")).toBe("Depth must be greater than 0");
    expect(withLabel("Depth", "a custom member needs a depth")).toBe("A custom member needs a depth");
  });
  it("evaluates with calc's schema and computeAssembly, never throwing", () => {
    expect(evaluateAssembly(wall).result?.uFactorIP).toBeGreaterThan(0);
    const bad = evaluateAssembly({ ...wall, layers: [{ materialKey: "xps-per-inch", thicknessIn: 0 }] });
    expect(bad.issues["layers.0.thicknessIn"]).toEqual(["must be greater than 0"]);
    const calc = evaluateAssembly({ ...wall, layers: [{ materialKey: "xps-per-inch" }] });
    expect(Object.keys(calc.issues)).toEqual(["layers.0.thicknessIn"]);
    expect(issueLines(calc.issues)[0]).toMatch(/^Layer 1, thickness /);
    expect(() => evaluateAssembly(null as never)).not.toThrow();
  });
  it("formats R and U in IP and SI, and a dash for what is not finite", () => {
    expect(formatR(11.04, "ip")).toBe("R-11.0");
    expect(formatR(5.678, "si")).toMatch(/^RSI 1\.00$/);
    expect(formatU(0.0912, "ip")).toBe("0.091");
    expect(formatU(Number.NaN, "ip")).toBe("—");
  });
});

describe("section geometry and the picker", () => {
  it("makes widths proportional to thickness, at least the minimum, filling the total", () => {
    const b = layoutBands([0, 0.5, 3.5, 0.5, 0], 600, 18);
    expect(b.reduce((s, x) => s + x.w, 0)).toBeCloseTo(600, 9);
    expect(b[0].w).toBe(18);
    expect(b[2].w / b[1].w).toBeCloseTo(7, 9);
    expect(b[3].x).toBeCloseTo(b[2].x + b[2].w, 9);
    expect(layoutBands([], 600, 18)).toEqual([]);
    expect(layoutBands([0, 0], 600, 18).map((x) => x.w)).toEqual([300, 300]);
    expect(layoutBands([1, 1, 1], 30, 18).map((x) => x.w)).toEqual([10, 10, 10]);
  });
  it("staggers the numbers of narrow neighbours", () => {
    expect(numberRows([{ x: 0, w: 10 }, { x: 10, w: 10 }, { x: 20, w: 10 }, { x: 30, w: 100 }], 26)).toEqual([1, 0, 1, 1]);
  });
  it("draws the framed layer at the member's depth and films at none", () => {
    expect(drawnThicknessIn({ framed: { member: "2x6", cavityFill: null } })).toBe(5.5);
    expect(drawnThicknessIn({ framed: { member: "custom", cavityFill: null } })).toBe(3.5);
    expect(drawnThicknessIn({ materialKey: "film-outside" })).toBe(0);
    expect(drawnThicknessIn({ materialKey: "xps-per-inch", thicknessIn: 2 })).toBe(2);
  });
  it("groups the library by category and filters by every word", () => {
    expect(groupMaterials("").reduce((n, g) => n + g.items.length, 0)).toBe(materials.length);
    const ply = groupMaterials("plywood");
    expect(ply.map((g) => g.category)).toEqual(["siding", "sheathing"]);
    expect(groupMaterials("batt r-13").flatMap((g) => g.items.map((m) => m.key))).toEqual(["batt-r13-3.5in"]);
    expect(groupMaterials("zzz")).toEqual([]);
  });
});
