// Cautions from the house's facts, each with its governing document (METHODS.md §7).

export type Presence = "present" | "absent" | "unknown";
export interface HouseFacts {
  yearBuilt: number;
  knobAndTube: Presence;
  vermiculite: Presence;
  combustionAppliances: boolean;
  plannedAirSealing: boolean;
  plannedDensePack: boolean;
}
export interface Caution { id: string; hazard: string; because: string; document: string; message: string }

// Every caution defers to local codes and licensed practice (PRODUCT.md principles)
const CLOSE = "Follow local codes and licensed practice.";
// Year before which lead-based paint is presumed (EPA RRP rule, 40 CFR 745)
export const LEAD_PAINT_YEAR = 1978;

export function cautionsFor(f: HouseFacts): Caution[] {
  const out: Caution[] = [];
  const add = (id: string, hazard: string, because: string, document: string, text: string) =>
    out.push({ id, hazard, because, document, message: `${text} ${CLOSE}` });
  if (f.yearBuilt < LEAD_PAINT_YEAR)
    add("lead-paint", "Drilling or disturbing painted surfaces", `built in ${f.yearBuilt}, before 1978`, "EPA Renovation, Repair and Painting rule, 40 CFR 745",
      "Presume lead paint: drilling and patching painted surfaces needs lead-safe work practices by a certified renovator.");
  if (f.knobAndTube !== "absent")
    add("knob-and-tube", "Knob-and-tube wiring in cavities to be insulated", f.knobAndTube === "present" ? "knob-and-tube wiring found" : "knob-and-tube wiring not ruled out", "NFPA 70 (National Electrical Code) 394.12; local amendments vary",
      "Do not insulate around live knob-and-tube wiring until an electrician has inspected it and it is replaced or allowed by the local authority.");
  if (f.vermiculite !== "absent")
    add("vermiculite", "Vermiculite insulation", f.vermiculite === "present" ? "vermiculite found" : "vermiculite not ruled out", "EPA guidance on vermiculite insulation (from memory)",
      "Assume vermiculite contains asbestos: do not disturb it; have it tested or removed by a licensed abatement contractor.");
  if (f.combustionAppliances && f.plannedAirSealing)
    add("combustion-safety", "Combustion appliances after air sealing", "combustion appliances and planned air sealing", "ANSI/BPI-1200 combustion-safety testing",
      "Test combustion appliances for draft, spillage and carbon monoxide before and after air sealing.");
  if (f.plannedDensePack) {
    add("cellulose-dust", "Cellulose dust", "dense-pack cellulose planned", "OSHA 29 CFR 1910.134 respiratory protection (from memory)",
      "Crews wear at least an N95 respirator under a respiratory-protection programme while blowing cellulose.");
    add("fire-blocking", "Open holes, fire blocking and heat sources", "dense-pack cellulose planned", "DOE Standard Work Specifications 4.1103.1; IRC R302.11 (from memory)",
      "Plug and seal every hole, keep fire blocking intact and keep insulation clear of recessed lights, flues and other heat sources.");
  }
  return out;
}
