// The fast path for surfaces (calc/fast-surfaces.ts) must agree with the zod schema it stands in
// for: whenever it accepts a list, zod accepts it and outputs the same value; whenever zod accepts,
// the fast path accepts too (or the speed is lost without anyone noticing). Checked on generated
// lists that sit on and around every bound. Source of truth: `surfaceSchema` in calc/schema.ts.
import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { z } from "zod";
import { demoHouseInput, houseInputSchema, surfaceSchema, validateHouseInput } from "@/calc";
import { fastParseSurfaces } from "@/calc/fast-surfaces";
import { benchHouse } from "../../bench/calc";

const zodList = z.array(surfaceSchema);

const OMIT = Symbol("omit");
/** A value for an optional key: left out, explicitly undefined, or one of the candidates. */
const opt = <T,>(a: fc.Arbitrary<T>) => fc.oneof(fc.constant(OMIT), fc.constant(undefined), a);

// Numbers on, just inside and just outside the bounds used in schema.ts, plus the non-finite ones.
const num = fc.oneof(
  fc.constantFrom(0, -0, 1, -1, 0.5, 1.5, 2, 2.5, 99, 100, 100.5, 200, 201, 2_000, 2_001, 20_000, 20_001, Number.NaN, Infinity, -Infinity, 1e-9),
  fc.double({ min: -10, max: 25_000 }),
  fc.constantFrom("12" as unknown as number, null as unknown as number),
);
const str = fc.oneof(fc.constantFrom("", "a", "wall-1", "x".repeat(100), "x".repeat(101), "x".repeat(200), "x".repeat(201)), fc.string({ maxLength: 5 }), fc.constant(7 as unknown as string));

function build(fields: Record<string, unknown>) {
  return Object.fromEntries(Object.entries(fields).filter(([, v]) => v !== OMIT));
}

const openingArb = fc
  .record({
    kind: fc.constantFrom("window", "door", "skylight"),
    areaFt2: num, count: opt(num), productKey: opt(str), uFactorIP: opt(num), label: opt(str),
    extra: opt(fc.constant("ignored")),
  })
  .map(build);

const surfaceArb = fc
  .record({
    id: str, name: str, kind: fc.constantFrom("wall", "ceiling", "floor", "roof"),
    orientation: fc.constantFrom("N", "SE", "horizontal", "up"),
    grossAreaFt2: num, assemblyKey: str, heightFt: opt(num),
    openings: fc.oneof(fc.constant(OMIT), fc.constant(undefined), fc.array(openingArb, { maxLength: 3 }), fc.constant("none")),
    bufferFactor: opt(num), blockedBayFraction: opt(num), note: opt(fc.constant("kept out of the output")),
  })
  .map(build);

// Mostly valid lists, so both directions of the agreement are exercised often.
const validSurfaceArb = fc
  .record({
    id: fc.constantFrom("a", "b", "wall-1"), name: fc.constantFrom("North wall", "Attic"), kind: fc.constantFrom("wall", "ceiling", "floor"),
    orientation: fc.constantFrom("N", "S", "horizontal"), grossAreaFt2: fc.double({ min: 0.01, max: 20_000, noNaN: true }), assemblyKey: fc.constant("wall-2x4-empty"),
    heightFt: opt(fc.double({ min: 0.1, max: 100, noNaN: true })),
    openings: fc.oneof(fc.constant(OMIT), fc.array(fc.record({ kind: fc.constantFrom("window", "door"), areaFt2: fc.double({ min: 0.01, max: 2_000, noNaN: true }), count: opt(fc.integer({ min: 1, max: 200 })), uFactorIP: opt(fc.double({ min: 0.01, max: 2, noNaN: true })) }).map(build), { maxLength: 3 })),
    bufferFactor: opt(fc.double({ min: 0, max: 1, noNaN: true })), blockedBayFraction: opt(fc.double({ min: 0, max: 1, noNaN: true })),
  })
  .map(build);

// A valid surface with exactly one field (of the surface or of one of its openings) set to an edge value.
const SURFACE_KEYS = ["id", "name", "kind", "orientation", "grossAreaFt2", "assemblyKey", "heightFt", "openings", "bufferFactor", "blockedBayFraction"];
const OPENING_KEYS = ["kind", "areaFt2", "count", "productKey", "uFactorIP", "label"];
const edge = fc.oneof(num, str, fc.constantFrom(undefined, "window", "wall", "N", [] as unknown, {} as unknown));
const oneBadFieldArb = fc
  .tuple(validSurfaceArb, fc.boolean(), fc.constantFrom(...SURFACE_KEYS), fc.constantFrom(...OPENING_KEYS), edge)
  .map(([surface, inOpening, sKey, oKey, value]) => {
    const s = structuredClone(surface) as Record<string, unknown>;
    const openings = s.openings as Record<string, unknown>[] | undefined;
    if (inOpening && openings?.length) openings[0]![oKey] = value;
    else s[sKey] = value;
    return s;
  });

function agree(list: unknown[]) {
  const fast = fastParseSurfaces(list);
  const slow = zodList.safeParse(list);
  if (fast) {
    expect(slow.success).toBe(true);
    expect(fast).toStrictEqual(slow.data);
  } else {
    expect(slow.success).toBe(false);
  }
}

describe("fast surface path agrees with surfaceSchema (zod)", () => {
  it("on generated lists around every bound", () => {
    fc.assert(fc.property(fc.array(surfaceArb, { maxLength: 4 }), agree), { numRuns: 3_000 });
  });

  it("on generated lists that are mostly valid", () => {
    fc.assert(fc.property(fc.array(fc.oneof({ arbitrary: validSurfaceArb, weight: 9 }, { arbitrary: surfaceArb, weight: 1 }), { maxLength: 6 }), agree), { numRuns: 2_000 });
  });

  it("on valid lists with one field of one surface or opening set to an edge value", () => {
    fc.assert(fc.property(fc.array(validSurfaceArb, { maxLength: 3 }), oneBadFieldArb, (list, bad) => agree([...list, bad])), { numRuns: 4_000 });
  });

  it("on every field of a surface and of an opening set to every edge value, one at a time", () => {
    const base = { id: "w1", name: "North wall", kind: "wall", orientation: "N", grossAreaFt2: 120, assemblyKey: "wall-2x4-empty", heightFt: 8, openings: [{ kind: "window", areaFt2: 15, count: 2, uFactorIP: 0.5, label: "W1" }], bufferFactor: 0.5, blockedBayFraction: 0.1 };
    const edges: unknown[] = [undefined, null, "", "a", "x".repeat(100), "x".repeat(101), "x".repeat(200), "x".repeat(201), "12", 7, 0, -0, -1, 1e-9, 0.5, 1, 1.5, 2, 2.5, 99, 100, 100.5, 199.5, 200, 201, 2_000, 2_001, 20_000, 20_001, Number.NaN, Infinity, -Infinity, [], {}, "window", "door", "skylight", "wall", "roof", "N", "horizontal"];
    let cases = 0;
    for (const value of edges) {
      for (const key of SURFACE_KEYS) { agree([{ ...structuredClone(base), [key]: value }]); cases++; }
      for (const key of OPENING_KEYS) { const s = structuredClone(base); (s.openings[0] as Record<string, unknown>)[key] = value; agree([s]); cases++; }
    }
    expect(cases).toBe(edges.length * (SURFACE_KEYS.length + OPENING_KEYS.length));
    for (const n of [100, 101]) agree([{ ...structuredClone(base), openings: Array.from({ length: n }, () => ({ kind: "door", areaFt2: 1 })) }]);
    expect(fastParseSurfaces([{ ...base, openings: Array.from({ length: 101 }, () => ({ kind: "door", areaFt2: 1 })) }])).toBeUndefined();
  });

  it("on the demo house and the 60-surface bench house", () => {
    agree(demoHouseInput.surfaces as unknown[]);
    agree(benchHouse().surfaces as unknown[]);
    expect(fastParseSurfaces(benchHouse().surfaces as unknown[])).toHaveLength(60);
  });

  it("validateHouseInput returns exactly what houseInputSchema outputs", () => {
    const h = benchHouse();
    const v = validateHouseInput(h);
    expect(v.ok).toBe(true);
    if (v.ok) expect(v.value).toStrictEqual(houseInputSchema.parse(h));
  });

  it("a bad surface still gets zod's message at its field", () => {
    const h = structuredClone(demoHouseInput);
    (h.surfaces![2] as { grossAreaFt2: number }).grossAreaFt2 = -4;
    const v = validateHouseInput(h);
    expect(v.ok).toBe(false);
    if (!v.ok) expect(v.issues).toContainEqual({ path: "surfaces.2.grossAreaFt2", message: "Gross area (ft²) at surfaces.2.grossAreaFt2 must be greater than 0" });
  });
});
