// Reference copy (test-only) of calc/analyze.ts as it was before the speed work of issue 3:
// the straightforward computation the optimised calc must match exactly (tests/calc/reference.test.ts).
// analyzeHouse: the whole house in one call. Every figure comes back with the
// intermediate values and sources a report's "how we calculated this" needs.
import { computeAssembly, memberDepthIn, type AssemblyDef, type AssemblyResult } from "@/calc/assemblies";
import { cautionsFor } from "@/calc/cautions";
import { resolveClimate } from "@/calc/climate/stations";
import { checkWall } from "@/calc/crew-check";
import { densePackEstimate, DEFAULT_STOREY_HEIGHT_FT, type DensePackEstimate } from "@/calc/dense-pack";
import { CalcInputError } from "@/calc/errors";
import { annualHeating, DEFAULT_GRID_LB_PER_KWH, type AnnualHeating } from "@/calc/energy";
import { computeEnvelope, designHeatLoad, envelopeTotals, type UAByComponent } from "./envelope";
import { MEASURE_LIFE_YEARS, savingsToInvestment, simplePayback, upvEscalated } from "@/calc/economics";
import { computeInfiltration } from "@/calc/infiltration";
import { indoorDewPointF, moistureScreen } from "./moisture";
import type { HouseInput, HouseInputParsed } from "@/calc/schema";
import { applyUpgrade, type HouseState } from "./upgrades";
import { prepareHouseInput, type Prepared } from "./validate";
import { ventilation62_2 } from "@/calc/ventilation";
import { softWarningsParsed } from "@/calc/warnings";
import { METHOD_NOTES } from "@/calc/method-notes";

type Ctx = { h: HouseInputParsed; hdd65: number; designF: number; cache: WeakMap<AssemblyDef, AssemblyResult> };

function assemblyOf(ctx: Ctx, state: HouseState) {
  return (key: string, path: string) => {
    const def = state.assemblies.get(key);
    if (!def) throw CalcInputError.at(path, `no assembly "${key}"`);
    let r = ctx.cache.get(def);
    if (!r) { r = computeAssembly(def, path); ctx.cache.set(def, r); }
    return r;
  };
}

function evaluate(ctx: Ctx, state: HouseState) {
  const envelope = computeEnvelope(state.surfaces, assemblyOf(ctx, state));
  const l = loadsAndEnergy(ctx, state.cfm50, envelope);
  return { cfm50: state.cfm50, envelope, infiltration: l.infiltration, designLoad: l.designLoad, energy: l.energy };
}

/** Totals only: for the houses between upgrades, whose per-surface figures no report shows. */
function evaluateTotals(ctx: Ctx, state: HouseState) {
  const envelope = envelopeTotals(state.surfaces, assemblyOf(ctx, state));
  const l = loadsAndEnergy(ctx, state.cfm50, envelope);
  return { cfm50: state.cfm50, envelope, infiltration: l.infiltration, designLoad: l.designLoad, energy: l.energy };
}

function loadsAndEnergy(ctx: Ctx, cfm50: number, envelope: { ua: UAByComponent; totalUA: number }) {
  const { h } = ctx;
  const inf = h.infiltration;
  const infiltration = computeInfiltration(cfm50, {
    method: inf.method, nFactorZone: inf.nFactorZone, shielding: inf.shielding, nFactorOverride: inf.nFactorOverride,
    shelterClass: inf.shelterClass, flowExponent: inf.flowExponent, seasonalDeltaTF: inf.seasonalDeltaTF,
    seasonalWindMph: inf.seasonalWindMph, designWindMph: inf.designWindMph,
    volumeFt3: h.volumeFt3, stories: h.stories, designDeltaTF: h.indoorTempF - ctx.designF,
  });
  const designLoad = designHeatLoad(envelope, infiltration.design.cfm, h.indoorTempF, ctx.designF);
  const energy = annualHeating({
    envelopeUA: envelope.totalUA, infiltrationCfm: infiltration.seasonal.cfm, hdd65: ctx.hdd65, correctionFactor: h.correctionFactor,
    fuel: h.heating.fuel, efficiency: h.heating.efficiency, pricePerUnitUSD: h.heating.pricePerUnitUSD, gridLbPerKWh: h.gridLbPerKWh ?? DEFAULT_GRID_LB_PER_KWH,
  });
  return { infiltration, designLoad, energy };
}
export type HouseEvaluation = ReturnType<typeof evaluate>;

function savings(before: AnnualHeating, after: AnnualHeating) {
  return { fuelUnits: before.fuelUnits - after.fuelUnits, fuelUnit: before.fuelUnit, usd: before.costUSD - after.costUSD, co2Lb: before.co2Lb - after.co2Lb, mmbtu: before.mmbtu - after.mmbtu };
}

/** Validate (zod + cross-field checks) and analyze; throws CalcInputError naming the fields. */
export function analyzeHouse(input: HouseInput | unknown) {
  return analyzePrepared(prepareHouseInput(input));
}

/** Analyze an input already checked by prepareHouseInput (skips a second validation). */
export function analyzePrepared(prepared: Prepared) {
  const { input: h, assemblies } = prepared;
  const climate = resolveClimate(h.climate, h.designPercentile);
  const ctx: Ctx = { h, hdd65: climate.hdd65, designF: climate.heatingDesignTempF, cache: new WeakMap() };
  const base: HouseState = { assemblies, surfaces: h.surfaces, cfm50: h.blowerDoor.cfm50TestIn };
  const baseline = evaluate(ctx, base);
  const { discountRate: d, fuelEscalationRate: e } = h.economics;
  let state = base;
  let prev: ReturnType<typeof evaluateTotals> = baseline;
  let final = baseline;
  const upgrades = h.upgrades.map((u, i) => {
    const applied = applyUpgrade(state, u, `upgrades.${i}`, u.type === "air-sealing" ? h.blowerDoor.cfm50TestOut : undefined);
    const last = i === h.upgrades.length - 1;
    const after = last ? (final = evaluate(ctx, applied.state)) : evaluateTotals(ctx, applied.state);
    const s = savings(prev.energy, after.energy);
    const lifeYears = u.lifeYears ?? MEASURE_LIFE_YEARS[u.type];
    const result = {
      index: i, type: u.type, name: u.name ?? applied.description, description: applied.description, details: applied.details,
      costUSD: u.costUSD, lifeYears, savings: s,
      simplePaybackYears: simplePayback(u.costUSD, s.usd),
      upvFactor: upvEscalated(d, e, lifeYears), sir: savingsToInvestment(s.usd, u.costUSD, d, e, lifeYears),
      before: { totalUA: prev.envelope.totalUA, cfm50: prev.cfm50, annualCostUSD: prev.energy.costUSD, fuelUnits: prev.energy.fuelUnits, designLoadBtuh: prev.designLoad.totalBtuh },
      after: { totalUA: after.envelope.totalUA, cfm50: after.cfm50, annualCostUSD: after.energy.costUSD, fuelUnits: after.energy.fuelUnits, designLoadBtuh: after.designLoad.totalBtuh },
    };
    state = applied.state;
    prev = after;
    return result;
  });
  const totalCost = upgrades.reduce((a, u) => a + u.costUSD, 0);
  const pvSavings = upgrades.reduce((a, u) => a + u.savings.usd * u.upvFactor, 0);
  const pkg = savings(baseline.energy, final.energy);
  const packageResult = { costUSD: totalCost, savings: pkg, simplePaybackYears: simplePayback(totalCost, pkg.usd), sir: totalCost > 0 ? pvSavings / totalCost : null, presentValueSavingsUSD: pvSavings };

  // Dense-pack quantities for every wall a dense-pack upgrade fills (on the house as it was found).
  const dpIds = new Set<string>();
  upgrades.forEach((u) => { if (u.type === "dense-pack-walls") for (const id of (u.details.surfaceIds as string[])) dpIds.add(id); });
  const storeyH = h.storeyHeightFt ?? DEFAULT_STOREY_HEIGHT_FT;
  const densePack: DensePackEstimate[] = [];
  h.surfaces.forEach((s, i) => {
    if (!dpIds.has(s.id)) return;
    const a = assemblyOf(ctx, base)(s.assemblyKey, `surfaces.${i}.assemblyKey`);
    const framedSpec = base.assemblies.get(s.assemblyKey)!.layers.find((l) => "framed" in l);
    const sr = baseline.envelope.surfaces[i];
    densePack.push(densePackEstimate({
      surfaceId: s.id, surfaceName: s.name, grossAreaFt2: s.grossAreaFt2, netAreaFt2: sr.netAreaFt2,
      heightFt: s.heightFt ?? storeyH * h.stories, framingFraction: a.framing!.framingFraction,
      cavityDepthIn: framedSpec && "framed" in framedSpec ? memberDepthIn(framedSpec.framed)! : a.framing!.depthIn,
      spacingIn: a.framing!.spacingIn, densityLbFt3: h.densePack.densityLbFt3, bagWeightLb: h.densePack.bagWeightLb,
      storeyHeightFt: storeyH, blockedBayFraction: s.blockedBayFraction ?? 0,
    }));
  });
  const crewCheck = h.crewLog.map((c, i) => {
    const est = densePack.find((x) => x.surfaceId === c.surfaceId);
    if (!est) throw CalcInputError.at(`crewLog.${i}.surfaceId`, `surface "${c.surfaceId}" is not in a dense-pack upgrade`);
    return checkWall(est.surfaceId, est.surfaceName, est.bags, c.bagsActual, h.densePack.highRatio, h.densePack.lowRatio);
  });

  const dew = indoorDewPointF(h.indoorTempF, h.indoorRH);
  const screen = (st: HouseState) => {
    const seen = new Set<string>();
    return st.surfaces.filter((s) => s.kind !== "floor" && !seen.has(s.assemblyKey) && seen.add(s.assemblyKey))
      .map((s) => moistureScreen(assemblyOf(ctx, st)(s.assemblyKey, "surfaces"), h.indoorTempF, climate.heatingDesignTempF, h.indoorRH, dew));
  };
  const ventHeight = h.ventilationHeightFt ?? storeyH * h.stories;
  const vent = (cfm50: number) => ventilation62_2({ floorAreaFt2: h.floorAreaFt2, bedrooms: h.bedrooms, cfm50, wsf: h.ventilation.wsf, heightFt: ventHeight, balanced: h.ventilation.balanced });
  const combustion = h.facts.combustionAppliances ?? ["natural-gas", "oil", "propane"].includes(h.heating.fuel);
  const cautions = cautionsFor({
    yearBuilt: h.yearBuilt, knobAndTube: h.facts.knobAndTube, vermiculite: h.facts.vermiculite, combustionAppliances: combustion,
    plannedAirSealing: h.upgrades.some((u) => u.type === "air-sealing"), plannedDensePack: h.upgrades.some((u) => u.type === "dense-pack-walls"),
  });
  return {
    input: h, climate, baseline, upgrades, package: packageResult, final, densePack, crewCheck,
    moisture: { before: screen(base), after: screen(state) },
    ventilation: { before: vent(baseline.cfm50), after: vent(final.cfm50) },
    cautions, warnings: softWarningsParsed(h), methods: METHOD_NOTES,
  };
}
export type HouseAnalysis = ReturnType<typeof analyzePrepared>;
