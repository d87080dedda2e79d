// EnergyPlus Weather (EPW) reader: 8 header lines + 8760 hourly records, CRLF or LF.
// Takes the file's text (no I/O). Scans by character code, so a year parses
// without splitting 300,000 field strings. Field numbers below are 1-based.
import { cToF } from "./units";

export class EpwParseError extends Error {
  constructor(readonly line: number, readonly field: number | string, message: string) {
    super(`EPW line ${line}, field ${field}: ${message}`);
    this.name = "EpwParseError";
  }
}

export interface EpwLocation {
  city: string; stateProvince: string; country: string; dataSource: string; wmo: string;
  latitude: number; longitude: number; timeZone: number; elevationM: number;
}
export interface EpwData { location: EpwLocation; hours: number; month: Uint8Array; day: Uint8Array; dryBulbC: Float64Array }

// The eight header records of an EPW file, in order (EnergyPlus Auxiliary Programs, weather file format, from memory)
const HEADERS = ["LOCATION", "DESIGN CONDITIONS", "TYPICAL/EXTREME PERIODS", "GROUND TEMPERATURES", "HOLIDAYS/DAYLIGHT SAVINGS", "COMMENTS 1", "COMMENTS 2", "DATA PERIODS"];
// Hourly records in a non-leap year; the field count of an EPW record (EnergyPlus Auxiliary Programs, weather format)
export const EPW_HOURS = 8760;
export const EPW_FIELDS = 35;
// EPW missing-value code for dry-bulb, °C (same document)
const DRY_BULB_MISSING = 99.9;

/** Parse a decimal number from text[a, b) without allocating; NaN when it is not one. */
function num(t: string, a: number, b: number): number {
  let i = a;
  while (i < b && t.charCodeAt(i) === 32) i++;
  while (b > i && t.charCodeAt(b - 1) === 32) b--;
  let sign = 1;
  if (i < b && (t.charCodeAt(i) === 45 || t.charCodeAt(i) === 43)) { if (t.charCodeAt(i) === 45) sign = -1; i++; }
  let m = 0, k = 0, digits = 0, dot = false;
  for (; i < b; i++) {
    const c = t.charCodeAt(i);
    if (c >= 48 && c <= 57) { m = m * 10 + (c - 48); digits++; if (dot) k++; }
    else if (c === 46 && !dot) dot = true;
    else return NaN;
  }
  return digits === 0 ? NaN : (sign * m) / 10 ** k;
}

export function parseEpw(text: string): EpwData {
  let pos = 0;
  let lineNo = 0;
  const nextLine = (): [number, number] | null => {
    if (pos >= text.length) return null;
    let end = text.indexOf("\n", pos);
    if (end < 0) end = text.length;
    const start = pos;
    pos = end + 1;
    lineNo++;
    return [start, end > start && text.charCodeAt(end - 1) === 13 ? end - 1 : end];
  };
  let location: EpwLocation | undefined;
  for (let h = 0; h < HEADERS.length; h++) {
    const r = nextLine();
    if (!r) throw new EpwParseError(lineNo + 1, 1, `file ends before the ${HEADERS[h]} header line`);
    const line = text.slice(r[0], r[1]);
    if (!line.startsWith(HEADERS[h] + ",")) throw new EpwParseError(lineNo, 1, `expected the ${HEADERS[h]} header, found "${line.slice(0, 30)}"`);
    if (h === 0) location = parseLocation(line, lineNo);
  }
  const month = new Uint8Array(EPW_HOURS);
  const day = new Uint8Array(EPW_HOURS);
  const dryBulbC = new Float64Array(EPW_HOURS);
  for (let i = 0; i < EPW_HOURS; i++) {
    const r = nextLine();
    if (!r || r[0] === r[1]) throw new EpwParseError(lineNo + (r ? 0 : 1), 1, `expected ${EPW_HOURS} hourly records, found ${i}`);
    const [s, e] = r;
    let fieldStart = s;
    let field = 1;
    let mo = 0, dy = 0;
    while (true) {
      let c = text.indexOf(",", fieldStart);
      if (c < 0 || c > e) c = e;
      if (field <= 4 || field === 7) {
        const v = num(text, fieldStart, c);
        if (Number.isNaN(v)) throw new EpwParseError(lineNo, field, `"${text.slice(fieldStart, c)}" is not a number`);
        if (field === 1) { if (v % 1) throw new EpwParseError(lineNo, 1, `year ${v} is not a whole number`); }
        else if (field === 2) { if (v < 1 || v > 12 || v % 1) throw new EpwParseError(lineNo, 2, `month ${v} is not 1–12`); mo = v; }
        else if (field === 3) { if (v < 1 || v > 31 || v % 1) throw new EpwParseError(lineNo, 3, `day ${v} is not 1–31`); dy = v; }
        else if (field === 4) { if (v !== (i % 24) + 1) throw new EpwParseError(lineNo, 4, `hour ${v} out of sequence (expected ${(i % 24) + 1})`); }
        else if (field === 7) {
          if (v === DRY_BULB_MISSING || v < -90 || v > 70) throw new EpwParseError(lineNo, 7, `dry-bulb ${v} °C is missing or out of range`);
          dryBulbC[i] = v;
        }
      }
      if (c === e) break;
      fieldStart = c + 1;
      field++;
    }
    if (field < EPW_FIELDS) throw new EpwParseError(lineNo, field, `record has ${field} fields, expected ${EPW_FIELDS}`);
    if (i % 24 !== 0 && (mo !== month[i - 1] || dy !== day[i - 1])) throw new EpwParseError(lineNo, 3, "date changes within a day's 24 hours");
    month[i] = mo;
    day[i] = dy;
  }
  return { location: location!, hours: EPW_HOURS, month, day, dryBulbC };
}

function parseLocation(line: string, lineNo: number): EpwLocation {
  const f = line.split(",");
  if (f.length < 10) throw new EpwParseError(lineNo, f.length, "LOCATION needs 10 fields");
  const n = (i: number, name: string) => {
    const v = Number(f[i]);
    if (f[i].trim() === "" || !Number.isFinite(v)) throw new EpwParseError(lineNo, i + 1, `${name} "${f[i]}" is not a number`);
    return v;
  };
  const latitude = n(6, "latitude");
  const longitude = n(7, "longitude");
  if (Math.abs(latitude) > 90) throw new EpwParseError(lineNo, 7, `latitude ${latitude} out of range`);
  if (Math.abs(longitude) > 180) throw new EpwParseError(lineNo, 8, `longitude ${longitude} out of range`);
  return {
    city: f[1].replace(/\s+/g, " ").trim(), stateProvince: f[2].trim(), country: f[3].trim(), dataSource: f[4].trim(), wmo: f[5].trim(),
    latitude, longitude, timeZone: n(8, "time zone"), elevationM: n(9, "elevation"),
  };
}

/** Daily means of the hourly dry-bulb, °C, with each day's month. */
export function dailyMeansC(epw: EpwData): { meanC: Float64Array; month: Uint8Array } {
  const days = epw.hours / 24;
  const meanC = new Float64Array(days);
  const month = new Uint8Array(days);
  for (let d = 0; d < days; d++) {
    let s = 0;
    for (let h = d * 24; h < d * 24 + 24; h++) s += epw.dryBulbC[h];
    meanC[d] = s / 24;
    month[d] = epw.month[d * 24];
  }
  return { meanC, month };
}

export interface DegreeDays { base: number; unit: "°C-days" | "°F-days"; heatingMonthly: number[]; heatingAnnual: number; coolingMonthly: number[]; coolingAnnual: number }

function degreeDaysFrom(means: Float64Array, month: Uint8Array, base: number, toUnit: (c: number) => number, unit: DegreeDays["unit"]): DegreeDays {
  const h = new Array<number>(12).fill(0);
  const c = new Array<number>(12).fill(0);
  for (let d = 0; d < means.length; d++) {
    const t = toUnit(means[d]);
    if (t < base) h[month[d] - 1] += base - t;
    else c[month[d] - 1] += t - base;
  }
  return { base, unit, heatingMonthly: h, heatingAnnual: h.reduce((a, b) => a + b, 0), coolingMonthly: c, coolingAnnual: c.reduce((a, b) => a + b, 0) };
}

/** Degree days at a base in °C, from daily means of hourly dry-bulb (the EnergyPlus weather converter's method). */
export function degreeDaysC(epw: EpwData, baseC: number): DegreeDays {
  const { meanC, month } = dailyMeansC(epw);
  return degreeDaysFrom(meanC, month, baseC, (t) => t, "°C-days");
}

/** Degree days at a base in °F (e.g. 65), from the daily means converted to °F. */
export function degreeDaysF(epw: EpwData, baseF: number): DegreeDays {
  const { meanC, month } = dailyMeansC(epw);
  return degreeDaysFrom(meanC, month, baseF, cToF, "°F-days");
}

/**
 * Heating design dry-bulb at 99.6 % or 99 % from this file's hourly distribution: the
 * k-th coldest hour with k = ⌈(1 − p)·hours⌉, so at most (1 − p) of the hours are colder.
 * One weather year, not the handbook's long-term value.
 */
export function heatingDesignDryBulbC(epw: EpwData, percent: 99.6 | 99): number {
  const sorted = Float64Array.from(epw.dryBulbC).sort();
  const k = Math.ceil(((100 - percent) / 100) * epw.hours - 1e-9);
  return sorted[Math.max(0, k - 1)];
}
