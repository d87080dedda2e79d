// Climate for a house: a station of the product's table, a climate the auditor
// types (with the source they used), or one derived from an EPW weather file.
import { CalcInputError } from "../errors";
import { cToF } from "../units";
import { degreeDaysF, heatingDesignDryBulbC, type EpwData } from "../epw";
import { stationTable } from "./station-table";

export interface Station {
  name: string; state: string; wmo: string; latitude: number; longitude: number;
  /** Annual heating / cooling degree days, °F-days (see degreeDayBasis). */
  hdd65: number; cdd65: number;
  degreeDayBasis: "ashrae-18.3C" | "weather-file-18C";
  heatingDesign996F: number; heatingDesign99F: number;
  statFile: string; degreeDaySource: string; designSource: string;
}

export { stationTable };
export const stations = stationTable;

export function findStation(wmo: string): Station | undefined {
  return stationTable.find((s) => s.wmo === wmo);
}

export type ClimateInput =
  | { source: "station"; wmo: string }
  | { source: "manual"; hdd65: number; heatingDesignTempF: number; cdd65?: number; sourceText: string }
  | { source: "epw"; name: string; hdd65: number; cdd65: number; heatingDesign996F: number; heatingDesign99F: number; sourceText: string };

export interface ResolvedClimate {
  kind: ClimateInput["source"]; name: string; hdd65: number; cdd65?: number;
  designPercentile: "99.6" | "99"; heatingDesignTempF: number;
  degreeDaySource: string; designSource: string; station?: Station;
}

export function resolveClimate(c: ClimateInput, percentile: "99.6" | "99", path = "climate"): ResolvedClimate {
  if (c.source === "station") {
    const s = findStation(c.wmo);
    if (!s) throw CalcInputError.at(`${path}.wmo`, `station ${c.wmo} is not in the station table: import its EPW file or type its HDD and design temperature`);
    return {
      kind: "station", name: `${s.name}, ${s.state} (WMO ${s.wmo})`, hdd65: s.hdd65, cdd65: s.cdd65, designPercentile: percentile,
      heatingDesignTempF: percentile === "99.6" ? s.heatingDesign996F : s.heatingDesign99F,
      degreeDaySource: `${s.degreeDaySource} (${s.statFile})`, designSource: `${s.designSource}; ${percentile} % value used`, station: s,
    };
  }
  if (c.source === "manual") {
    return { kind: "manual", name: "climate entered by the auditor", hdd65: c.hdd65, cdd65: c.cdd65, designPercentile: percentile, heatingDesignTempF: c.heatingDesignTempF, degreeDaySource: c.sourceText, designSource: c.sourceText };
  }
  return {
    kind: "epw", name: c.name, hdd65: c.hdd65, cdd65: c.cdd65, designPercentile: percentile,
    heatingDesignTempF: percentile === "99.6" ? c.heatingDesign996F : c.heatingDesign99F,
    degreeDaySource: `${c.sourceText}: HDD65 from daily means of hourly dry-bulb`,
    designSource: `${c.sourceText}: ${percentile} % heating dry-bulb of this one weather year (not a long-term design value)`,
  };
}

/** The climate input an EPW file gives: HDD65/CDD65 from daily means, design dry-bulbs from its hours. */
export function climateFromEpw(epw: EpwData): Extract<ClimateInput, { source: "epw" }> {
  const dd = degreeDaysF(epw, 65);
  const l = epw.location;
  return {
    source: "epw", name: `${l.city}, ${l.stateProvince} (WMO ${l.wmo})`,
    hdd65: dd.heatingAnnual, cdd65: dd.coolingAnnual,
    heatingDesign996F: cToF(heatingDesignDryBulbC(epw, 99.6)), heatingDesign99F: cToF(heatingDesignDryBulbC(epw, 99)),
    sourceText: `EPW weather file ${l.city} ${l.stateProvince}, ${l.dataSource}`,
  };
}
