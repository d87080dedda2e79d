// The product's station table: 16 US stations, figures taken from the EnergyPlus
// weather-converter statistics (.stat) files of NREL/EnergyPlus weather/ (file named
// in each row). Degree days: ASHRAE "standard" (long-term, Climate Design Data 2009
// ASHRAE Handbook, base 18.3 °C) × 1.8 → °F-days where the file gives them; otherwise
// the file's own weather-file value at base 18 °C (64.4 °F) × 1.8, marked as such.
// Heating design dry-bulbs are the file's ASHRAE values, °C × 1.8 + 32.
import type { Station } from "./stations";

export const stationTable: readonly Station[] = [
  {
    name: "Phoenix Sky Harbor Intl Ap", state: "AZ", wmo: "722780", latitude: 33.45, longitude: -111.9667,
    hdd65: 941.4, cdd65: 4557.6, degreeDayBasis: "ashrae-18.3C", heatingDesign996F: 38.66, heatingDesign99F: 41.36,
    statFile: "USA_AZ_Phoenix-Sky.Harbor.Intl.AP.722780_TMY3.stat",
    degreeDaySource: "ASHRAE standard degree days, base 18.3 °C: HDD 523, CDD 2532 °C-days × 1.8",
    designSource: "Climate Design Data 2009 ASHRAE Handbook, heating DB 99.6 % 3.7 °C, 99 % 5.2 °C",
  },
  {
    name: "Fresno Yosemite Intl Ap", state: "CA", wmo: "723890", latitude: 36.7667, longitude: -119.7167,
    hdd65: 2300.4, cdd65: 2082.6, degreeDayBasis: "ashrae-18.3C", heatingDesign996F: 31.46, heatingDesign99F: 33.62,
    statFile: "USA_CA_Fresno.Air.Terminal.723890_TMY3.stat",
    degreeDaySource: "ASHRAE standard degree days, base 18.3 °C: HDD 1278, CDD 1157 °C-days × 1.8",
    designSource: "Climate Design Data 2009 ASHRAE Handbook, heating DB 99.6 % -0.3 °C, 99 % 0.9 °C",
  },
  {
    name: "San Francisco Intl Ap", state: "CA", wmo: "724940", latitude: 37.6167, longitude: -122.4,
    hdd65: 2707.2, cdd65: 142.2, degreeDayBasis: "ashrae-18.3C", heatingDesign996F: 38.84, heatingDesign99F: 40.82,
    statFile: "USA_CA_San.Francisco.Intl.AP.724940_TMY3.stat",
    degreeDaySource: "ASHRAE standard degree days, base 18.3 °C: HDD 1504, CDD 79 °C-days × 1.8",
    designSource: "Climate Design Data 2009 ASHRAE Handbook, heating DB 99.6 % 3.8 °C, 99 % 4.9 °C",
  },
  {
    name: "Broomfield Jeffco Boulder S", state: "CO", wmo: "724699", latitude: 40.1167, longitude: -105.2333,
    hdd65: 5749.2, cdd65: 689.4, degreeDayBasis: "weather-file-18C", heatingDesign996F: -4.18, heatingDesign99F: -2.2,
    statFile: "USA_CO_Boulder-Broomfield-Jefferson.County.AP.724699_TMY3.stat",
    degreeDaySource: "no ASHRAE standard degree days in the file: weather-file values at base 18 °C (64.4 °F), HDD 3194, CDD 383 °C-days × 1.8",
    designSource: "design values calculated by the converter from this one weather file (no ASHRAE design data in the file)",
  },
  {
    name: "Colorado Springs Muni Ap", state: "CO", wmo: "724660", latitude: 38.8167, longitude: -104.7167,
    hdd65: 6278.4, cdd65: 439.2, degreeDayBasis: "ashrae-18.3C", heatingDesign996F: -0.76, heatingDesign99F: 5.72,
    statFile: "USA_CO_Colorado.Springs-Peterson.Field.724660_TMY3.stat",
    degreeDaySource: "ASHRAE standard degree days, base 18.3 °C: HDD 3488, CDD 244 °C-days × 1.8",
    designSource: "Climate Design Data 2009 ASHRAE Handbook, heating DB 99.6 % -18.2 °C, 99 % -14.6 °C",
  },
  {
    name: "Denver-Aurora-Buckley AFB", state: "CO", wmo: "724695", latitude: 39.7167, longitude: -104.75,
    hdd65: 6064.2, cdd65: 820.8, degreeDayBasis: "weather-file-18C", heatingDesign996F: -0.22, heatingDesign99F: 6.62,
    statFile: "USA_CO_Denver-Aurora-Buckley.AFB.724695_TMY3.stat",
    degreeDaySource: "no ASHRAE standard degree days in the file: weather-file values at base 18 °C (64.4 °F), HDD 3369, CDD 456 °C-days × 1.8",
    designSource: "Climate Design Data 2009 ASHRAE Handbook, heating DB 99.6 % -17.9 °C, 99 % -14.1 °C",
  },
  {
    name: "Denver Centennial Golden Nr", state: "CO", wmo: "724666", latitude: 39.7333, longitude: -105.1667,
    hdd65: 6206.4, cdd65: 561.6, degreeDayBasis: "ashrae-18.3C", heatingDesign996F: -1.84, heatingDesign99F: 4.1,
    statFile: "USA_CO_Golden-NREL.724666_TMY3.stat",
    degreeDaySource: "ASHRAE standard degree days, base 18.3 °C: HDD 3448, CDD 312 °C-days × 1.8",
    designSource: "Climate Design Data 2009 ASHRAE Handbook, heating DB 99.6 % -18.8 °C, 99 % -15.5 °C",
  },
  {
    name: "Miami Intl Ap", state: "FL", wmo: "722020", latitude: 25.8167, longitude: -80.3,
    hdd65: 129.6, cdd65: 4458.6, degreeDayBasis: "ashrae-18.3C", heatingDesign996F: 47.66, heatingDesign99F: 51.62,
    statFile: "USA_FL_Miami.Intl.AP.722020_TMY3.stat",
    degreeDaySource: "ASHRAE standard degree days, base 18.3 °C: HDD 72, CDD 2477 °C-days × 1.8",
    designSource: "Climate Design Data 2009 ASHRAE Handbook, heating DB 99.6 % 8.7 °C, 99 % 10.9 °C",
  },
  {
    name: "Orlando Intl Arpt", state: "FL", wmo: "722050", latitude: 28.4167, longitude: -81.3167,
    hdd65: 543.6, cdd65: 3378.6, degreeDayBasis: "ashrae-18.3C", heatingDesign996F: 37.76, heatingDesign99F: 41.9,
    statFile: "USA_FL_Orlando.Intl.AP.722050_TMY3.stat",
    degreeDaySource: "ASHRAE standard degree days, base 18.3 °C: HDD 302, CDD 1877 °C-days × 1.8",
    designSource: "Climate Design Data 2009 ASHRAE Handbook, heating DB 99.6 % 3.2 °C, 99 % 5.5 °C",
  },
  {
    name: "Tampa International Ap", state: "FL", wmo: "722110", latitude: 27.9667, longitude: -82.5167,
    hdd65: 527.4, cdd65: 3517.2, degreeDayBasis: "ashrae-18.3C", heatingDesign996F: 38.48, heatingDesign99F: 42.44,
    statFile: "USA_FL_Tampa.Intl.AP.722110_TMY3.stat",
    degreeDaySource: "ASHRAE standard degree days, base 18.3 °C: HDD 293, CDD 1954 °C-days × 1.8",
    designSource: "Climate Design Data 2009 ASHRAE Handbook, heating DB 99.6 % 3.6 °C, 99 % 5.8 °C",
  },
  {
    name: "CHICAGO", state: "IL", wmo: "725300", latitude: 41.7667, longitude: -87.75,
    hdd65: 6253.2, cdd65: 835.2, degreeDayBasis: "weather-file-18C", heatingDesign996F: -5.08, heatingDesign99F: 0.86,
    statFile: "USA_IL_Chicago-OHare_TMY2.stat",
    degreeDaySource: "no ASHRAE standard degree days in the file: weather-file values at base 18 °C (64.4 °F), HDD 3474, CDD 464 °C-days × 1.8",
    designSource: "Climate Design Data 2005 ASHRAE Handbook, heating DB 99.6 % -20.6 °C, 99 % -17.3 °C",
  },
  {
    name: "Univ Of Illinois Wi Bondville", state: "IL", wmo: "725315", latitude: 40.05, longitude: -88.3667,
    hdd65: 5657.4, cdd65: 1009.8, degreeDayBasis: "ashrae-18.3C", heatingDesign996F: -0.94, heatingDesign99F: 4.28,
    statFile: "USA_IL_University.of.Illinois-Willard.AP.725315_TMY3.stat",
    degreeDaySource: "ASHRAE standard degree days, base 18.3 °C: HDD 3143, CDD 561 °C-days × 1.8",
    designSource: "Climate Design Data 2009 ASHRAE Handbook, heating DB 99.6 % -18.3 °C, 99 % -15.4 °C",
  },
  {
    name: "Newark International Arpt", state: "NJ", wmo: "725020", latitude: 40.7167, longitude: -74.1667,
    hdd65: 4710.6, cdd65: 1242.0, degreeDayBasis: "ashrae-18.3C", heatingDesign996F: 11.12, heatingDesign99F: 15.62,
    statFile: "USA_NJ_Newark.Intl.AP.725020_TMY3.stat",
    degreeDaySource: "ASHRAE standard degree days, base 18.3 °C: HDD 2617, CDD 690 °C-days × 1.8",
    designSource: "Climate Design Data 2009 ASHRAE Handbook, heating DB 99.6 % -11.6 °C, 99 % -9.1 °C",
  },
  {
    name: "Las Vegas Mccarran Intl Ap", state: "NV", wmo: "723860", latitude: 36.0667, longitude: -115.15,
    hdd65: 2104.2, cdd65: 3348.0, degreeDayBasis: "ashrae-18.3C", heatingDesign996F: 30.56, heatingDesign99F: 33.26,
    statFile: "USA_NV_Las.Vegas-McCarran.Intl.AP.723860_TMY3.stat",
    degreeDaySource: "ASHRAE standard degree days, base 18.3 °C: HDD 1169, CDD 1860 °C-days × 1.8",
    designSource: "Climate Design Data 2009 ASHRAE Handbook, heating DB 99.6 % -0.8 °C, 99 % 0.7 °C",
  },
  {
    name: "Oklahoma City Will Rogers Wor", state: "OK", wmo: "723530", latitude: 35.3667, longitude: -97.5833,
    hdd65: 3515.4, cdd65: 1926.0, degreeDayBasis: "ashrae-18.3C", heatingDesign996F: 11.48, heatingDesign99F: 17.42,
    statFile: "USA_OK_Oklahoma.City-Will.Rogers.World.AP.723530_TMY3.stat",
    degreeDaySource: "ASHRAE standard degree days, base 18.3 °C: HDD 1953, CDD 1070 °C-days × 1.8",
    designSource: "Climate Design Data 2009 ASHRAE Handbook, heating DB 99.6 % -11.4 °C, 99 % -8.1 °C",
  },
  {
    name: "Washington Dc Dulles IntL Ar", state: "VA", wmo: "724030", latitude: 38.9667, longitude: -77.4667,
    hdd65: 4735.8, cdd65: 1119.6, degreeDayBasis: "ashrae-18.3C", heatingDesign996F: 10.76, heatingDesign99F: 15.8,
    statFile: "USA_VA_Sterling-Washington.Dulles.Intl.AP.724030_TMY3.stat",
    degreeDaySource: "ASHRAE standard degree days, base 18.3 °C: HDD 2631, CDD 622 °C-days × 1.8",
    designSource: "Climate Design Data 2009 ASHRAE Handbook, heating DB 99.6 % -11.8 °C, 99 % -9 °C",
  },
];
