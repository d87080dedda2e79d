import { readFileSync } from "node:fs";
import { describe, expect, it } from "vitest";
import { climateFromEpw, degreeDaysC, degreeDaysF, EpwParseError, heatingDesignDryBulbC, parseEpw } from "@/calc";
import { dataPath, parseCsv } from "./helpers";

const csv = parseCsv(readFileSync(dataPath("climate", "stations.csv"), "utf8"));
const MONTHS = ["jan", "feb", "mar", "apr", "may", "jun", "jul", "aug", "sep", "oct", "nov", "dec"];
const files = csv.filter((r) => r.epw_file !== "");

describe("EPW reader against the .stat weather-file degree days (EnergyPlus weather converter; climate README §4)", () => {
  it("two EPW files have a matching .stat", () => expect(files.length).toBe(2));

  for (const r of files) {
    const text = readFileSync(dataPath("climate", r.epw_file), "utf8");
    const epw = parseEpw(text);

    it(`${r.station_name}: location header and 8760 hours`, () => {
      expect(epw.hours).toBe(8760);
      expect(epw.location.wmo).toBe(r.wmo);
      expect(epw.location.stateProvince).toBe(r.state);
      expect(Math.abs(epw.location.latitude - Number(r.latitude_deg_converted))).toBeLessThan(0.05);
    });

    for (const base of [18, 10] as const) {
      it(`${r.station_name}: monthly HDD base ${base} °C within 1 °C-day of the .stat file, annual within 1`, () => {
        const dd = degreeDaysC(epw, base);
        MONTHS.forEach((m, i) => expect(Math.abs(dd.heatingMonthly[i] - Number(r[`hdd${base}c_wthr_${m}`]))).toBeLessThanOrEqual(1));
        expect(Math.abs(dd.heatingAnnual - Number(r[`hdd${base}c_wthr`]))).toBeLessThanOrEqual(1);
        expect(Math.abs(dd.coolingAnnual - Number(r[`cdd${base}c_wthr`]))).toBeLessThanOrEqual(1);
      });
    }

    it(`${r.station_name}: base 65 °F tested separately (daily means in °F; not the .stat's 18 °C or 18.3 °C bases)`, () => {
      const f = degreeDaysF(epw, 65);
      // hand: from the same daily means, HDD65 = Σ max(0, 65 − (1.8·T̄ + 32)); must lie above HDD at 64.4 °F (= 1.8 × HDD18 °C)
      const at644 = degreeDaysF(epw, 64.4).heatingAnnual;
      expect(at644).toBeCloseTo(degreeDaysC(epw, 18).heatingAnnual * 1.8, 6);
      expect(f.heatingAnnual).toBeGreaterThan(at644);
      // climate README §4 computed HDD65 6175 (Golden) and 2329 (Las Vegas), CDD65 543 and 3316
      const readme = r.wmo === "724666" ? [6175, 543] : [2329, 3316];
      expect(Math.abs(f.heatingAnnual - readme[0])).toBeLessThan(1);
      expect(Math.abs(f.coolingAnnual - readme[1])).toBeLessThan(1);
    });

    it(`${r.station_name}: 99.6 % / 99 % heating dry-bulb from the file's own hours`, () => {
      for (const p of [99.6, 99] as const) {
        const t = heatingDesignDryBulbC(epw, p);
        const below = epw.dryBulbC.filter((x) => x < t).length;
        const atOrBelow = epw.dryBulbC.filter((x) => x <= t).length;
        const allowed = ((100 - p) / 100) * 8760; // 35.04 h at 99.6 %, 87.6 h at 99 %
        expect(below).toBeLessThanOrEqual(allowed);
        expect(atOrBelow).toBeGreaterThanOrEqual(allowed);
      }
      const c = climateFromEpw(epw);
      expect(c.heatingDesign996F).toBeLessThanOrEqual(c.heatingDesign99F);
      expect(c.sourceText).toMatch(/EPW/);
    });
  }
});

describe("EPW reader: malformed files are refused with line and field", () => {
  const good = readFileSync(dataPath("climate", files[0].epw_file), "utf8");
  const lines = good.split("\r\n");
  const err = (t: string) => { try { parseEpw(t); } catch (e) { return e as EpwParseError; } throw new Error("no error"); };

  it("LF line endings parse the same as CRLF", () => {
    expect(parseEpw(lines.join("\n")).dryBulbC).toEqual(parseEpw(good).dryBulbC);
  });
  it("a non-numeric dry-bulb names line and field 7", () => {
    const l = lines.slice();
    const f = l[100].split(",");
    f[6] = "warm";
    l[100] = f.join(",");
    const e = err(l.join("\r\n"));
    expect(e).toBeInstanceOf(EpwParseError);
    expect(e.line).toBe(101);
    expect(e.field).toBe(7);
  });
  it("the missing-value code 99.9 for dry-bulb is refused", () => {
    const l = lines.slice();
    const f = l[500].split(",");
    f[6] = "99.9";
    l[500] = f.join(",");
    expect(err(l.join("\r\n"))).toMatchObject({ line: 501, field: 7 });
  });
  it("a short record, a truncated file and a wrong header are refused", () => {
    const l = lines.slice();
    l[20] = l[20].split(",").slice(0, 10).join(",");
    expect(err(l.join("\r\n"))).toMatchObject({ line: 21 });
    expect(err(lines.slice(0, 4000).join("\r\n")).message).toMatch(/expected 8760 hourly records/);
    expect(err(["NOT A LOCATION", ...lines.slice(1)].join("\r\n"))).toMatchObject({ line: 1, field: 1 });
  });
  it("an hour out of sequence names field 4", () => {
    const l = lines.slice();
    const f = l[30].split(",");
    f[3] = "9";
    l[30] = f.join(",");
    expect(err(l.join("\r\n"))).toMatchObject({ line: 31, field: 4 });
  });
});
