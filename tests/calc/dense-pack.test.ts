import { describe, expect, it } from "vitest";
import { checkWall, DEFAULT_BAG_WEIGHT_LB, DEFAULT_DENSITY_LB_FT3, densePackEstimate, type DensePackInput } from "@/calc";

const wall: DensePackInput = {
  surfaceId: "s", surfaceName: "South wall", grossAreaFt2: 400, netAreaFt2: 340, heightFt: 8, framingFraction: 0.25,
  cavityDepthIn: 3.5, spacingIn: 16, densityLbFt3: 3.5, bagWeightLb: 25, storeyHeightFt: 8, blockedBayFraction: 0,
};

describe("dense-pack quantities (METHODS.md §5; DOE SWS 4.1103.1 for ≥ 3.5 lb/ft³)", () => {
  it("defaults: 3.5 lb/ft³ (SWS 4.1103.1) and 25 lb bags (common practice)", () => {
    expect(DEFAULT_DENSITY_LB_FT3).toBe(3.5);
    expect(DEFAULT_BAG_WEIGHT_LB).toBe(25);
  });
  it("hand calculation: 340 ft² × 0.75 × 3.5/12 ft = 74.375 ft³ → 260.3 lb → 10.41 bags", () => {
    const e = densePackEstimate(wall);
    expect(e.cavityVolumeFt3).toBeCloseTo(340 * 0.75 * (3.5 / 12), 10);
    expect(e.pounds).toBeCloseTo(74.375 * 3.5, 10);
    expect(e.bags).toBeCloseTo((74.375 * 3.5) / 25, 10);
    expect(e.bagsRoundedUp).toBe(11);
  });
  it("holes: one per bay, two where blocked (common practice): 50 ft long at 16 in. = 38 bays", () => {
    // length = 400 / 8 = 50 ft = 600 in; 600 / 16 = 37.5 → 38 bays, one storey high
    expect(densePackEstimate(wall).holes).toBe(38);
    const blocked = densePackEstimate({ ...wall, blockedBayFraction: 0.5 });
    expect(blocked.blockedBays).toBe(19);
    expect(blocked.holes).toBe(57);
    // a two-storey wall has two bays in each stud space
    expect(densePackEstimate({ ...wall, heightFt: 16, grossAreaFt2: 800 }).bays).toBe(76);
  });
  it("per-bay figures divide the wall's totals", () => {
    const e = densePackEstimate(wall);
    expect(e.perBay.pounds * e.bays).toBeCloseTo(e.pounds, 10);
    expect(e.perBay.bags * e.bays).toBeCloseTo(e.bags, 10);
  });
  it("density and bag weight are settable", () => {
    expect(densePackEstimate({ ...wall, densityLbFt3: 4, bagWeightLb: 30 }).bags).toBeCloseTo((74.375 * 4) / 30, 10);
  });
});

describe("crew-log check (thresholds 1.3× / 0.8×, common practice, METHODS.md §5)", () => {
  it("flags possible bypass above 1.3×, voids below 0.8×, else as expected", () => {
    expect(checkWall("s", "South wall", 10, 14).status).toBe("possible-bypass");
    expect(checkWall("s", "South wall", 10, 14).message).toMatch(/bypass/i);
    expect(checkWall("s", "South wall", 10, 7).status).toBe("possible-voids-or-low-density");
    expect(checkWall("s", "South wall", 10, 7).message).toMatch(/voids or low density/i);
    expect(checkWall("s", "South wall", 10, 10).status).toBe("as-expected");
    expect(checkWall("s", "South wall", 10, 13).status).toBe("as-expected"); // exactly 1.3× is not above
  });
  it("thresholds are settable", () => {
    expect(checkWall("s", "S", 10, 12, 1.1, 0.9).status).toBe("possible-bypass");
    expect(checkWall("s", "S", 10, 8.5, 1.1, 0.9).status).toBe("possible-voids-or-low-density");
  });
});
