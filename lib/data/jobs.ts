import "server-only";
import { and, asc, count, desc, eq, inArray, max, sql, type SQL } from "drizzle-orm";
import { getDb, type Db } from "@/db";
import { clients, houses, jobCrew, jobs, jobStageEvents, users, type JobStage } from "@/db/schema";
import { ApiError, notFound } from "@/lib/api/errors";
import type { AuthUser } from "@/lib/authz/guard";
import type { JobListQuery, JobPatch, NewJobInput } from "@/lib/validation/job";
import { logActivity } from "./activity";
import { jobScope, jobScopePrepared, scopeParams, seesWholeCompany } from "./scope";

export type JobListRow = {
  id: string;
  number: number;
  title: string;
  stage: JobStage;
  clientName: string;
  address: string;
  auditorName: string | null;
  updatedAt: number;
};

const sortColumns = {
  updated: jobs.updatedAt,
  number: jobs.number,
  client: clients.name,
  stage: jobs.stage,
} as const;

/**
 * How a search is run. Both indexes hold the job number, title, client name, street and town and
 * are kept by triggers (migrations 0001, 0006 and 0009):
 * - "words": every word typed is the beginning of a word of the job's text (`job_words`, column
 *   `body`; reads only the matching words' entries: "birch 12" finds 12 Birchwood Road);
 * - "substring": the text anywhere (`job_search`, trigrams), tried when words find nothing;
 * - "like": one or two characters that are not a word, scanned with LIKE.
 */
type SearchKind = "none" | "words" | "substring" | "like";
type Search = { kind: SearchKind; term?: string };

function searchPlan(q: string | undefined): Search {
  if (!q) return { kind: "none" };
  const words = q.split(/[^\p{L}\p{N}]+/u).filter(Boolean);
  if (words.length) return { kind: "words", term: words.map((w) => `"${w}"*`).join(" ") };
  return substringPlan(q);
}
function substringPlan(q: string): Search {
  return q.length >= 3 ? { kind: "substring", term: `"${q.replace(/"/g, '""')}"` } : { kind: "like", term: `%${q.replace(/[\\%_]/g, (c) => `\\${c}`)}%` };
}

function matchesSearch(kind: Exclude<SearchKind, "none">) {
  const term = sql.placeholder("term");
  const base = sql.placeholder("scopeBase");
  if (kind === "words") return sql`${jobs}.rowid in (select rowid - ${base} from job_words where job_words match ${term} and rowid between ${base} and ${base} + ${KEY_SPAN - 1})`;
  if (kind === "substring") return sql`${jobs}.rowid in (select rowid from job_search where job_search match ${term})`;
  return sql`${jobs}.rowid in (select rowid from job_search where body like ${term} escape '\\')`;
}

/**
 * The word index files a job under its company's key times 2^32 plus the job's row id (migration
 * 0009), so a company's part of the index is one range of row ids, starting at this base.
 */
const KEY_SPAN = 4294967296;
const keyStatements = new WeakMap<Db, ReturnType<typeof buildKeyStatement>>();
const buildKeyStatement = (db: Db) =>
  db.select({ key: sql<number>`key` }).from(sql`company_keys`).where(sql`company_id = ${sql.placeholder("companyId")}`).prepare();
// A company's key never changes once given (company_keys rows are never updated or deleted).
const companyKeys = new WeakMap<Db, Map<string, number>>();
async function companyBase(db: Db, companyId: string): Promise<number | null> {
  let known = companyKeys.get(db);
  if (!known) companyKeys.set(db, (known = new Map()));
  let key = known.get(companyId);
  if (key === undefined) {
    let st = keyStatements.get(db);
    if (!st) keyStatements.set(db, (st = buildKeyStatement(db)));
    const [row] = await st.execute({ companyId });
    if (!row) return null; // no job yet, so nothing in the index either
    known.set(companyId, (key = Number(row.key)));
  }
  return key * KEY_SPAN;
}

// The list statements select these columns in this order (listFields in buildListStatements),
// and some add the matches' total after them. Rows are read by position, as SQLite returns them:
// every one is a plain text or integer, so Drizzle's per-row mapping would change nothing.
const [ID, NUMBER, TITLE, STAGE, CLIENT, STREET, CITY, AUDITOR, UPDATED, TOTAL] = [0, 1, 2, 3, 4, 5, 6, 7, 8, 9] as const;
const listRow = (r: ArrayLike<unknown>): JobListRow => ({
  id: r[ID] as string,
  number: r[NUMBER] as number,
  title: r[TITLE] as string,
  stage: r[STAGE] as JobStage,
  clientName: r[CLIENT] as string,
  address: `${r[STREET] as string}, ${r[CITY] as string}`,
  auditorName: r[AUDITOR] as string | null,
  updatedAt: r[UPDATED] as number,
});

/**
 * How a list query is driven. "index": walk the company's jobs in the sort order (best for no
 * search or a search matching many jobs). "matches": start from the search's matches and sort
 * them (best when they are few: a rare name is found without walking thousands of jobs).
 */
type Drive = "index" | "matches";
/** Up to this many matches, "matches" drives the page (measured on 10,000 jobs: 100 matches list faster from the matches, 1,000 from the index). */
const FEW_MATCHES = 200;

/** The list and count statements for one shape of query (role, filters, sort, drive), with placeholders. */
function buildListStatements(db: Db, role: AuthUser["role"], query: JobListQuery, search: SearchKind, drive: Drive) {
  const conditions = [jobScopePrepared(db, role, { companyIndexed: drive === "index" })];
  if (query.stage) conditions.push(eq(jobs.stage, sql.placeholder("stage")));
  if (search !== "none") conditions.push(matchesSearch(search));
  const where = and(...conditions);
  const order = query.dir === "asc" ? asc(sortColumns[query.sort]) : desc(sortColumns[query.sort]);
  const listFields = {
    id: jobs.id,
    number: jobs.number,
    title: jobs.title,
    stage: jobs.stage,
    clientName: clients.name,
    street: houses.street,
    city: houses.city,
    auditorName: users.name,
    // milliseconds as stored: the list sends numbers, so no Date is made and taken apart per row
    updatedAt: sql<number>`${jobs.updatedAt}`,
  };
  const limit = sql.placeholder("limit");
  const offset = sql.placeholder("offset");
  // Every match counted in the same pass that picks the page (a window over all the matches).
  const total = sql<number>`count(*) over ()`;
  // Driven from a search's few matches and sorted by a column of jobs: pick the page's jobs (and
  // count the matches) first, then join only those, rather than joining every match and sorting.
  const pageFirst = drive === "matches" && query.sort !== "client";
  const page = db
    .select({ rowid: sql<number>`${jobs}.rowid`.as("page_rowid"), total: total.as("page_total") })
    .from(jobs)
    .where(where)
    .orderBy(order, desc(jobs.number))
    .limit(limit)
    .offset(offset)
    .as("page");
  /** A page in the list's order, joined, with `extra` as the column after the list's own. */
  const joinedPage = (extra: SQL<number | null>) =>
    db
      .select({ ...listFields, extra })
      .from(jobs)
      .innerJoin(clients, eq(clients.id, jobs.clientId))
      .innerJoin(houses, eq(houses.id, jobs.houseId))
      .leftJoin(users, eq(users.id, jobs.auditorId))
      .where(where)
      .orderBy(order, desc(jobs.number))
      .limit(limit)
      .offset(offset)
      .prepare();
  return {
    list: joinedPage(sql<null>`null`),
    /** A page of the matches with, on every row, how many there are in all. */
    listWithTotal: pageFirst
      ? db
          .select({ ...listFields, total: page.total })
          .from(page)
          .innerJoin(jobs, eq(sql`${jobs}.rowid`, page.rowid))
          .innerJoin(clients, eq(clients.id, jobs.clientId))
          .innerJoin(houses, eq(houses.id, jobs.houseId))
          .leftJoin(users, eq(users.id, jobs.auditorId))
          .orderBy(order, desc(jobs.number))
          .prepare()
      : joinedPage(total),
    // Every job has its client and house (foreign keys), so the count needs no joins.
    count: db.select({ total: count() }).from(jobs).where(where).prepare(),
    // A word search's matches in the user's company, from the word index alone (its part of the
    // index is one range of row ids): the total for a role that sees the whole company, with no
    // stage filter; for anyone else at least their own count.
    wordMatches: db
      .select({ total: sql<number>`count(*)` })
      .from(sql`job_words`)
      .where(sql`job_words match ${sql.placeholder("term")} and rowid between ${sql.placeholder("scopeBase")} and ${sql.placeholder("scopeBase")} + ${KEY_SPAN - 1}`)
      .prepare(),
    // The company-wide total from job_counts (migration 0007), for roles that see the whole company.
    companyTotal: db
      .select({ total: sql<number>`coalesce(sum(${sql.raw("n")}), 0)` })
      .from(sql`job_counts`)
      .where(query.stage ? sql`company_id = ${sql.placeholder("scopeCompanyId")} and stage = ${sql.placeholder("stage")}` : sql`company_id = ${sql.placeholder("scopeCompanyId")}`)
      .prepare(),
  };
}

// Prepared once per database and shape, then reused: building and preparing the statements cost
// more than running them (bench/jobs.ts).
const prepared = new WeakMap<Db, Map<string, ReturnType<typeof buildListStatements>>>();
function listStatements(db: Db, role: AuthUser["role"], query: JobListQuery, search: SearchKind, drive: Drive) {
  const key = `${role}|${query.stage ? "stage" : ""}|${search}|${query.sort}|${query.dir}|${drive}`;
  let perDb = prepared.get(db);
  if (!perDb) prepared.set(db, (perDb = new Map()));
  let st = perDb.get(key);
  if (!st) perDb.set(key, (st = buildListStatements(db, role, query, search, drive)));
  return st;
}

export async function listJobs(user: AuthUser, query: JobListQuery): Promise<{ jobs: JobListRow[]; total: number }> {
  const plan = searchPlan(query.q);
  const found = await runList(user, query, plan);
  // Nothing begins with what was typed: look for it anywhere in the text instead.
  if (found.total === 0 && plan.kind === "words" && query.q) return runList(user, query, substringPlan(query.q));
  return found;
}

async function runList(user: AuthUser, query: JobListQuery, search: Search) {
  const db = getDb();
  const scopeBase = search.kind === "words" ? await companyBase(db, user.companyId) : null;
  const params = { ...scopeParams(user), scopeBase, stage: query.stage, term: search.term, limit: query.pageSize, offset: (query.page - 1) * query.pageSize };
  let rows: ArrayLike<unknown>[];
  let total: number;
  if (search.kind === "none") {
    const st = listStatements(db, user.role, query, "none", "index");
    rows = await st.list.values(params);
    if (query.page === 1 && rows.length < query.pageSize) total = rows.length; // a first page that is not full is the whole list
    else if (seesWholeCompany(user.role)) total = Number((await st.companyTotal.execute(params))[0]?.total ?? 0);
    else total = (await st.count.execute(params))[0]!.total;
  } else {
    const fromMatches = listStatements(db, user.role, query, search.kind, "matches");
    // A word search first counts the company's matches in the word index. None: done. Few: one
    // statement pages them and counts the user's own. Many: the index's count is the total when
    // the user sees the whole company and no stage is asked for; otherwise the job rows are counted.
    const inCompany = search.kind === "words" ? Number((await fromMatches.wordMatches.execute(params))[0]?.total ?? 0) : undefined;
    if (inCompany === 0) return { total: 0, jobs: [] };
    if (inCompany !== undefined && inCompany <= FEW_MATCHES) {
      rows = await fromMatches.listWithTotal.values(params);
      total = rows.length ? Number(rows[0]![TOTAL]) : query.page === 1 ? 0 : (await fromMatches.count.execute(params))[0]!.total;
    } else {
      total = inCompany !== undefined && !query.stage && seesWholeCompany(user.role) ? inCompany : (await fromMatches.count.execute(params))[0]!.total;
      rows = total === 0 ? [] : await (total <= FEW_MATCHES ? fromMatches : listStatements(db, user.role, query, search.kind, "index")).list.values(params);
    }
  }
  return {
    total,
    jobs: rows.map(listRow),
  };
}

export async function getJob(user: AuthUser, id: string) {
  const db = getDb();
  const [row] = await db
    .select({ job: jobs, house: houses, client: clients })
    .from(jobs)
    .innerJoin(houses, eq(houses.id, jobs.houseId))
    .innerJoin(clients, eq(clients.id, jobs.clientId))
    .where(and(eq(jobs.id, id), jobScope(db, user)));
  if (!row) return null;
  const [crew, history, auditor] = await Promise.all([
    db.select({ id: users.id, name: users.name }).from(jobCrew).innerJoin(users, eq(users.id, jobCrew.userId)).where(eq(jobCrew.jobId, id)),
    db
      .select({ id: jobStageEvents.id, fromStage: jobStageEvents.fromStage, toStage: jobStageEvents.toStage, at: jobStageEvents.at, note: jobStageEvents.note, byName: users.name })
      .from(jobStageEvents)
      .innerJoin(users, eq(users.id, jobStageEvents.byUserId))
      .where(eq(jobStageEvents.jobId, id))
      .orderBy(desc(jobStageEvents.at)),
    row.job.auditorId ? db.select({ id: users.id, name: users.name }).from(users).where(eq(users.id, row.job.auditorId)) : Promise.resolve([]),
  ]);
  return { ...row.job, house: row.house, client: row.client, crew, history, auditor: auditor[0] ?? null };
}
export type JobDetail = NonNullable<Awaited<ReturnType<typeof getJob>>>;

export async function createJob(user: AuthUser, input: NewJobInput) {
  const db = getDb();
  const jobId = await db.transaction(async (tx) => {
    const [client] = await tx
      .insert(clients)
      .values({ companyId: user.companyId, name: input.client.name, email: input.client.email ?? null, phone: input.client.phone ?? null })
      .returning({ id: clients.id });
    const { climateStationWmo, ...facts } = input.house;
    const [house] = await tx
      .insert(houses)
      .values({ ...facts, ceilingHeightFt: facts.ceilingHeightFt ?? null, climateStationWmo: climateStationWmo ?? null, companyId: user.companyId, clientId: client.id })
      .returning({ id: houses.id });
    const [{ last }] = await tx.select({ last: max(jobs.number) }).from(jobs).where(eq(jobs.companyId, user.companyId));
    const [job] = await tx
      .insert(jobs)
      .values({
        companyId: user.companyId,
        number: (last ?? 1000) + 1,
        houseId: house.id,
        clientId: client.id,
        title: input.title ?? `${input.house.street}, ${input.house.city}`,
        auditorId: user.role === "auditor" ? user.id : null,
        createdById: user.id,
      })
      .returning({ id: jobs.id });
    await tx.insert(jobStageEvents).values({ jobId: job.id, fromStage: null, toStage: "intake", byUserId: user.id });
    return job.id;
  });
  await logActivity(db, { companyId: user.companyId, userId: user.id, action: "job.create", entityType: "job", entityId: jobId });
  return (await getJob(user, jobId))!;
}

/** Applies a patch only if `version` is still current; a stale edit gets 409 with the record as it is now. */
export async function updateJob(user: AuthUser, id: string, patch: JobPatch) {
  const db = getDb();
  const current = await getJob(user, id);
  if (!current) throw notFound("Job");
  if (current.version !== patch.version) {
    throw new ApiError(409, "Someone else changed this job since you opened it. Review the current version and apply your change again.", undefined, { current });
  }
  if (patch.auditorId || patch.crewIds?.length) await assertStaffOfCompany(user, patch.auditorId, patch.crewIds);

  const changed = await db.transaction(async (tx) => {
    const set: Partial<typeof jobs.$inferInsert> = { version: current.version + 1, updatedAt: new Date() };
    if (patch.title !== undefined) set.title = patch.title;
    if (patch.stage !== undefined) set.stage = patch.stage;
    if (patch.auditorId !== undefined) set.auditorId = patch.auditorId;
    const res = await tx.update(jobs).set(set).where(and(eq(jobs.id, id), eq(jobs.version, patch.version))).returning({ id: jobs.id });
    if (res.length === 0) return false;
    if (patch.stage && patch.stage !== current.stage) {
      await tx.insert(jobStageEvents).values({ jobId: id, fromStage: current.stage, toStage: patch.stage, byUserId: user.id, note: patch.stageNote ?? null });
    }
    if (patch.crewIds) {
      await tx.delete(jobCrew).where(eq(jobCrew.jobId, id));
      if (patch.crewIds.length) await tx.insert(jobCrew).values(patch.crewIds.map((userId) => ({ jobId: id, userId })));
    }
    return true;
  });
  if (!changed) {
    const now = await getJob(user, id);
    throw new ApiError(409, "Someone else changed this job since you opened it. Review the current version and apply your change again.", undefined, { current: now });
  }
  const { version: _v, ...detail } = patch;
  void _v;
  await logActivity(db, { companyId: user.companyId, userId: user.id, action: patch.stage && patch.stage !== current.stage ? "job.stage" : "job.update", entityType: "job", entityId: id, detail });
  return (await getJob(user, id))!;
}

async function assertStaffOfCompany(user: AuthUser, auditorId?: string | null, crewIds?: string[]) {
  const ids = [...(auditorId ? [auditorId] : []), ...(crewIds ?? [])];
  const found = await getDb()
    .select({ id: users.id, role: users.role })
    .from(users)
    .where(and(eq(users.companyId, user.companyId), inArray(users.id, ids), eq(users.disabled, false)));
  const roleOf = new Map(found.map((u) => [u.id, u.role]));
  const fields: Record<string, string[]> = {};
  if (auditorId && !["auditor", "owner"].includes(roleOf.get(auditorId) ?? "")) fields.auditorId = ["Choose an active auditor of your company."];
  if (crewIds?.some((c) => roleOf.get(c) !== "installer")) fields.crewIds = ["Crew members must be active installers of your company."];
  if (Object.keys(fields).length) throw new ApiError(422, "Some fields need attention.", fields);
}
