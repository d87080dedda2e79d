// Soft warnings: legal but unusual values, worth a second look before a report goes out.
import type { InputIssue } from "./errors";
import { houseInputSchema, type HouseInputParsed } from "./schema";

// Thresholds below are common practice for flagging a data-entry slip, not limits of the methods.
const MAX_FRAMING_FRACTION = 0.4;
const MAX_ACH50 = 10;
const MIN_ACH50 = 1;
const CEILING_HEIGHT_FT = [6, 20] as const;
const MAX_WINDOW_SHARE = 0.35;

/** Warnings for any input; an input that fails validation gets none (its errors say more). */
export function softWarnings(input: unknown): InputIssue[] {
  const r = houseInputSchema.safeParse(input);
  return r.success ? softWarningsParsed(r.data) : [];
}

export function softWarningsParsed(h: HouseInputParsed): InputIssue[] {
  const w: InputIssue[] = [];
  h.assemblies.forEach((a, i) => a.layers.forEach((l, j) => {
    if ("framed" in l && (l.framed.framingFraction ?? 0) > MAX_FRAMING_FRACTION)
      w.push({ path: `assemblies.${i}.layers.${j}.framed.framingFraction`, message: `Framing fraction ${l.framed.framingFraction} is above ${MAX_FRAMING_FRACTION}: field studies rarely find more; check the entry.` });
  }));
  const ach = (h.blowerDoor.cfm50TestIn * 60) / h.volumeFt3;
  if (ach > MAX_ACH50) w.push({ path: "blowerDoor.cfm50TestIn", message: `ACH50 of ${ach.toFixed(1)} is very leaky (above ${MAX_ACH50}): check the blower-door reading and the house volume.` });
  if (ach < MIN_ACH50) w.push({ path: "blowerDoor.cfm50TestIn", message: `ACH50 of ${ach.toFixed(2)} is unusually tight for an existing house: check the reading and the volume.` });
  const height = h.volumeFt3 / h.floorAreaFt2;
  if (height < CEILING_HEIGHT_FT[0] || height > CEILING_HEIGHT_FT[1]) w.push({ path: "volumeFt3", message: `Volume ÷ floor area gives an average ceiling height of ${height.toFixed(1)} ft: check both figures.` });
  const e = h.heating.efficiency;
  if (e.kind === "afue" && e.value < 0.5) w.push({ path: "heating.efficiency.value", message: `AFUE of ${e.value} is very low: enter it as a fraction (0.78 for 78 %).` });
  if (e.kind === "cop" && e.value > 5) w.push({ path: "heating.efficiency.value", message: `Seasonal COP of ${e.value} is higher than heat pumps reach over a heating season.` });
  let wall = 0;
  let win = 0;
  for (const s of h.surfaces) if (s.kind === "wall") { wall += s.grossAreaFt2; for (const o of s.openings) if (o.kind === "window") win += o.areaFt2 * (o.count ?? 1); }
  if (wall > 0 && win / wall > MAX_WINDOW_SHARE) w.push({ path: "surfaces", message: `Windows are ${Math.round((100 * win) / wall)} % of the gross wall area: check the window areas.` });
  if (h.correctionFactor !== 1) w.push({ path: "correctionFactor", message: `A degree-day correction factor of ${h.correctionFactor} is applied; the report says so.` });
  if (h.climate.source === "manual" && h.climate.hdd65 > 12_000) w.push({ path: "climate.hdd65", message: `${h.climate.hdd65} heating degree days is beyond any station in the lower 48 states: check the figure and its base.` });
  return w;
}
