import "server-only";
import { and, asc, desc, eq, inArray, sql } from "drizzle-orm";
import { cautionsFor, checkWall, DEFAULT_HIGH_RATIO, DEFAULT_LOW_RATIO, type Caution, type CrewStatus, type HouseAnalysis } from "@/calc";
import { getDb } from "@/db";
import { crewLogEntries, houses, jobs, jobStageEvents, leakageTests, safetyAcknowledgements, users, type JobStage } from "@/db/schema";
import { ApiError, notFound } from "@/lib/api/errors";
import type { AuthUser } from "@/lib/authz/guard";
import { can } from "@/lib/authz/permissions";
import { latestTest, type AssessmentDoc } from "@/lib/assessment/doc";
import type { CrewLogEntryInput, SafetyAckInput, TestOutInput } from "@/lib/validation/crew-log";
import { logActivity } from "./activity";
import { analyzeDoc, loadAssessment } from "./assessment";
import { jobScope } from "./scope";

// The crew's words for the two checks (PRODUCT.md, issue 6); calc's own message follows with the figures.
export const OVERFILL_WARNING = "Material may be escaping into an attic, chase, soffit or basement — stop and look.";
export const UNDERFILL_WARNING = "Possible voids or low density — probe or re-blow.";

export type WarningKind = "overfill" | "underfill";

export type CrewEntryView = {
  id: string; surfaceId: string | null; clientRequestId: string;
  holesDrilled: number; bagsBlown: number; blockedBays: number; prefilledBays: number;
  note: string | null; resolution: string | null; finished: boolean;
  loggedAt: number; createdAt: number; user: { id: string; name: string };
};

export type WallWarningView = {
  kind: WarningKind; message: string; raisedAt: number; raisedByEntryId: string; bagsAtRaise: number;
  /** resolved: an entry carried a resolution note; cleared: the condition no longer holds; open: neither. */
  state: "open" | "resolved" | "cleared";
  resolution: { note: string; by: string; at: number; entryId: string } | null;
};

export type WallView = {
  surfaceId: string; name: string;
  expected: { bags: number; bagsRoundedUp: number; holes: number; bays: number; blockedBays: number; pounds: number; cavityVolumeFt3: number };
  logged: { bags: number; holes: number; blockedBays: number; prefilledBays: number; entries: number };
  finished: boolean;
  check: { status: CrewStatus; ratio: number | null; message: string };
  /** The warning standing now, if any: overfill as soon as the wall runs over, underfill once finished under. */
  warning: { kind: WarningKind; title: string; message: string } | null;
  warnings: WallWarningView[];
  entries: CrewEntryView[];
};

export type CautionView = Pick<Caution, "id" | "hazard" | "because" | "document" | "message">;

type EntryRow = CrewEntryView;

async function scopedJob(user: AuthUser, jobId: string) {
  const db = getDb();
  const [job] = await db.select().from(jobs).where(and(eq(jobs.id, jobId), jobScope(db, user)));
  if (!job) throw notFound("Job");
  return job;
}

/** The job's cautions, from calc's analysis; from calc's cautionsFor on the house facts when the assessment is incomplete. */
function cautionsOf(doc: AssessmentDoc, analysis: HouseAnalysis | null): CautionView[] {
  const list = analysis?.cautions ?? cautionsFor({
    yearBuilt: doc.house.yearBuilt, knobAndTube: doc.house.hazards.knobAndTube, vermiculite: doc.house.hazards.vermiculite,
    combustionAppliances: doc.house.hazards.combustionAppliances.length > 0,
    plannedAirSealing: doc.upgrades.some((u) => u.type === "air-sealing"), plannedDensePack: doc.upgrades.some((u) => u.type === "dense-pack-walls"),
  });
  return list.map(({ id, hazard, because, document, message }) => ({ id, hazard, because, document, message }));
}

async function entryRows(jobId: string): Promise<EntryRow[]> {
  const rows = await getDb()
    .select({ e: crewLogEntries, userName: users.name })
    .from(crewLogEntries)
    .innerJoin(users, eq(users.id, crewLogEntries.userId))
    .where(eq(crewLogEntries.jobId, jobId))
    .orderBy(asc(crewLogEntries.loggedAt), asc(crewLogEntries.createdAt));
  return rows.map(({ e, userName }) => toEntryView(e, userName));
}

function toEntryView(e: typeof crewLogEntries.$inferSelect, userName: string): CrewEntryView {
  return {
    id: e.id, surfaceId: e.surfaceId, clientRequestId: e.clientRequestId, holesDrilled: e.holesDrilled, bagsBlown: e.bagsBlown,
    blockedBays: e.blockedBays, prefilledBays: e.prefilledBays, note: e.note, resolution: e.resolution, finished: e.finished,
    loggedAt: e.loggedAt.getTime(), createdAt: e.createdAt.getTime(), user: { id: e.userId, name: userName },
  };
}

const round2 = (x: number) => Math.round(x * 100) / 100;

/** One wall: totals, calc's check at the job's thresholds, and the warnings raised along the way. */
function wallView(est: HouseAnalysis["densePack"][number], entries: EntryRow[], high: number, low: number): WallView {
  let bags = 0;
  let finished = false;
  const warnings: WallWarningView[] = [];
  const holds = { overfill: false, underfill: false };
  for (const e of entries) {
    bags = round2(bags + e.bagsBlown);
    finished = e.finished;
    const c = checkWall(est.surfaceId, est.surfaceName, est.bags, bags, high, low);
    const now = { overfill: c.status === "possible-bypass", underfill: finished && c.status === "possible-voids-or-low-density" };
    for (const kind of ["overfill", "underfill"] as const) {
      if (now[kind] && !holds[kind]) warnings.push({ kind, message: c.message, raisedAt: e.loggedAt, raisedByEntryId: e.id, bagsAtRaise: bags, state: "open", resolution: null });
      holds[kind] = now[kind];
    }
    // A resolution note answers the latest warning on this wall that has none yet.
    if (e.resolution) {
      const w = [...warnings].reverse().find((x) => !x.resolution);
      if (w) { w.resolution = { note: e.resolution, by: e.user.name, at: e.loggedAt, entryId: e.id }; w.state = "resolved"; }
    }
  }
  for (const w of warnings) if (w.state === "open" && !holds[w.kind]) w.state = "cleared";
  const c = checkWall(est.surfaceId, est.surfaceName, est.bags, bags, high, low);
  const over = c.status === "possible-bypass";
  const under = finished && c.status === "possible-voids-or-low-density";
  return {
    surfaceId: est.surfaceId, name: est.surfaceName,
    expected: { bags: est.bags, bagsRoundedUp: est.bagsRoundedUp, holes: est.holes, bays: est.bays, blockedBays: est.blockedBays, pounds: est.pounds, cavityVolumeFt3: est.cavityVolumeFt3 },
    logged: {
      bags, holes: entries.reduce((a, e) => a + e.holesDrilled, 0), blockedBays: entries.reduce((a, e) => a + e.blockedBays, 0),
      prefilledBays: entries.reduce((a, e) => a + e.prefilledBays, 0), entries: entries.length,
    },
    finished,
    check: { status: c.status, ratio: c.ratio, message: c.message },
    warning: over ? { kind: "overfill", title: OVERFILL_WARNING, message: c.message } : under ? { kind: "underfill", title: UNDERFILL_WARNING, message: c.message } : null,
    warnings,
    entries,
  };
}

/** Predicted (calc without the test-out) against measured (calc with it) leakage and savings. */
export function testOutResult(doc: AssessmentDoc, showMoney: boolean) {
  const testIn = latestTest(doc, "test-in");
  const testOut = latestTest(doc, "test-out");
  const predictedDoc = { ...doc, leakage: { ...doc.leakage, tests: doc.leakage.tests.filter((t) => t.phase !== "test-out") } };
  const predicted = analyzeDoc(predictedDoc).analysis;
  const measured = testOut ? analyzeDoc(doc).analysis : null;
  const savings = (a: HouseAnalysis | null) => a && {
    fuelUnits: a.package.savings.fuelUnits, fuelUnit: a.package.savings.fuelUnit, mmbtu: a.package.savings.mmbtu, co2Lb: a.package.savings.co2Lb,
    ...(showMoney ? { usd: a.package.savings.usd, simplePaybackYears: a.package.simplePaybackYears, sir: a.package.sir } : {}),
  };
  const measuredCfm50 = testOut?.cfm50 ?? null;
  const testInCfm50 = testIn?.cfm50 ?? null;
  return {
    testInCfm50,
    predictedCfm50: predicted ? predicted.final.cfm50 : (doc.leakage.targetCfm50 ?? null),
    measuredCfm50,
    measuredReductionPct: measuredCfm50 !== null && testInCfm50 ? (1 - measuredCfm50 / testInCfm50) * 100 : null,
    /** calc applies the test-out reading to the air-sealing upgrade; without one it changes no figure. */
    usesMeasuredLeakage: Boolean(testOut && doc.upgrades.some((u) => u.type === "air-sealing")),
    savings: { predicted: savings(predicted), measured: savings(measured) },
    testOut: testOut ? { id: testOut.id, cfm50: testOut.cfm50, testedAt: testOut.testedAt, outdoorTempF: testOut.outdoorTempF ?? null, windMph: testOut.windMph ?? null, notes: testOut.notes ?? null } : null,
  };
}
export type TestOutResult = ReturnType<typeof testOutResult>;

/** The whole crew log of a job: per dense-pack wall expected vs logged, checks, safety and the summary. */
export async function getCrewLog(user: AuthUser, jobId: string) {
  const db = getDb();
  const job = await scopedJob(user, jobId);
  const loaded = await loadAssessment(user, jobId);
  const { analysis, issues } = analyzeDoc(loaded.doc);
  const high = analysis?.input.densePack.highRatio ?? DEFAULT_HIGH_RATIO;
  const low = analysis?.input.densePack.lowRatio ?? DEFAULT_LOW_RATIO;
  const entries = await entryRows(jobId);
  const walls = (analysis?.densePack ?? []).map((est) => wallView(est, entries.filter((e) => e.surfaceId === est.surfaceId), high, low));
  const wallIds = new Set(walls.map((w) => w.surfaceId));
  const cautions = cautionsOf(loaded.doc, analysis);

  const acks = await db
    .select({ id: safetyAcknowledgements.id, userId: safetyAcknowledgements.userId, userName: users.name, cautionKeys: safetyAcknowledgements.cautionKeys, acknowledgedAt: safetyAcknowledgements.acknowledgedAt })
    .from(safetyAcknowledgements)
    .innerJoin(users, eq(users.id, safetyAcknowledgements.userId))
    .where(eq(safetyAcknowledgements.jobId, jobId))
    .orderBy(desc(safetyAcknowledgements.acknowledgedAt))
    .limit(50);
  const mine = acks.find((a) => a.userId === user.id);

  const expectedBags = walls.reduce((a, w) => a + w.expected.bags, 0);
  const loggedBags = round2(walls.reduce((a, w) => a + w.logged.bags, 0));
  const allWarnings = walls.flatMap((w) => w.warnings.map((x) => ({ ...x, surfaceId: w.surfaceId, wall: w.name })));
  const showMoney = can(user.role, "prices:read");

  return {
    job: { id: job.id, number: job.number, title: job.title, stage: job.stage as JobStage, version: job.version },
    thresholds: { high, low },
    issues,
    walls,
    /** Entries on a wall that is no longer in a dense-pack upgrade (kept, never dropped). */
    otherEntries: entries.filter((e) => !e.surfaceId || !wallIds.has(e.surfaceId)),
    safety: {
      cautions,
      mine: mine ? { acknowledgedAt: mine.acknowledgedAt.getTime(), cautionKeys: mine.cautionKeys } : null,
      acknowledgements: acks.map((a) => ({ id: a.id, userName: a.userName, cautionKeys: a.cautionKeys, acknowledgedAt: a.acknowledgedAt.getTime() })),
    },
    summary: {
      bags: { expected: expectedBags, logged: loggedBags, ratio: expectedBags > 0 ? loggedBags / expectedBags : null },
      holes: { expected: walls.reduce((a, w) => a + w.expected.holes, 0), logged: walls.reduce((a, w) => a + w.logged.holes, 0) },
      wallsFinished: walls.filter((w) => w.finished).length,
      wallsTotal: walls.length,
      perWall: walls.map((w) => ({ surfaceId: w.surfaceId, name: w.name, expectedBags: w.expected.bags, loggedBags: w.logged.bags, ratio: w.check.ratio, status: w.check.status, finished: w.finished })),
      warnings: allWarnings,
      openWarnings: allWarnings.filter((w) => w.state === "open").length,
    },
    testOut: testOutResult(loaded.doc, showMoney),
    pricesVisible: showMoney,
    canWrite: can(user.role, "crewlog:write"),
    canRecordTestOut: can(user.role, "leakage:write"),
  };
}
export type CrewLogView = Awaited<ReturnType<typeof getCrewLog>>;

/**
 * Records one entry. A replay of the same clientRequestId (an offline queue sending again, a retried
 * request) answers the entry already stored, never a second one.
 */
export async function addCrewLogEntry(user: AuthUser, jobId: string, input: CrewLogEntryInput) {
  const db = getDb();
  const existing = await findByRequestId(input.clientRequestId);
  if (existing) return replayOf(existing, user, jobId);

  const job = await scopedJob(user, jobId);
  if (job.stage === "closed") throw new ApiError(409, "This job is closed; the crew log can no longer change.");
  const loaded = await loadAssessment(user, jobId);
  const { analysis } = analyzeDoc(loaded.doc);
  if (!analysis) throw new ApiError(422, "Some fields need attention.", { surfaceId: ["The job's assessment is incomplete, so its dense-pack walls are not known yet. Ask the auditor to finish it."] });
  const wall = analysis.densePack.find((d) => d.surfaceId === input.surfaceId);
  if (!wall) throw new ApiError(422, "Some fields need attention.", { surfaceId: ["The wall (surfaceId) is not one of this job's dense-pack walls."] });

  const inserted = await db
    .insert(crewLogEntries)
    .values({
      jobId, surfaceId: wall.surfaceId, userId: user.id, clientRequestId: input.clientRequestId,
      holesDrilled: input.holesDrilled, bagsBlown: input.bagsBlown, blockedBays: input.blockedBays, prefilledBays: input.prefilledBays,
      note: input.note ?? null, resolution: input.resolution ?? null, finished: input.finished,
      loggedAt: new Date(input.loggedAt ?? Date.now()),
    })
    .onConflictDoNothing({ target: crewLogEntries.clientRequestId })
    .returning();
  if (!inserted.length) {
    // Another copy of the same request won the race.
    const again = await findByRequestId(input.clientRequestId);
    if (again) return replayOf(again, user, jobId);
    throw new ApiError(409, "This entry could not be stored; please send it again.");
  }
  const entry = inserted[0]!;
  await logActivity(db, {
    companyId: user.companyId, userId: user.id, action: "crewlog.add", entityType: "job", entityId: jobId,
    detail: { entryId: entry.id, surfaceId: entry.surfaceId, bagsBlown: entry.bagsBlown, holesDrilled: entry.holesDrilled, finished: entry.finished },
  });
  const entries = (await entryRows(jobId)).filter((e) => e.surfaceId === wall.surfaceId);
  return {
    replayed: false,
    entry: toEntryView(entry, user.name),
    wall: wallView(wall, entries, analysis.input.densePack.highRatio, analysis.input.densePack.lowRatio),
  };
}

async function findByRequestId(clientRequestId: string) {
  const [row] = await getDb()
    .select({ e: crewLogEntries, userName: users.name })
    .from(crewLogEntries)
    .innerJoin(users, eq(users.id, crewLogEntries.userId))
    .where(eq(crewLogEntries.clientRequestId, clientRequestId));
  return row;
}

async function replayOf(row: NonNullable<Awaited<ReturnType<typeof findByRequestId>>>, user: AuthUser, jobId: string) {
  // Scope first: a request id from a job the user cannot see must not reveal that job's entry.
  await scopedJob(user, jobId);
  if (row.e.jobId !== jobId || row.e.userId !== user.id) throw new ApiError(409, "This clientRequestId was already used for another entry; make a new one.", { clientRequestId: ["Already used for another entry."] });
  return { replayed: true, entry: toEntryView(row.e, row.userName), wall: null };
}

/** The installer's acknowledgement of every caution the job has, for today's crew day. */
export async function acknowledgeSafety(user: AuthUser, jobId: string, input: SafetyAckInput) {
  const db = getDb();
  await scopedJob(user, jobId);
  const loaded = await loadAssessment(user, jobId);
  const cautions = cautionsOf(loaded.doc, analyzeDoc(loaded.doc).analysis);
  const given = new Set(input.cautionKeys);
  const missing = cautions.filter((c) => !given.has(c.id));
  const unknown = input.cautionKeys.filter((k) => !cautions.some((c) => c.id === k));
  if (missing.length || unknown.length) {
    const reasons = [
      ...(missing.length ? [`Tick every caution before starting: ${missing.map((c) => c.hazard).join("; ")}.`] : []),
      ...(unknown.length ? [`Not a caution of this job: ${unknown.join(", ")}.`] : []),
    ];
    throw new ApiError(422, "Some fields need attention.", { cautionKeys: reasons });
  }
  const [row] = await db.insert(safetyAcknowledgements).values({ jobId, userId: user.id, cautionKeys: cautions.map((c) => c.id), acknowledgedAt: new Date() }).returning();
  await logActivity(db, { companyId: user.companyId, userId: user.id, action: "safety.acknowledge", entityType: "job", entityId: jobId, detail: { cautionKeys: row!.cautionKeys } });
  return { acknowledgement: { id: row!.id, cautionKeys: row!.cautionKeys, acknowledgedAt: row!.acknowledgedAt.getTime() }, cautions };
}

/**
 * Records a test-out reading, bumps the job's version (an open assessment then reloads instead of
 * overwriting it) and moves an installing job to Verified. The device chooses the reading's id (its
 * clientRequestId), so a replay — the phone's queue sending again after a lost answer, or two
 * copies racing — records nothing new and gets the same answer: the stage event a reading causes
 * carries the reading's id, so "moved to Verified" is read back rather than remembered.
 *
 * The three writes go as one batch (one transaction, sent in one call): the stage event and the
 * version bump only happen while no reading has this id, and the reading itself is inserted last,
 * ignoring a row that already has the id. Nothing runs between the check and the insert.
 */
export async function recordTestOut(user: AuthUser, jobId: string, input: TestOutInput) {
  const db = getDb();
  const job = await scopedJob(user, jobId);
  const readingId = input.clientRequestId;
  const assertOurs = (row: typeof leakageTests.$inferSelect | undefined) => {
    if (row && (row.jobId !== jobId || row.phase !== "test-out")) throw new ApiError(409, "This clientRequestId was already used for another reading; make a new one.", { clientRequestId: ["Already used for another reading."] });
  };
  const [prior] = await db.select().from(leakageTests).where(eq(leakageTests.id, readingId));
  assertOurs(prior);
  let replayed = Boolean(prior);
  if (!prior) {
    if (job.stage === "closed") throw new ApiError(409, "This job is closed; record a new test on a new job.");
    const now = Date.now();
    const unused = sql`not exists (select 1 from ${leakageTests} where ${leakageTests.id} = ${readingId})`;
    const [, , insert] = await db.batch([
      db.run(sql`insert into ${jobStageEvents} (id, job_id, from_stage, to_stage, by_user_id, at, note)
        select ${readingId}, ${jobId}, 'installing', 'verified', ${user.id}, ${now}, ${`Test-out recorded: ${input.cfm50} CFM50.`}
        where ${unused} and (select ${jobs.stage} from ${jobs} where ${jobs.id} = ${jobId}) = 'installing'`),
      db.run(sql`update ${jobs} set version = version + 1, updated_at = ${now}, stage = case when stage = 'installing' then 'verified' else stage end
        where ${jobs.id} = ${jobId} and ${unused}`),
      db
        .insert(leakageTests)
        .values({
          id: readingId, jobId, phase: "test-out", cfm50: input.cfm50, testedAt: new Date(input.testedAt ?? now),
          outdoorTempF: input.outdoorTempF ?? null, windMph: input.windMph ?? null, notes: input.notes ?? null, recordedById: user.id,
        })
        .onConflictDoNothing({ target: leakageTests.id }),
    ]);
    if (insert.rowsAffected !== 1) {
      // Another copy of this request got there first: answer as a replay of it.
      const [winner] = await db.select().from(leakageTests).where(eq(leakageTests.id, readingId));
      if (!winner) throw new ApiError(409, "This reading could not be stored; please send it again.");
      assertOurs(winner);
      replayed = true;
    }
  }
  const [moved] = await db.select({ id: jobStageEvents.id }).from(jobStageEvents).where(and(eq(jobStageEvents.id, readingId), eq(jobStageEvents.jobId, jobId)));
  const movedToVerified = Boolean(moved);
  if (!replayed) await logActivity(db, { companyId: user.companyId, userId: user.id, action: "leakage.test-out", entityType: "job", entityId: jobId, detail: { readingId, cfm50: input.cfm50, movedToVerified } });
  const [after] = await db.select({ stage: jobs.stage, version: jobs.version }).from(jobs).where(eq(jobs.id, jobId));
  const loaded = await loadAssessment(user, jobId);
  return { replayed, movedToVerified, readingId, stage: after!.stage, version: after!.version, result: testOutResult(loaded.doc, can(user.role, "prices:read")) };
}


/** The installer's "Today": their assigned jobs that are approved or installing, with the crew-log progress. */
export async function listTodayJobs(user: AuthUser) {
  const db = getDb();
  const rows = await db
    .select({ id: jobs.id, number: jobs.number, title: jobs.title, stage: jobs.stage, street: houses.street, city: houses.city, updatedAt: jobs.updatedAt })
    .from(jobs)
    .innerJoin(houses, eq(houses.id, jobs.houseId))
    .where(and(jobScope(db, user), inArray(jobs.stage, ["approved", "installing"])))
    .orderBy(desc(jobs.stage), asc(jobs.number));
  const ids = rows.map((r) => r.id);
  const totals = ids.length
    ? await db
        .select({ jobId: crewLogEntries.jobId, bags: sql<number>`coalesce(sum(${crewLogEntries.bagsBlown}), 0)`, entries: sql<number>`count(*)`, last: sql<number | null>`max(${crewLogEntries.loggedAt})` })
        .from(crewLogEntries)
        .where(inArray(crewLogEntries.jobId, ids))
        .groupBy(crewLogEntries.jobId)
    : [];
  return rows.map((r) => {
    const t = totals.find((x) => x.jobId === r.id);
    return { ...r, bagsLogged: Number(t?.bags ?? 0), entries: Number(t?.entries ?? 0), lastLoggedAt: t?.last ?? null };
  });
}
