// psychrolib 1.1.1 ships no types; only the members calc/ uses are declared.
declare module "psychrolib" {
  interface Psychrolib {
    IP: number;
    SI: number;
    SetUnitSystem(units: number): void;
    GetUnitSystem(): number | undefined;
    GetTDewPointFromRelHum(tDryBulb: number, relHum: number): number;
    GetRelHumFromTDewPoint(tDryBulb: number, tDewPoint: number): number;
  }
  const psychrolib: Psychrolib;
  export default psychrolib;
}
