import { readFileSync } from "node:fs";
import { describe, expect, it } from "vitest";
import { CalcInputError, findStation, resolveClimate, stations } from "@/calc";
import { dataPath, parseCsv } from "./helpers";

const csv = parseCsv(readFileSync(dataPath("climate", "stations.csv"), "utf8"));

/** Heating design dry-bulbs as printed in a .stat file (latin-1, per the climate README). */
function statDesign(file: string): { db996: number; db990: number } | null {
  const text = readFileSync(dataPath("climate", "stat", file), "latin1");
  const lines = text.split("\n");
  // newer layout heads the columns DB996 / DB990, older ones HDB 99.6% / HDB 99%
  const hi = lines.findIndex((l) => /\tDB996\t/.test(l) || /HDB 99\.6%/.test(l));
  const row = lines.slice(hi).find((l) => /^\s*Heating\s*$/.test(l.split("\t")[1] ?? ""));
  if (hi < 0 || !row) return null;
  const h = lines[hi].split("\t").map((x) => x.trim());
  const r = row.split("\t").map((x) => x.trim());
  const col = (a: string, b: string) => (h.indexOf(a) >= 0 ? h.indexOf(a) : h.indexOf(b));
  return { db996: Number(r[col("DB996", "HDB 99.6%")]), db990: Number(r[col("DB990", "HDB 99%")]) };
}

describe("station table against ../shared/data/climate (EnergyPlus .stat files, ASHRAE Climate Design Data 2009/2005)", () => {
  it("has the sixteen stations of stations.csv", () => {
    expect(stations.length).toBe(16);
    expect(new Set(stations.map((s) => s.wmo))).toEqual(new Set(csv.map((r) => r.wmo)));
  });

  for (const r of csv) {
    it(`${r.station_name} ${r.state} (${r.wmo}): design temperatures equal the .stat ASHRAE values, °C × 1.8 + 32`, () => {
      const s = findStation(r.wmo)!;
      expect(s.name).toBe(r.station_name);
      expect(s.state).toBe(r.state);
      expect(s.latitude).toBe(Number(r.latitude_deg_converted));
      expect(s.longitude).toBe(Number(r.longitude_deg_converted));
      expect(s.heatingDesign996F).toBeCloseTo(Number(r.heat_db_99_6_c) * 1.8 + 32, 9);
      expect(s.heatingDesign99F).toBeCloseTo(Number(r.heat_db_99_0_c) * 1.8 + 32, 9);
      const stat = statDesign(r.stat_file);
      expect(stat).not.toBeNull();
      if (stat) {
        expect(s.heatingDesign996F).toBeCloseTo(stat.db996 * 1.8 + 32, 9);
        expect(s.heatingDesign99F).toBeCloseTo(stat.db990 * 1.8 + 32, 9);
      }
      // degree days: ASHRAE standard base 18.3 °C × 1.8 where present, else the weather-file base 18 °C × 1.8, marked
      if (r.hdd18_3c_ashrae !== "") {
        expect(s.degreeDayBasis).toBe("ashrae-18.3C");
        expect(s.hdd65).toBeCloseTo(Number(r.hdd18_3c_ashrae) * 1.8, 6);
        expect(s.cdd65).toBeCloseTo(Number(r.cdd18_3c_ashrae) * 1.8, 6);
      } else {
        expect(s.degreeDayBasis).toBe("weather-file-18C");
        expect(s.degreeDaySource).toMatch(/18 °C \(64\.4 °F\)/);
        expect(s.hdd65).toBeCloseTo(Number(r.hdd18c_wthr) * 1.8, 6);
      }
      expect(s.statFile).toBe(r.stat_file);
    });
  }

  it("Newark 725020 by hand: 99 % −9.1 °C = 15.62 °F; HDD 2617 °C-days × 1.8 = 4710.6 °F-days (.stat)", () => {
    const c = resolveClimate({ source: "station", wmo: "725020" }, "99");
    expect(c.heatingDesignTempF).toBeCloseTo(15.62, 9);
    expect(c.hdd65).toBeCloseTo(4710.6, 9);
    expect(resolveClimate({ source: "station", wmo: "725020" }, "99.6").heatingDesignTempF).toBeCloseTo(11.12, 9);
  });

  it("a typed climate carries its own source; an unknown station is refused with the path", () => {
    const m = resolveClimate({ source: "manual", hdd65: 5000, heatingDesignTempF: 5, sourceText: "NOAA 1991–2020 normals, typed" }, "99");
    expect(m.hdd65).toBe(5000);
    expect(m.degreeDaySource).toMatch(/NOAA/);
    expect(() => resolveClimate({ source: "station", wmo: "999999" }, "99")).toThrow(CalcInputError);
    expect(() => resolveClimate({ source: "station", wmo: "999999" }, "99")).toThrow(/climate\.wmo/);
  });
});
