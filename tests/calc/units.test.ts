import { describe, expect, it } from "vitest";
import { convert, toSI } from "@/calc";
import { R_SI_PER_IP } from "./helpers";

describe("SI display conversions through mathjs (checked against NIST SP 811 definitions by hand)", () => {
  it("R, U, area, volume, temperature, power, airflow", () => {
    expect(toSI.rValue(1)).toBeCloseTo(R_SI_PER_IP, 10); // 0.17611 m²·K/W (METHODS.md)
    expect(toSI.uFactor(1)).toBeCloseTo(1 / R_SI_PER_IP, 8); // 5.678 W/m²·K
    expect(toSI.area(1)).toBeCloseTo(0.3048 ** 2, 12);
    expect(toSI.volume(1)).toBeCloseTo(0.3048 ** 3, 12);
    expect(toSI.temperature(32)).toBeCloseTo(0, 10);
    expect(toSI.temperature(212)).toBeCloseTo(100, 12);
    expect(toSI.power(1)).toBeCloseTo(1055.05585262 / 3600, 8);
    expect(toSI.airflow(1)).toBeCloseTo((0.3048 ** 3 * 1000) / 60, 10);
    expect(convert(1, "inch", "mm")).toBeCloseTo(25.4, 12);
  });
});
