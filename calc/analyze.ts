// analyzeHouse: the whole house in one call. Every figure comes back with the
// intermediate values and sources a report's "how we calculated this" needs.
import { computeAssembly, memberDepthIn, type AssemblyDef, type AssemblyResult } from "./assemblies";
import { cautionsFor } from "./cautions";
import { resolveClimate } from "./climate/stations";
import { checkWall } from "./crew-check";
import { densePackEstimate, DEFAULT_STOREY_HEIGHT_FT, type DensePackEstimate } from "./dense-pack";
import { CalcInputError } from "./errors";
import { getWindowOrDoor } from "./materials";
import { annualHeating, DEFAULT_GRID_LB_PER_KWH, type AnnualHeating } from "./energy";
import { designHeatLoad, surfaceResult, type DesignLoad, type EnvelopeResult, type SurfaceDef, type SurfaceResult, type UAByComponent } from "./envelope";
import { MEASURE_LIFE_YEARS, savingsToInvestment, simplePayback, upvEscalated } from "./economics";
import { computeInfiltration, type InfiltrationOptions, type InfiltrationResult } from "./infiltration";
import { indoorDewPointF, moistureScreener, type MoistureScreen } from "./moisture";
import type { HouseInput, HouseInputParsed } from "./schema";
import { applyUpgradeWith, SurfaceIndex, type HouseState } from "./upgrades";
import { prepareHouseInput, type Prepared } from "./validate";
import { ventilation62_2 } from "./ventilation";
import { softWarningsParsed } from "./warnings";
import { METHOD_NOTES } from "./method-notes";


type Ctx = { h: HouseInputParsed; hdd65: number; designF: number; inf: InfiltrationOptions; lastInfiltration: InfiltrationResult | null };

function assemblyDef(state: HouseState, key: string, path: string): AssemblyDef {
  const def = state.assemblies.get(key);
  if (!def) throw CalcInputError.at(path, `no assembly "${key}"`);
  return def;
}

/**
 * The envelope of the house as the upgrades change it. The house as found gets full per-surface
 * results; after that an upgrade changes a few surfaces (a new surface object, or an assembly key now
 * meaning another definition), and only those are worked out again, as plain numbers (opaque UA and
 * each opening's UA, the same products as surfaceResult). Totals are summed afresh in surface and
 * opening order, so every figure is bit-for-bit what a whole-house evaluation gives. The last house
 * gets full results again: the house-as-found result of every surface it did not change, a new one
 * for every surface it did.
 */
class Envelope {
  readonly baseline: SurfaceResult[];
  private readonly baseSurfaces: SurfaceDef[];
  private readonly baseDefs: AssemblyDef[];
  /** The current house: surface objects, their assembly definitions and results. */
  private surfaces: SurfaceDef[];
  readonly defs: AssemblyDef[];
  readonly assemblies: AssemblyResult[];
  /** Per surface: 0 wall, 1 ceiling, 2 floor; opaque UA; its openings' UAs at openStart[i]… */
  private kind: Uint8Array;
  private opaque: Float64Array;
  private openStart: Int32Array;
  private openUA: Float64Array;
  private openIsWindow: Uint8Array;

  constructor(state: HouseState) {
    const n = state.surfaces.length;
    this.surfaces = this.baseSurfaces = state.surfaces;
    this.defs = new Array(n);
    this.assemblies = new Array(n);
    this.baseline = new Array(n);
    for (let i = 0; i < n; i++) {
      const s = state.surfaces[i];
      this.resolve(state, i);
      this.baseline[i] = surfaceResult(s, this.assemblies[i], "surfaces", i);
    }
    this.baseDefs = this.defs.slice();
    this.kind = new Uint8Array(n);
    this.opaque = new Float64Array(n);
    this.openStart = new Int32Array(n + 1);
    let m = 0;
    for (let i = 0; i < n; i++) { this.openStart[i] = m; m += this.baseline[i].openings.length; }
    this.openStart[n] = m;
    this.openUA = new Float64Array(m);
    this.openIsWindow = new Uint8Array(m);
    for (let i = 0; i < n; i++) {
      const r = this.baseline[i];
      this.kind[i] = kindCode(r.kind);
      this.opaque[i] = r.opaqueUA;
      for (let j = 0, k = this.openStart[i]; j < r.openings.length; j++, k++) {
        this.openUA[k] = r.openings[j].ua;
        this.openIsWindow[k] = r.openings[j].kind === "window" ? 1 : 0;
      }
    }
  }

  private resolve(state: HouseState, i: number) {
    const def = assemblyDef(state, state.surfaces[i].assemblyKey, "surfaces");
    this.defs[i] = def;
    this.assemblies[i] = computeAssembly(def, "surfaces");
  }

  /** The plain figures of surface i; false when its openings no longer fit its slot. */
  private figures(i: number): boolean {
    const s = this.surfaces[i];
    const a = this.assemblies[i];
    const bf = s.bufferFactor ?? 1;
    const openings = s.openings ?? [];
    const start = this.openStart[i];
    if (openings.length !== this.openStart[i + 1] - start) return false;
    let openingsArea = 0;
    for (let j = 0; j < openings.length; j++) {
      const o = openings[j];
      const area = o.areaFt2 * (o.count ?? 1);
      let u = o.uFactorIP;
      if (u === undefined) {
        const p = o.productKey === undefined ? undefined : getWindowOrDoor(o.productKey);
        if (!p) return surfaceResult(s, a, "surfaces", i) === null; // throws the error naming the opening
        u = p.uFactorIP;
      }
      this.openUA[start + j] = u * area * bf;
      this.openIsWindow[start + j] = o.kind === "window" ? 1 : 0;
      openingsArea += area;
    }
    this.kind[i] = kindCode(s.kind);
    this.opaque[i] = a.uFactorIP * (s.grossAreaFt2 - openingsArea) * bf;
    return true;
  }

  /** Bring the figures up to `next`, the state an upgrade left from `prev` (the current one). */
  update(prev: HouseState, next: HouseState) {
    const n = next.surfaces.length;
    // Keys that now mean another definition. A key new to this house cannot be on an unchanged
    // surface (that surface's key resolved in the house before), so only redefined keys count.
    let keys: Set<string> | null = null;
    let removed = false;
    if (next.assemblies !== prev.assemblies) {
      const changed = new Set<string>();
      next.assemblies.forEach((d, k) => { const was = prev.assemblies.get(k); if (was !== undefined && was !== d) changed.add(k); });
      if (changed.size > 0) keys = changed;
      prev.assemblies.forEach((_, k) => { if (!next.assemblies.has(k)) removed = true; });
    }
    if (next.surfaces === this.surfaces && keys === null && !removed) return;
    const old = this.surfaces;
    this.surfaces = next.surfaces;
    if (n !== old.length || removed) return this.restart(next);
    for (let i = 0; i < n; i++) {
      const s = next.surfaces[i];
      if (s === old[i] && (keys === null || !keys.has(s.assemblyKey))) continue;
      this.resolve(next, i);
      if (!this.figures(i)) return this.restart(next);
    }
  }

  /** Not a change an upgrade makes (surfaces or openings added or removed): every surface again. */
  private restart(state: HouseState) {
    const n = state.surfaces.length;
    this.defs.length = this.assemblies.length = n;
    this.kind = new Uint8Array(n);
    this.opaque = new Float64Array(n);
    this.openStart = new Int32Array(n + 1);
    let m = 0;
    for (let i = 0; i < n; i++) { this.openStart[i] = m; m += state.surfaces[i].openings?.length ?? 0; }
    this.openStart[n] = m;
    this.openUA = new Float64Array(m);
    this.openIsWindow = new Uint8Array(m);
    for (let i = 0; i < n; i++) { this.resolve(state, i); this.figures(i); }
  }

  /** UA by component, summed as sumByComponent sums the per-surface results. */
  totals(): { ua: UAByComponent; totalUA: number } {
    let walls = 0, ceilings = 0, floors = 0, windows = 0, doors = 0;
    const { kind, opaque, openUA, openIsWindow } = this;
    for (let i = 0; i < kind.length; i++) {
      const k = kind[i];
      if (k === 0) walls += opaque[i]; else if (k === 1) ceilings += opaque[i]; else floors += opaque[i];
    }
    for (let k = 0; k < openUA.length; k++) if (openIsWindow[k] === 1) windows += openUA[k]; else doors += openUA[k];
    const ua = { walls, ceilings, floors, windows, doors };
    return { ua, totalUA: walls + ceilings + floors + windows + doors };
  }

  /** Full results of the current house (those of the house as found where a surface is unchanged). */
  results(): SurfaceResult[] {
    const n = this.surfaces.length;
    const out: SurfaceResult[] = new Array(n);
    const same = n === this.baseSurfaces.length;
    for (let i = 0; i < n; i++) {
      out[i] = same && this.surfaces[i] === this.baseSurfaces[i] && this.defs[i] === this.baseDefs[i]
        ? this.baseline[i]
        : surfaceResult(this.surfaces[i], this.assemblies[i], "surfaces", i);
    }
    return out;
  }
}

const kindCode = (kind: string) => (kind === "wall" ? 0 : kind === "ceiling" ? 1 : 2);

function evaluation<E extends { ua: UAByComponent; totalUA: number }>(ctx: Ctx, cfm50: number, envelope: E) {
  const l = loadsAndEnergy(ctx, cfm50, envelope);
  return { cfm50, envelope, infiltration: l.infiltration, designLoad: l.designLoad, energy: l.energy };
}

function loadsAndEnergy(ctx: Ctx, cfm50: number, envelope: { ua: UAByComponent; totalUA: number }) {
  const { h } = ctx;
  // the same leakage gives the same infiltration figures: computed once per distinct CFM50 in a row
  const infiltration = ctx.lastInfiltration !== null && ctx.lastInfiltration.cfm50 === cfm50 ? ctx.lastInfiltration : (ctx.lastInfiltration = computeInfiltration(cfm50, ctx.inf));
  const designLoad = designHeatLoad(envelope, infiltration.design.cfm, h.indoorTempF, ctx.designF);
  const energy = annualHeating({
    envelopeUA: envelope.totalUA, infiltrationCfm: infiltration.seasonal.cfm, hdd65: ctx.hdd65, correctionFactor: h.correctionFactor,
    fuel: h.heating.fuel, efficiency: h.heating.efficiency, pricePerUnitUSD: h.heating.pricePerUnitUSD, gridLbPerKWh: h.gridLbPerKWh ?? DEFAULT_GRID_LB_PER_KWH,
  });
  return { infiltration, designLoad, energy };
}
export type HouseEvaluation = { cfm50: number; envelope: EnvelopeResult; infiltration: InfiltrationResult; designLoad: DesignLoad; energy: AnnualHeating };

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
  const inf = h.infiltration;
  const ctx: Ctx = {
    h, hdd65: climate.hdd65, designF: climate.heatingDesignTempF, lastInfiltration: null,
    inf: {
      method: inf.method, nFactorZone: inf.nFactorZone, shielding: inf.shielding, nFactorOverride: inf.nFactorOverride,
      shelterClass: inf.shelterClass, flowExponent: inf.flowExponent, seasonalDeltaTF: inf.seasonalDeltaTF,
      seasonalWindMph: inf.seasonalWindMph, designWindMph: inf.designWindMph,
      volumeFt3: h.volumeFt3, stories: h.stories, designDeltaTF: h.indoorTempF - climate.heatingDesignTempF,
    },
  };
  const base: HouseState = { assemblies, surfaces: h.surfaces, cfm50: h.blowerDoor.cfm50TestIn };
  const env = new Envelope(base);
  const baseAssemblies = env.assemblies.slice();
  const baseline: HouseEvaluation = evaluation(ctx, base.cfm50, { surfaces: env.baseline, ...env.totals() });
  const { discountRate: d, fuelEscalationRate: e } = h.economics;
  let state = base;
  let prev: { cfm50: number; envelope: { ua: UAByComponent; totalUA: number }; designLoad: DesignLoad; energy: AnnualHeating } = baseline;
  let final = baseline;
  const n = h.upgrades.length;
  const ids = new SurfaceIndex(h.surfaces);
  const upgrades = h.upgrades.map((u, i) => {
    const applied = applyUpgradeWith(state, u, `upgrades.${i}`, u.type === "air-sealing" ? h.blowerDoor.cfm50TestOut : undefined, ids);
    env.update(state, applied.state);
    const totals = env.totals();
    const after = i === n - 1 ? (final = evaluation(ctx, applied.state.cfm50, { surfaces: env.results(), ua: totals.ua, totalUA: totals.totalUA })) : evaluation(ctx, applied.state.cfm50, totals);
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
  for (const u of upgrades) if (u.type === "dense-pack-walls") for (const id of (u.details.surfaceIds as string[])) dpIds.add(id);
  const storeyH = h.storeyHeightFt ?? DEFAULT_STOREY_HEIGHT_FT;
  const densePack: DensePackEstimate[] = [];
  if (dpIds.size > 0) {
    const framedDepth = new Map<AssemblyDef, { framed: boolean; depthIn: number | undefined }>();
    for (let i = 0; i < h.surfaces.length; i++) {
      const s = h.surfaces[i];
      if (!dpIds.has(s.id)) continue;
      const a = baseAssemblies[i];
      const def = base.assemblies.get(s.assemblyKey)!;
      let fd = framedDepth.get(def);
      if (!fd) {
        const framedSpec = def.layers.find((l) => "framed" in l);
        fd = framedSpec && "framed" in framedSpec ? { framed: true, depthIn: memberDepthIn(framedSpec.framed)! } : { framed: false, depthIn: undefined };
        framedDepth.set(def, fd);
      }
      const sr = baseline.envelope.surfaces[i];
      densePack.push(densePackEstimate({
        surfaceId: s.id, surfaceName: s.name, grossAreaFt2: s.grossAreaFt2, netAreaFt2: sr.netAreaFt2,
        heightFt: s.heightFt ?? storeyH * h.stories, framingFraction: a.framing!.framingFraction,
        cavityDepthIn: fd.framed ? fd.depthIn! : a.framing!.depthIn,
        spacingIn: a.framing!.spacingIn, densityLbFt3: h.densePack.densityLbFt3, bagWeightLb: h.densePack.bagWeightLb,
        storeyHeightFt: storeyH, blockedBayFraction: s.blockedBayFraction ?? 0,
      }));
    }
  }
  const crewCheck = h.crewLog.map((c, i) => {
    const est = densePack.find((x) => x.surfaceId === c.surfaceId);
    if (!est) throw CalcInputError.at(`crewLog.${i}.surfaceId`, `surface "${c.surfaceId}" is not in a dense-pack upgrade`);
    return checkWall(est.surfaceId, est.surfaceName, est.bags, c.bagsActual, h.densePack.highRatio, h.densePack.lowRatio);
  });

  const dew = indoorDewPointF(h.indoorTempF, h.indoorRH);
  // one screen per assembly result, shared by the before and after lists when an assembly is in both
  const screens = new Map<AssemblyResult, MoistureScreen>();
  const screenOf = moistureScreener(h.indoorTempF, climate.heatingDesignTempF, h.indoorRH, dew);
  const screen = (st: HouseState, results: AssemblyResult[]) => {
    const seen = new Set<string>();
    const out: MoistureScreen[] = [];
    for (let i = 0; i < st.surfaces.length; i++) {
      const s = st.surfaces[i];
      if (s.kind === "floor" || seen.has(s.assemblyKey)) continue;
      seen.add(s.assemblyKey);
      const a = results[i];
      let m = screens.get(a);
      if (!m) { m = screenOf(a); screens.set(a, m); }
      out.push(m);
    }
    return out;
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
    moisture: { before: screen(base, baseAssemblies), after: screen(state, env.assemblies) },
    ventilation: { before: vent(baseline.cfm50), after: vent(final.cfm50) },
    cautions, warnings: softWarningsParsed(h), methods: METHOD_NOTES,
  };
}
export type HouseAnalysis = ReturnType<typeof analyzePrepared>;
