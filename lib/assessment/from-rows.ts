// Database rows ↔ the assessment document. Pure: no database access here.
import type { assemblies, heatingSystems, houses, leakageTests, surfaces, upgrades } from "@/db/schema";
import type { AssessmentDoc, AssessmentUpgrade } from "./doc";

type Row<T extends { $inferSelect: unknown }> = T["$inferSelect"];
type Presence = "present" | "absent" | "unknown";

const toPresence = (v: boolean | Presence | undefined): Presence => (v === true ? "present" : v === false ? "absent" : (v ?? "unknown"));

export const fuelToCalc = { gas: "natural-gas", oil: "oil", propane: "propane", electric: "electric-resistance", "heat-pump": "heat-pump" } as const;
export const fuelToDb = { "natural-gas": "gas", oil: "oil", propane: "propane", "electric-resistance": "electric", "heat-pump": "heat-pump" } as const;

export function climateOf(h: Row<typeof houses>): AssessmentDoc["house"]["climate"] {
  if (h.epwClimate) {
    const e = h.epwClimate;
    return { source: "epw", name: e.stationName ?? "EPW file", hdd65: e.hdd65, cdd65: Number(e.cdd65 ?? 0), heatingDesign996F: Number(e.heatingDesign996F ?? e.designTempF), heatingDesign99F: Number(e.heatingDesign99F ?? e.designTempF), sourceText: e.source };
  }
  if (h.customClimate) return { source: "manual", hdd65: h.customClimate.hdd65, heatingDesignTempF: h.customClimate.designTempF, sourceText: h.customClimate.source };
  if (h.climateStationWmo) return { source: "station", wmo: h.climateStationWmo };
  return null;
}

export function docFromRows(r: {
  house: Row<typeof houses>;
  targetCfm50: number | null;
  heating: Row<typeof heatingSystems> | undefined;
  defaultFuelPriceCents: number;
  tests: Row<typeof leakageTests>[];
  surfaces: Row<typeof surfaces>[];
  assemblies: Row<typeof assemblies>[];
  upgrades: Row<typeof upgrades>[];
}): AssessmentDoc {
  const h = r.house;
  const heat = r.heating;
  const fuel = heat ? fuelToCalc[heat.fuel] : "natural-gas";
  const efficiency = !heat
    ? { kind: "afue" as const, value: 0.8 }
    : heat.fuel === "heat-pump" && heat.hspf
      ? { kind: "hspf" as const, value: heat.hspf }
      : heat.fuel === "heat-pump" || heat.fuel === "electric"
        ? { kind: "cop" as const, value: heat.efficiency }
        : { kind: "afue" as const, value: heat.efficiency };
  const parents = r.surfaces.filter((s) => !s.parentSurfaceId).sort((a, b) => a.position - b.position);
  return {
    house: {
      yearBuilt: h.yearBuilt, stories: h.stories, floorAreaFt2: h.conditionedAreaFt2, volumeFt3: h.volumeFt3, ceilingHeightFt: h.ceilingHeightFt,
      bedrooms: h.bedrooms, foundation: h.foundation, shielding: h.shielding, indoorTempF: h.indoorDesignTempF, indoorRH: h.indoorRhPct / 100,
      climate: climateOf(h),
      hazards: { knobAndTube: h.hazards.knobAndTube, vermiculite: toPresence(h.hazards.vermiculite), leadPaint: h.hazards.leadPaint, combustionAppliances: h.hazards.combustionAppliances ?? [] },
    },
    heating: { fuel, efficiency, pricePerUnitUSD: (heat?.fuelPriceCentsPerUnit ?? r.defaultFuelPriceCents) / 100 },
    leakage: {
      targetCfm50: r.targetCfm50,
      tests: r.tests.map((t) => ({ id: t.id, phase: t.phase, cfm50: t.cfm50, testedAt: t.testedAt.getTime(), outdoorTempF: t.outdoorTempF, windMph: t.windMph, notes: t.notes })),
    },
    surfaces: parents.map((s) => ({
      id: s.id, name: s.label, kind: s.kind as "wall" | "ceiling" | "floor", orientation: s.orientation, grossAreaFt2: s.grossAreaFt2,
      assemblyKey: s.assemblyKey ?? "", ...(s.heightFt != null ? { heightFt: s.heightFt } : {}), ...(s.bufferFactor != null ? { bufferFactor: s.bufferFactor } : {}),
      ...(s.blockedBayFraction != null ? { blockedBayFraction: s.blockedBayFraction } : {}),
      openings: r.surfaces
        .filter((o) => o.parentSurfaceId === s.id)
        .sort((a, b) => a.position - b.position)
        .map((o) => ({ id: o.id, kind: o.kind as "window" | "door", label: o.label, areaFt2: o.grossAreaFt2, count: o.openingCount ?? 1, ...(o.productKey ? { productKey: o.productKey } : {}), ...(o.uFactorIp != null ? { uFactorIP: o.uFactorIp } : {}) })),
    })),
    assemblies: r.assemblies.filter((a) => a.definition && a.key).map((a) => ({ key: a.key!, name: a.name, kind: a.kind as "wall" | "ceiling" | "floor", ...(a.definition as object) }) as AssessmentDoc["assemblies"][number]),
    upgrades: [...r.upgrades].sort((a, b) => a.position - b.position).map((u) => upgradeFromRow(u)),
  };
}

function upgradeFromRow(u: Row<typeof upgrades>): AssessmentUpgrade {
  const p = u.params;
  const base = { id: u.id, costUSD: u.costCents / 100, lifeYears: u.lifeYears, priceBookItemId: u.priceBookItemId, ...(u.pricing ? { pricing: u.pricing } : {}), ...(u.name ? { name: u.name } : {}) };
  switch (u.type) {
    case "dense-pack-walls":
      return { ...base, type: u.type, surfaceIds: (p.surfaceIds as string[] | undefined) ?? "all-walls", ...(p.rPerInchIP ? { rPerInchIP: Number(p.rPerInchIP) } : {}) };
    case "attic-insulation":
      return { ...base, type: u.type, surfaceIds: (p.surfaceIds as string[] | undefined) ?? "all-ceilings", targetRIP: Number(p.targetR) };
    case "air-sealing":
      return { ...base, type: u.type, targetCfm50: Number(p.targetCfm50) };
    case "windows":
      return { ...base, type: u.type, surfaceIds: (p.surfaceIds as string[] | undefined) ?? "all", uFactorIP: Number(p.windowU) };
  }
}

/** An upgrade's own parameters, as stored in `upgrades.params`. */
export function upgradeParams(u: AssessmentUpgrade): Record<string, unknown> {
  switch (u.type) {
    case "dense-pack-walls":
      return { ...(Array.isArray(u.surfaceIds) ? { surfaceIds: u.surfaceIds } : {}), ...(u.rPerInchIP ? { rPerInchIP: u.rPerInchIP } : {}) };
    case "attic-insulation":
      return { ...(Array.isArray(u.surfaceIds) ? { surfaceIds: u.surfaceIds } : {}), targetR: u.targetRIP };
    case "air-sealing":
      return { targetCfm50: u.targetCfm50 };
    case "windows":
      return { ...(Array.isArray(u.surfaceIds) ? { surfaceIds: u.surfaceIds } : {}), windowU: u.uFactorIP };
  }
}
