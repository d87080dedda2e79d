// Material library. Entries taken from the open EnergyPlus dataset
// ASHRAE_2005_HOF_Materials.idf (NREL/EnergyPlus, datasets/; a reproduction of
// ASHRAE Handbook of Fundamentals 2005 ch. 25 Table 4 and ch. 30 Tables 19/22)
// carry that entry's SI figures, converted to IP here; the rest are tagged
// `from memory` or `common practice` as METHODS.md asks.
import { IN_TO_M, R_SI_TO_IP } from "./units";

export type MaterialCategory =
  | "air-film" | "interior-finish" | "sheathing" | "framing" | "siding"
  | "masonry" | "air-space" | "insulation" | "membrane";

/** The dataset entry a material cites, with the SI figures the product carries. */
export interface DatasetRef {
  entry: string;
  conductivityWmK?: number;
  thicknessM?: number;
  rSI?: number;
}

export interface Material {
  key: string;
  name: string;
  category: MaterialCategory;
  /** R per inch of thickness (h·ft²·°F/Btu per in.), for materials sized by thickness. */
  rPerInchIP?: number;
  /** R of the layer as sold or as built (h·ft²·°F/Btu). */
  rValueIP?: number;
  /** Typical or stated thickness, in. */
  thicknessIn?: number;
  source: string;
  dataset?: DatasetRef;
}

// Source name of the open dataset (NREL/EnergyPlus datasets/, commit 1ad365f per the materials README)
const DS = "EnergyPlus ASHRAE_2005_HOF_Materials.idf";

/** A layer of fixed R from a dataset Material:NoMass or Material:AirGap entry. */
function dsR(key: string, name: string, category: MaterialCategory, entry: string, rSI: number, thicknessIn?: number): Material {
  return { key, name, category, rValueIP: rSI * R_SI_TO_IP, thicknessIn, source: `${DS}, entry "${entry}" (R = ${rSI} m²·K/W) [doc]`, dataset: { entry, rSI } };
}

/** A layer from a dataset Material entry (thickness / conductivity). Pass
 * `thicknessIn` to size it differently from the entry (R scales with thickness). */
function dsK(key: string, name: string, category: MaterialCategory, entry: string, k: number, entryThicknessM: number, thicknessIn?: number): Material {
  const rPerInchIP = (IN_TO_M / k) * R_SI_TO_IP;
  const tIn = thicknessIn ?? entryThicknessM / IN_TO_M;
  return { key, name, category, rPerInchIP, rValueIP: rPerInchIP * tIn, thicknessIn: tIn, source: `${DS}, entry "${entry}" (k = ${k} W/m·K${thicknessIn ? `, sized to ${thicknessIn} in.` : ""}) [doc]`, dataset: { entry, conductivityWmK: k, thicknessM: entryThicknessM } };
}

/** A per-inch material from a dataset Material entry (conductivity only). */
function dsPerInch(key: string, name: string, category: MaterialCategory, entry: string, k: number, entryThicknessM: number): Material {
  return { key, name, category, rPerInchIP: (IN_TO_M / k) * R_SI_TO_IP, source: `${DS}, entry "${entry}" (k = ${k} W/m·K) [doc]`, dataset: { entry, conductivityWmK: k, thicknessM: entryThicknessM } };
}

// Common prefix of the dataset's mineral-fibre batt entries
const MF = "Insulation: Mineral fiber - processed from rock - slag - or glass - ";
// Surface films are not in the dataset: ASHRAE Fundamentals surface-resistance table, from memory
const FILM = "ASHRAE Handbook—Fundamentals, surface film resistance table (from memory)";

export const materials: readonly Material[] = [
  // Surface films: ASHRAE Fundamentals surface-resistance table, from memory (not in the dataset).
  { key: "film-inside-wall", name: "Inside air film, vertical surface, still air", category: "air-film", rValueIP: 0.68, source: FILM },
  { key: "film-inside-ceiling", name: "Air film, horizontal surface, heat flow up, still air", category: "air-film", rValueIP: 0.61, source: FILM },
  { key: "film-inside-floor", name: "Air film, horizontal surface, heat flow down, still air", category: "air-film", rValueIP: 0.92, source: FILM },
  { key: "film-outside", name: "Outside air film, 15 mph wind (winter)", category: "air-film", rValueIP: 0.17, source: FILM },
  // Interior finishes
  dsK("gypsum-board-0.5in", "Gypsum board ½ in.", "interior-finish", "G01 16mm gypsum board", 0.16, 0.0159, 0.5),
  dsK("gypsum-board-0.625in", "Gypsum board ⅝ in.", "interior-finish", "G01 16mm gypsum board", 0.16, 0.0159),
  { key: "plaster-wood-lath", name: "Plaster on wood lath (old houses), about ¾ in. plus lath", category: "interior-finish", rValueIP: 0.4, thicknessIn: 1, source: "ASHRAE Fundamentals older material tables, from memory (METHODS.md: ≈ 0.40)" },
  dsR("plaster-metal-lath-0.75in", "Lightweight gypsum plaster on metal lath ¾ in.", "interior-finish", "Gypsum plaster: Lightweight aggregate on metal lath - 19mm", 0.083, 0.75),
  // Sheathing and membranes
  dsK("plywood-0.5in", "Plywood ½ in.", "sheathing", "Plywood (Douglas Fir) - 12.7mm", 0.12, 0.0127),
  dsK("plywood-0.75in", "Plywood ¾ in.", "sheathing", "Plywood or wood panels - 19.0mm", 0.12, 0.019),
  dsK("osb-0.4375in", "OSB ⁷⁄₁₆ in. (dataset waferboard)", "sheathing", "Waferboard", 0.091, 0.019, 0.4375),
  dsK("board-sheathing-0.75in", "Wood board sheathing ¾ in.", "sheathing", "Wood subfloor - 19mm", 0.115, 0.019),
  dsK("fibreboard-sheathing-0.5in", "Fibreboard sheathing ½ in., regular density", "sheathing", "Sheathing - regular density - 12.7mm", 0.055, 0.0127),
  dsR("building-paper", "Building paper / felt, vapour permeable", "membrane", "Vaporpermeable felt", 0.011),
  // Framing (per inch of depth)
  dsPerInch("softwood-framing", "Softwood framing (per inch)", "framing", "Softwood - 25mm", 0.129, 0.025),
  dsPerInch("steel-framing", "Steel framing (per inch)", "framing", "F08 Metal surface", 45.28, 0.0008),
  // Sidings
  dsR("wood-bevel-siding-0.5x8", "Wood bevel siding ½ × 8 in., lapped", "siding", "Siding: Wood - bevel 13 by 200mm - lapped", 0.14, 0.5),
  dsR("wood-bevel-siding-0.75x10", "Wood bevel siding ¾ × 10 in., lapped", "siding", "Siding: Wood - bevel 19 by 250mm - lapped", 0.18, 0.75),
  dsR("wood-drop-siding-1x8", "Wood drop siding 1 × 8 in.", "siding", "Siding: Wood - drop 20 by 200mm", 0.14, 0.75),
  dsR("plywood-siding-0.375in", "Plywood siding ⅜ in., lapped", "siding", "Siding: Wood - plywood 9.5mm - lapped", 0.1, 0.375),
  dsR("hardboard-siding", "Hardboard siding 7⁄16 in.", "siding", "Siding: Hardboard 11mm", 0.12, 0.4375),
  dsR("hollow-backed-siding", "Hollow-backed siding (vinyl or aluminium)", "siding", "Siding: Hollow-backed", 0.11),
  dsR("asbestos-cement-siding", "Asbestos-cement siding ¼ in.", "siding", "Siding: Asbestos-cement 6.4mm", 0.037, 0.25),
  dsR("wood-shingles", "Wood shingles, 16 in., 7½ in. exposure", "siding", "Shingles: Wood 400mm - 190-mm exposure", 0.15),
  dsK("stucco-0.875in", "Stucco ⅞ in.", "siding", "F07 25mm stucco", 0.72, 0.0254, 0.875),
  // Masonry
  dsK("brick-common-4in", "Common brick 4 in. (1920 kg/m³)", "masonry", "Brick - fired clay - 1920 kg/m3 - 102mm", 0.895, 0.102),
  dsK("brick-face-4in", "Face brick 4 in. (2080 kg/m³)", "masonry", "Brick - fired clay - 2080 kg/m3 - 102mm", 1.02, 0.102),
  dsK("concrete-block-8in", "Concrete block 8 in.", "masonry", "M05 200mm concrete block", 1.11, 0.2032),
  dsK("lightweight-block-8in", "Lightweight concrete block 8 in.", "masonry", "M03 200mm lightweight concrete block", 0.5, 0.2032),
  dsK("concrete-8in", "Poured concrete 8 in.", "masonry", "M15 200mm heavyweight concrete", 1.95, 0.2032),
  // Air spaces
  dsR("air-space-wall", "Closed air space in a wall (empty cavity)", "air-space", "F04 Wall air space resistance", 0.15),
  dsR("air-space-ceiling", "Closed air space in a ceiling or floor (empty cavity)", "air-space", "F05 Ceiling air space resistance", 0.18),
  // Insulation
  dsR("batt-r11-3.5in", "Glass-fibre batt R-11, 3½ in.", "insulation", `${MF}75-100mm 6.4-32 kg/m3`, 1.94, 3.5),
  dsR("batt-r13-3.5in", "Glass-fibre batt R-13, 3½ in.", "insulation", `${MF}90mm -6.4-32 kg/m3`, 2.29, 3.5),
  dsR("batt-r15-3.5in", "Glass-fibre batt R-15, 3½ in. (high density)", "insulation", `${MF}90mm - 19-26 kg/m3`, 2.63, 3.5),
  dsR("batt-r19-6in", "Glass-fibre batt R-19, 6–6½ in.", "insulation", `${MF}140-165mm - 6.4-32 kg/m3`, 3.32, 6.25),
  dsR("batt-r21-5.5in", "Glass-fibre batt R-21, 5½ in.", "insulation", `${MF}140mm - 10-26 kg/m3`, 3.67, 5.5),
  dsR("batt-r30", "Glass-fibre batt R-30, 8½–10 in.", "insulation", `${MF}210-250mm - 6.4-32 kg/m3`, 5.34, 9.25),
  dsR("batt-r38", "Glass-fibre batt R-38, 10–13 in.", "insulation", `${MF}250-330mm - 6.4-32 kg/m3`, 6.77, 11.5),
  dsR("mineral-fibre-loose-4in", "Mineral-fibre loose fill, 3¾–5 in. (older attics)", "insulation", "Mineral fiber (rock - slag - glass) - 95-130mm", 1.94, 4.4),
  dsR("mineral-fibre-sidewall-3.5in", "Mineral fibre blown into a closed 3½ in. sidewall", "insulation", "Mineral fiber (rock - slag - glass) - 90mm (closed sidewall application)", 2.3, 3.5),
  { key: "cellulose-loose-fill", name: "Cellulose loose fill, attic (settled)", category: "insulation", rPerInchIP: 3.4, source: "trade publications per METHODS.md, not checked here: from memory / common practice (≈ 3.4 per inch settled)" },
  { key: "cellulose-dense-pack", name: "Cellulose dense-pack, 3.5–4.0 lb/ft³", category: "insulation", rPerInchIP: 3.7, source: "trade publications per METHODS.md, not checked here: from memory / common practice (≈ 3.6–3.8 per inch)" },
  { key: "vermiculite-loose-fill", name: "Vermiculite loose fill (treat as asbestos-containing)", category: "insulation", rPerInchIP: 2.2, source: "ASHRAE Fundamentals older material tables, from memory (≈ 2.1–2.4 per inch)" },
  dsPerInch("eps-per-inch", "Expanded polystyrene board, 1 lb/ft³ (per inch)", "insulation", "Insulation: Expanded polystyrene - molded beads - 16kg/m3 density", 0.037, 0.025),
  dsPerInch("xps-per-inch", "Extruded polystyrene board (per inch)", "insulation", "Insulation: Expanded polystyrene - extruded (smooth skin surface) (HCFC-142b exp.)", 0.029, 0.025),
  dsPerInch("polyiso-foil-per-inch", "Polyisocyanurate board, foil facers (per inch)", "insulation", "Insulation: Cellular polyisocyanuratej (CFC-11 exp.) (gasimpermeable facers)", 0.02, 0.025),
  dsPerInch("polyurethane-foam-per-inch", "Closed-cell polyurethane foam (per inch)", "insulation", "Insulation: Cellular polyurethane/polyisocyanuratei (CFC11 exp.) (unfaced)", 0.0245, 0.025),
  dsPerInch("glass-fibre-board-per-inch", "Glass-fibre board, organic bonded (per inch)", "insulation", "Insulation: Glass fiber - organic bonded - 25mm", 0.036, 0.025),
];

const byKey = new Map(materials.map((m) => [m.key, m]));

export function getMaterial(key: string): Material | undefined {
  return byKey.get(key);
}

/** R of a layer of this material: its own R, or R per inch × thickness. */
export function layerRValueIP(m: Material, thicknessIn?: number): number {
  if (thicknessIn !== undefined && m.rPerInchIP !== undefined) return m.rPerInchIP * thicknessIn;
  if (m.rValueIP !== undefined) return m.rValueIP;
  if (m.rPerInchIP !== undefined && m.thicknessIn !== undefined) return m.rPerInchIP * m.thicknessIn;
  throw new Error(`material ${m.key} needs a thickness`);
}

export interface WindowOrDoor { key: string; name: string; kind: "window" | "door"; uFactorIP: number; source: string }

// Whole-unit U defaults (IECC default fenestration and door tables, from memory)
const IECC_WIN = "IECC default glazed fenestration U-factor table (from memory)";
const IECC_DOOR = "IECC default opaque door U-factor table (from memory)";

/** Whole-unit U-factors (frame and glass together). */
export const windowsAndDoors: readonly WindowOrDoor[] = [
  { key: "window-single-metal", name: "Single glazing, metal frame", kind: "window", uFactorIP: 1.2, source: IECC_WIN },
  { key: "window-single-nonmetal", name: "Single glazing, wood or vinyl frame", kind: "window", uFactorIP: 0.8, source: IECC_WIN },
  { key: "window-double-metal", name: "Double glazing, metal frame", kind: "window", uFactorIP: 0.8, source: IECC_WIN },
  { key: "window-double-nonmetal", name: "Double glazing, wood or vinyl frame", kind: "window", uFactorIP: 0.55, source: IECC_WIN },
  { key: "window-double-low-e", name: "Double glazing, low-e, gas fill, wood or vinyl frame", kind: "window", uFactorIP: 0.3, source: "typical rated whole-unit U of current low-e double units, from memory" },
  { key: "door-metal-uninsulated", name: "Metal door, uninsulated", kind: "door", uFactorIP: 1.2, source: IECC_DOOR },
  { key: "door-metal-insulated", name: "Metal door, insulated", kind: "door", uFactorIP: 0.6, source: IECC_DOOR },
  { key: "door-wood", name: "Wood door", kind: "door", uFactorIP: 0.5, source: IECC_DOOR },
  { key: "door-insulated-nonmetal", name: "Insulated door, non-metal edge", kind: "door", uFactorIP: 0.35, source: IECC_DOOR },
];

const wdByKey = new Map(windowsAndDoors.map((w) => [w.key, w]));
export function getWindowOrDoor(key: string): WindowOrDoor | undefined {
  return wdByKey.get(key);
}
