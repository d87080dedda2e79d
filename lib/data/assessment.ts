import "server-only";
import { and, asc, eq, isNull, notInArray } from "drizzle-orm";
import { analyzeHouse, CalcInputError, MEASURE_LIFE_YEARS, validateHouseInput } from "@/calc";
import { getDb } from "@/db";
import { assemblies, companies, heatingSystems, houses, jobs, leakageTests, priceBookItems, surfaces, upgrades } from "@/db/schema";
import { ApiError, notFound } from "@/lib/api/errors";
import type { AuthUser } from "@/lib/authz/guard";
import { docFromRows, fuelToDb, upgradeParams } from "@/lib/assessment/from-rows";
import type { AssessmentDoc } from "@/lib/assessment/doc";
import { twoPass } from "@/lib/assessment/pricing";
import { docPath, toHouseInput } from "@/lib/assessment/to-house-input";
import type { PriceItem } from "@/lib/documents/proposal-lines";
import { logActivity } from "./activity";
import { jobScope } from "./scope";

async function scopedJob(user: AuthUser, jobId: string) {
  const db = getDb();
  const [job] = await db.select().from(jobs).where(and(eq(jobs.id, jobId), jobScope(db, user)));
  if (!job) throw notFound("Job");
  return job;
}

/** The company's active price book items, as the pricing function takes them. */
export async function activePriceItems(user: AuthUser): Promise<PriceItem[]> {
  return getDb()
    .select({ id: priceBookItems.id, code: priceBookItems.code, name: priceBookItems.name, unit: priceBookItems.unit, unitPriceCents: priceBookItems.unitPriceCents, taxable: priceBookItems.taxable })
    .from(priceBookItems)
    .where(and(eq(priceBookItems.companyId, user.companyId), eq(priceBookItems.active, true)));
}

/**
 * The job's assessment. Upgrade costs are priced from the company's price book as it is now,
 * with the job's overrides (lib/assessment/pricing.ts), so a changed price shows on the next load.
 */
export async function loadAssessment(user: AuthUser, jobId: string) {
  const db = getDb();
  const job = await scopedJob(user, jobId);
  const [[house], heating, tests, surfaceRows, jobAssemblies, upgradeRows, [company], library, items] = await Promise.all([
    db.select().from(houses).where(eq(houses.id, job.houseId)),
    db.select().from(heatingSystems).where(eq(heatingSystems.jobId, jobId)).orderBy(asc(heatingSystems.createdAt)),
    db.select().from(leakageTests).where(eq(leakageTests.jobId, jobId)).orderBy(asc(leakageTests.testedAt)),
    db.select().from(surfaces).where(eq(surfaces.jobId, jobId)),
    db.select().from(assemblies).where(eq(assemblies.jobId, jobId)),
    db.select().from(upgrades).where(eq(upgrades.jobId, jobId)),
    db.select({ fuelPrices: companies.fuelPricesCentsPerUnit }).from(companies).where(eq(companies.id, user.companyId)),
    db.select().from(assemblies).where(and(eq(assemblies.companyId, user.companyId), isNull(assemblies.jobId))),
    activePriceItems(user),
  ]);
  const primary = heating.find((h) => h.isPrimary) ?? heating[0];
  const stored = docFromRows({
    house: house!, targetCfm50: job.targetCfm50, heating: primary, defaultFuelPriceCents: company?.fuelPrices?.gas ?? 150,
    tests, surfaces: surfaceRows, assemblies: jobAssemblies, upgrades: upgradeRows,
  });
  const { doc } = twoPass(stored, items, analyzeDoc);
  const companyLibrary = docFromRows({ house: house!, targetCfm50: null, heating: undefined, defaultFuelPriceCents: 0, tests: [], surfaces: [], assemblies: library, upgrades: [] }).assemblies;
  return { jobId, version: job.version, doc, companyLibrary };
}
export type LoadedAssessment = Awaited<ReturnType<typeof loadAssessment>>;

/** Whole-house check and results on the server, with calc's field paths turned into the document's. */
export function analyzeDoc(doc: AssessmentDoc) {
  const input = toHouseInput(doc);
  const checked = validateHouseInput(input);
  if (!checked.ok) return { analysis: null, issues: checked.issues.map((i) => ({ path: docPath(i.path, doc), message: i.message })) };
  try {
    return { analysis: analyzeHouse(input), issues: [] };
  } catch (err) {
    if (err instanceof CalcInputError) return { analysis: null, issues: err.issues.map((i) => ({ path: docPath(i.path, doc), message: i.message })) };
    throw err;
  }
}

/** Saves the whole assessment if `version` is still the job's; a stale one gets 409 with the current document. */
export async function saveAssessment(user: AuthUser, jobId: string, version: number, sent: AssessmentDoc) {
  let doc = sent;
  const db = getDb();
  const job = await scopedJob(user, jobId);
  const stale = () => new ApiError(409, "Someone else saved this assessment since you loaded it. Your edits are kept on this device; reload to see theirs, then apply yours again.");
  if (job.version !== version) throw stale();
  // The costs the browser sent are not trusted: they are priced again here, from the same lines.
  const priced = twoPass(doc, await activePriceItems(user), analyzeDoc);
  doc = priced.doc;
  const h = doc.house;
  const ok = await db.transaction(async (tx) => {
    const bumped = await tx.update(jobs).set({ version: version + 1, updatedAt: new Date(), targetCfm50: doc.leakage.targetCfm50 ?? null }).where(and(eq(jobs.id, jobId), eq(jobs.version, version))).returning({ id: jobs.id });
    if (!bumped.length) return false;
    const [current] = await tx.select({ hazards: houses.hazards }).from(houses).where(eq(houses.id, job.houseId));
    await tx.update(houses).set({
      yearBuilt: h.yearBuilt, stories: h.stories, conditionedAreaFt2: h.floorAreaFt2, volumeFt3: h.volumeFt3, ceilingHeightFt: h.ceilingHeightFt ?? null,
      bedrooms: h.bedrooms, foundation: h.foundation, shielding: h.shielding, indoorDesignTempF: h.indoorTempF, indoorRhPct: h.indoorRH * 100,
      climateStationWmo: h.climate?.source === "station" ? h.climate.wmo : null,
      customClimate: h.climate?.source === "manual" ? { hdd65: h.climate.hdd65, designTempF: h.climate.heatingDesignTempF, source: h.climate.sourceText } : null,
      epwClimate: h.climate?.source === "epw" ? { source: h.climate.sourceText, stationName: h.climate.name, hdd65: h.climate.hdd65, cdd65: h.climate.cdd65, designTempF: h.climate.heatingDesign99F, heatingDesign996F: h.climate.heatingDesign996F, heatingDesign99F: h.climate.heatingDesign99F } : null,
      hazards: { ...current?.hazards, knobAndTube: h.hazards.knobAndTube, vermiculite: h.hazards.vermiculite, leadPaint: h.hazards.leadPaint, combustionAppliances: h.hazards.combustionAppliances },
    }).where(eq(houses.id, job.houseId));

    const heat = doc.heating;
    const heatValues = {
      fuel: fuelToDb[heat.fuel], efficiency: heat.efficiency.kind === "hspf" ? heat.efficiency.value / 3.412 : heat.efficiency.value,
      hspf: heat.efficiency.kind === "hspf" ? heat.efficiency.value : null, fuelPriceCentsPerUnit: Math.round(heat.pricePerUnitUSD * 100),
      label: `${heat.fuel} (${heat.efficiency.kind} ${heat.efficiency.value})`,
    };
    const [primary] = await tx.select({ id: heatingSystems.id }).from(heatingSystems).where(and(eq(heatingSystems.jobId, jobId), eq(heatingSystems.isPrimary, true)));
    if (primary) await tx.update(heatingSystems).set(heatValues).where(eq(heatingSystems.id, primary.id));
    else await tx.insert(heatingSystems).values({ ...heatValues, jobId, isPrimary: true });

    // Leakage tests, surfaces and upgrades keep their ids, so photos and crew-log entries stay linked.
    const testIds = doc.leakage.tests.map((t) => t.id);
    await tx.delete(leakageTests).where(and(eq(leakageTests.jobId, jobId), testIds.length ? notInArray(leakageTests.id, testIds) : undefined));
    for (const t of doc.leakage.tests) {
      const values = { phase: t.phase, cfm50: t.cfm50, testedAt: new Date(t.testedAt), outdoorTempF: t.outdoorTempF ?? null, windMph: t.windMph ?? null, notes: t.notes ?? null };
      await tx.insert(leakageTests).values({ ...values, id: t.id, jobId, recordedById: user.id }).onConflictDoUpdate({ target: leakageTests.id, set: values, setWhere: eq(leakageTests.jobId, jobId) });
    }

    const rows = doc.surfaces.flatMap((s, i) => [
      { id: s.id, parentSurfaceId: null, position: i, label: s.name, kind: s.kind, orientation: s.orientation, grossAreaFt2: s.grossAreaFt2, assemblyKey: s.assemblyKey, heightFt: s.heightFt ?? null, bufferFactor: s.bufferFactor ?? null, blockedBayFraction: s.blockedBayFraction ?? null, openingCount: null, productKey: null, uFactorIp: null },
      ...s.openings.map((o, j) => ({
        id: o.id ?? crypto.randomUUID(), parentSurfaceId: s.id, position: j, label: o.label ?? (o.kind === "window" ? "Window" : "Door"), kind: o.kind, orientation: s.orientation,
        grossAreaFt2: o.areaFt2, assemblyKey: null, heightFt: null, bufferFactor: null, blockedBayFraction: null, openingCount: o.count ?? 1, productKey: o.productKey ?? null, uFactorIp: o.uFactorIP ?? null,
      })),
    ]);
    const ids = rows.map((r) => r.id);
    await tx.delete(surfaces).where(and(eq(surfaces.jobId, jobId), ids.length ? notInArray(surfaces.id, ids) : undefined));
    for (const r of rows) {
      const { id, ...values } = r;
      await tx.insert(surfaces).values({ ...r, jobId }).onConflictDoUpdate({ target: surfaces.id, set: values, setWhere: eq(surfaces.jobId, jobId) });
      void id;
    }

    await tx.delete(assemblies).where(eq(assemblies.jobId, jobId));
    if (doc.assemblies.length) {
      await tx.insert(assemblies).values(doc.assemblies.map((a) => ({
        companyId: user.companyId, jobId, key: a.key, name: a.name, kind: a.kind,
        framingMaterial: a.construction === "masonry" ? ("masonry" as const) : a.construction === "steel-frame" ? ("steel" as const) : ("wood" as const),
        method: a.method ?? null, definition: { construction: a.construction, method: a.method, layers: a.layers as Record<string, unknown>[] },
      })));
    }

    const upIds = doc.upgrades.map((u) => u.id);
    await tx.delete(upgrades).where(and(eq(upgrades.jobId, jobId), upIds.length ? notInArray(upgrades.id, upIds) : undefined));
    for (const [i, u] of doc.upgrades.entries()) {
      const values = { type: u.type, name: u.name ?? null, position: i, params: upgradeParams(u), costCents: Math.round(u.costUSD * 100), lifeYears: u.lifeYears ?? MEASURE_LIFE_YEARS[u.type], priceBookItemId: u.priceBookItemId ?? null, pricing: u.pricing ?? null };
      await tx.insert(upgrades).values({ ...values, id: u.id, jobId }).onConflictDoUpdate({ target: upgrades.id, set: values, setWhere: eq(upgrades.jobId, jobId) });
    }
    return true;
  });
  if (!ok) throw stale();
  await logActivity(db, { companyId: user.companyId, userId: user.id, action: "assessment.save", entityType: "job", entityId: jobId });
  return { version: version + 1, ...priced.result };
}
