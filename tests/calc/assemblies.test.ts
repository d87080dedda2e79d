import { describe, expect, it } from "vitest";
import { builtInAssemblies, CalcInputError, computeAssembly, defaultFramingFraction, type AssemblyDef } from "@/calc";
import { R_IP_PER_SI } from "./helpers";

const byKey = (k: string) => builtInAssemblies.find((a) => a.key === k)!;

// Layer R-values by hand from the dataset entries (EnergyPlus ASHRAE_2005_HOF_Materials.idf) and
// the surface films of ASHRAE Fundamentals (from memory: outside 15 mph 0.17, inside vertical 0.68).
const R = {
  filmOut: 0.17, filmIn: 0.68,
  vinyl: 0.11 * R_IP_PER_SI, // "Siding: Hollow-backed" R_SI 0.11
  osb: ((0.4375 * 0.0254) / 0.091) * R_IP_PER_SI, // "Waferboard" k 0.091, 7/16 in.
  gyp: ((0.5 * 0.0254) / 0.16) * R_IP_PER_SI, // "G01 16mm gypsum board" k 0.16, ½ in.
  stud: ((3.5 * 0.0254) / 0.129) * R_IP_PER_SI, // "Softwood - 25mm" k 0.129 × 3.5 in.
  r13: 2.29 * R_IP_PER_SI, // "…90mm -6.4-32 kg/m3" R_SI 2.29
  bevel: 0.14 * R_IP_PER_SI, // "Siding: Wood - bevel 13 by 200mm - lapped"
  board: (0.019 / 0.115) * R_IP_PER_SI, // "Wood subfloor - 19mm"
  plaster: 0.4, // plaster on wood lath, from memory
  airWall: 0.15 * R_IP_PER_SI, // "F04 Wall air space resistance"
};

describe("parallel path and isothermal planes (ASHRAE Fundamentals, assemblies chapter, from memory)", () => {
  it("2×4 R-13 wall at 16 in. o.c., f = 0.25: hand calculation", () => {
    const cont = R.filmOut + R.vinyl + R.osb + R.gyp + R.filmIn; // ≈ 2.619
    // parallel path: U = f/R_frame + (1 − f)/R_cavity, each path a series sum
    const uPP = 0.25 / (cont + R.stud) + 0.75 / (cont + R.r13); // ≈ 0.0863
    // isothermal planes: framed layer combined by area first, then in series
    const rIso = cont + 1 / (0.25 / R.stud + 0.75 / R.r13); // ≈ 10.84
    const r = computeAssembly(byKey("wall-2x4-r13"));
    expect(r.parallelPath.uFactorIP).toBeCloseTo(uPP, 10);
    expect(r.isothermalPlanes.rValueIP).toBeCloseTo(rIso, 10);
    expect(uPP).toBeCloseTo(0.0863, 4);
    expect(rIso).toBeCloseTo(10.84, 2);
    expect(r.method).toBe("parallel-path"); // wood framing default (METHODS.md §1)
    expect(r.uFactorIP).toBe(r.parallelPath.uFactorIP);
  });

  it("1920s empty 2×4 wall: framing and empty-cavity paths", () => {
    const cont = R.filmOut + R.bevel + R.board + R.plaster + R.filmIn;
    const uPP = 0.25 / (cont + R.stud) + 0.75 / (cont + R.airWall);
    expect(computeAssembly(byKey("wall-1920s-2x4-empty")).uFactorIP).toBeCloseTo(uPP, 10);
    expect(uPP).toBeGreaterThan(0.2); // an empty old wall is about R-4 (common practice)
  });

  it("half-filled cavity gives three paths: framing, filled, empty", () => {
    const r = computeAssembly(byKey("wall-1920s-2x4-half-filled"));
    expect(r.framing!.paths.map((p) => p.areaFraction)).toEqual([0.25, 0.375, 0.375]);
    const cont = R.filmOut + R.bevel + R.board + R.plaster + R.filmIn;
    const r11 = 1.94 * R_IP_PER_SI; // "…75-100mm 6.4-32 kg/m3" R_SI 1.94
    expect(r.parallelPath.uFactorIP).toBeCloseTo(0.25 / (cont + R.stud) + 0.375 / (cont + r11) + 0.375 / (cont + R.airWall), 10);
  });

  it("defaults: steel and masonry use isothermal planes; both methods always reported", () => {
    expect(computeAssembly(byKey("wall-steel-2x4-r13")).method).toBe("isothermal-planes");
    expect(computeAssembly(byKey("wall-double-brick-furred")).method).toBe("isothermal-planes");
    for (const a of builtInAssemblies) {
      const r = computeAssembly(a);
      // parallel path is the upper bound on R, isothermal planes the lower (same chapter)
      expect(r.parallelPath.rValueIP).toBeGreaterThanOrEqual(r.isothermalPlanes.rValueIP - 1e-12);
    }
  });

  it("method override and framing fraction override are honoured", () => {
    const a = byKey("wall-2x4-r13");
    const iso = computeAssembly({ ...a, method: "isothermal-planes" });
    expect(iso.method).toBe("isothermal-planes");
    expect(iso.methodReason).toMatch(/auditor/);
    const layers = a.layers.map((l) => ("framed" in l ? { framed: { ...l.framed, framingFraction: 0.15 } } : l));
    const r = computeAssembly({ ...a, layers });
    expect(r.framing!.framingFraction).toBe(0.15);
    expect(r.framing!.framingFractionSource).toMatch(/auditor/);
    expect(r.uFactorIP).toBeLessThan(computeAssembly(a).uFactorIP);
  });

  it("typical framing fractions: walls 0.25 / 0.22, ceilings 0.14 / 0.11, floors 0.10 / 0.07 (ASHRAE typical values, from memory)", () => {
    expect(defaultFramingFraction("wall", 16, "wood").value).toBe(0.25);
    expect(defaultFramingFraction("wall", 24, "wood").value).toBe(0.22);
    expect(defaultFramingFraction("ceiling", 16, "wood").value).toBe(0.14);
    expect(defaultFramingFraction("ceiling", 24, "wood").value).toBe(0.11);
    expect(defaultFramingFraction("floor", 16, "wood").value).toBe(0.1);
    expect(defaultFramingFraction("floor", 24, "wood").value).toBe(0.07);
  });

  it("refuses a custom member without depth and an unknown material, naming the path", () => {
    const bad: AssemblyDef = { key: "x", name: "x", kind: "wall", construction: "wood-frame", layers: [{ framed: { member: "custom", cavityFill: null } }] };
    expect(() => computeAssembly(bad, "assemblies.0")).toThrow(CalcInputError);
    try { computeAssembly(bad, "assemblies.0"); } catch (e) { expect((e as CalcInputError).issues[0].path).toBe("assemblies.0.layers.0.framed.depthIn"); }
    const bad2: AssemblyDef = { ...bad, layers: [{ materialKey: "unobtainium" }] };
    expect(() => computeAssembly(bad2, "assemblies.1")).toThrow(/assemblies\.1\.layers\.0\.materialKey/);
  });
});
