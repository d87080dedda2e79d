// Built-in layer stacks for the assembly picker (outside → inside, films included).
// Layer choices are common practice for the house types named; every R comes from materials.ts.
import type { AssemblyDef, AssemblyLayer, FramedLayerSpec } from "./assemblies";

const L = (materialKey: string, thicknessIn?: number): AssemblyLayer => (thicknessIn === undefined ? { materialKey } : { materialKey, thicknessIn });
const F = (spec: FramedLayerSpec): AssemblyLayer => ({ framed: spec });

const oldWall = (cavity: Partial<FramedLayerSpec>): AssemblyLayer[] => [
  L("film-outside"), L("wood-bevel-siding-0.5x8"), L("board-sheathing-0.75in"),
  F({ member: "2x4", spacingIn: 16, cavityFill: null, ...cavity }),
  L("plaster-wood-lath"), L("film-inside-wall"),
];
const newWall = (member: "2x4" | "2x6", fill: string): AssemblyLayer[] => [
  L("film-outside"), L("hollow-backed-siding"), L("osb-0.4375in"),
  F({ member, spacingIn: 16, cavityFill: fill }), L("gypsum-board-0.5in"), L("film-inside-wall"),
];
const attic = (fill: string | null, extra?: AssemblyLayer): AssemblyLayer[] => [
  L("film-inside-ceiling"), ...(extra ? [extra] : []),
  F({ member: "2x6", spacingIn: 16, cavityFill: fill }), L("plaster-wood-lath"), L("film-inside-ceiling"),
];

export const builtInAssemblies: readonly AssemblyDef[] = [
  { key: "wall-1920s-2x4-empty", name: "1920s wall: 2×4 at 16 in., empty cavity, board sheathing, bevel siding, plaster on lath", kind: "wall", construction: "wood-frame", layers: oldWall({}) },
  { key: "wall-1920s-2x4-half-filled", name: "1920s wall: 2×4, fibre batt filling about half the cavity", kind: "wall", construction: "wood-frame", layers: oldWall({ cavityFill: "batt-r11-3.5in", fillFraction: 0.5 }) },
  { key: "wall-1920s-2x4-dense-pack", name: "1920s wall: 2×4, dense-pack cellulose", kind: "wall", construction: "wood-frame", layers: oldWall({ cavityFill: "cellulose-dense-pack" }) },
  { key: "wall-2x4-r13", name: "2×4 wall at 16 in., R-13 batt, OSB, vinyl siding, gypsum", kind: "wall", construction: "wood-frame", layers: newWall("2x4", "batt-r13-3.5in") },
  { key: "wall-2x6-r21", name: "2×6 wall at 16 in., R-21 batt, OSB, vinyl siding, gypsum", kind: "wall", construction: "wood-frame", layers: newWall("2x6", "batt-r21-5.5in") },
  { key: "wall-steel-2x4-r13", name: "Steel stud wall 3½ in. at 16 in., R-13 batt, OSB, vinyl siding, gypsum", kind: "wall", construction: "steel-frame", layers: newWall("2x4", "batt-r13-3.5in") },
  {
    key: "wall-double-brick-furred", name: "Solid double brick, furred and plastered", kind: "wall", construction: "masonry",
    layers: [L("film-outside"), L("brick-face-4in"), L("brick-common-4in"), F({ member: "1x2-furring", spacingIn: 16, cavityFill: null }), L("plaster-metal-lath-0.75in"), L("film-inside-wall")],
  },
  { key: "wall-block-8in", name: "Uninsulated 8 in. concrete block", kind: "wall", construction: "masonry", layers: [L("film-outside"), L("concrete-block-8in"), L("film-inside-wall")] },
  { key: "ceiling-attic-2x6-empty", name: "Attic floor: 2×6 joists at 16 in., no insulation, plaster ceiling", kind: "ceiling", construction: "wood-frame", layers: attic(null) },
  { key: "ceiling-attic-2x6-old-mineral-fibre", name: "Attic floor: 2×6 joists, about 4 in. of old loose-fill mineral fibre", kind: "ceiling", construction: "wood-frame", layers: attic("mineral-fibre-loose-4in") },
  { key: "ceiling-attic-2x6-r38", name: "Attic floor: 2×6 joists with R-19 batts and R-38 over", kind: "ceiling", construction: "wood-frame", layers: attic("batt-r19-6in", L("batt-r38")) },
  {
    key: "floor-2x8-over-basement", name: "Floor over unheated basement: 2×8 joists, board subfloor, uninsulated", kind: "floor", construction: "wood-frame",
    layers: [L("film-inside-floor"), F({ member: "2x8", spacingIn: 16, cavityFill: null }), L("board-sheathing-0.75in"), L("board-sheathing-0.75in"), L("film-inside-floor")],
  },
  {
    key: "floor-2x8-r19", name: "Floor over unheated basement: 2×8 joists, R-19 batts", kind: "floor", construction: "wood-frame",
    layers: [L("film-inside-floor"), F({ member: "2x8", spacingIn: 16, cavityFill: "batt-r19-6in" }), L("board-sheathing-0.75in"), L("board-sheathing-0.75in"), L("film-inside-floor")],
  },
];
