// Climate stations offered on forms. Filled from calc's station table once it lands.
export function climateStationOptions(): { wmo: string; label: string }[] {
  return [];
}
