import "server-only";
import { and, desc, eq, exists, sql, type SQL } from "drizzle-orm";
import { getDb, type Db } from "@/db";
import { crewLogEntries, issuedDocuments, jobs, photos, surfaces, users, type Photo } from "@/db/schema";
import { ApiError, notFound } from "@/lib/api/errors";
import type { AuthUser } from "@/lib/authz/guard";
import type { StoredPhotoFiles } from "@/lib/photos/pipeline";
import type { PhotoListQuery, PhotoUploadInput } from "@/lib/validation/photo";
import { logActivity } from "./activity";
import { jobScope } from "./scope";

/**
 * A photo reaches a homeowner only through an issued document. When a savings report or proposal
 * is issued with photos, its snapshot carries `photoIds: string[]`, the ids of the `photos` rows
 * shown in it (in the order shown). This condition is true for a photo named by any issued
 * document of the photo's own job and company (superseded versions included: the homeowner was
 * sent them). Only issued documents count: a proposal still being drafted is not in this table.
 */
export function inIssuedDocument(db: Db): SQL {
  return exists(
    db
      .select({ one: sql`1` })
      .from(issuedDocuments)
      .where(
        and(
          eq(issuedDocuments.jobId, photos.jobId),
          eq(issuedDocuments.companyId, photos.companyId),
          sql`exists (select 1 from json_each(${issuedDocuments.snapshot}, '$.photoIds') where json_each.value = ${photos.id})`,
        ),
      ),
  );
}

/**
 * Which photos a user may see: those of jobs in their scope; for a homeowner (whose job scope is
 * their own house) only those their issued documents include. Every read path goes through this.
 */
function photoScope(db: Db, user: AuthUser): SQL {
  const jobVisible = exists(db.select({ one: sql`1` }).from(jobs).where(and(eq(jobs.id, photos.jobId), jobScope(db, user))));
  const own = and(eq(photos.companyId, user.companyId), jobVisible)!;
  return user.role === "homeowner" ? and(own, inIssuedDocument(db))! : own;
}

export type PhotoView = {
  id: string;
  jobId: string;
  surfaceId: string | null;
  surfaceLabel: string | null;
  crewLogEntryId: string | null;
  tag: Photo["tag"];
  caption: string | null;
  contentType: string;
  bytes: number;
  width: number | null;
  height: number | null;
  takenAt: number | null;
  createdAt: number;
  uploadedBy: { id: string; name: string };
  url: string;
  thumbnailUrl: string;
};

const viewColumns = { photo: photos, surfaceLabel: surfaces.label, uploaderName: users.name };

function toView(row: { photo: Photo; surfaceLabel: string | null; uploaderName: string | null }): PhotoView {
  const p = row.photo;
  return {
    id: p.id,
    jobId: p.jobId,
    surfaceId: p.surfaceId,
    surfaceLabel: row.surfaceLabel,
    crewLogEntryId: p.crewLogEntryId,
    tag: p.tag,
    caption: p.caption,
    contentType: p.contentType,
    bytes: p.bytes,
    width: p.width,
    height: p.height,
    takenAt: p.takenAt ? p.takenAt.getTime() : null,
    createdAt: p.createdAt.getTime(),
    uploadedBy: { id: p.uploadedById, name: row.uploaderName ?? "" },
    url: `/api/photos/${p.id}`,
    thumbnailUrl: `/api/photos/${p.id}/thumbnail`,
  };
}

/** The job, if the user may see it; otherwise null (the caller answers 404). */
export async function findJobForPhotos(user: AuthUser, jobId: string) {
  const db = getDb();
  const [job] = await db.select({ id: jobs.id, companyId: jobs.companyId }).from(jobs).where(and(eq(jobs.id, jobId), jobScope(db, user)));
  return job ?? null;
}

/** Refuses a surface or crew-log entry that is not part of this job (422, naming the field). */
export async function assertPhotoLinks(jobId: string, input: Pick<PhotoUploadInput, "surfaceId" | "crewLogEntryId">) {
  const db = getDb();
  const fields: Record<string, string[]> = {};
  if (input.surfaceId) {
    const [s] = await db.select({ id: surfaces.id }).from(surfaces).where(and(eq(surfaces.id, input.surfaceId), eq(surfaces.jobId, jobId)));
    if (!s) fields.surfaceId = ["This surface is not part of this job."];
  }
  if (input.crewLogEntryId) {
    const [c] = await db.select({ id: crewLogEntries.id }).from(crewLogEntries).where(and(eq(crewLogEntries.id, input.crewLogEntryId), eq(crewLogEntries.jobId, jobId)));
    if (!c) fields.crewLogEntryId = ["This crew-log entry is not part of this job."];
  }
  if (Object.keys(fields).length) throw new ApiError(422, "Some fields need attention.", fields);
}

export async function createPhoto(user: AuthUser, job: { id: string; companyId: string }, input: PhotoUploadInput, files: StoredPhotoFiles): Promise<PhotoView> {
  const db = getDb();
  const [row] = await db
    .insert(photos)
    .values({
      companyId: job.companyId,
      jobId: job.id,
      surfaceId: input.surfaceId ?? null,
      crewLogEntryId: input.crewLogEntryId ?? null,
      tag: input.tag,
      caption: input.caption ?? null,
      storageKey: files.storageKey,
      thumbnailKey: files.thumbnailKey,
      contentType: files.contentType,
      bytes: files.bytes,
      width: files.width,
      height: files.height,
      takenAt: input.takenAt ? new Date(input.takenAt) : null,
      uploadedById: user.id,
    })
    .returning({ id: photos.id });
  await logActivity(db, {
    companyId: user.companyId,
    userId: user.id,
    action: "photo.upload",
    entityType: "photo",
    entityId: row.id,
    detail: { jobId: job.id, tag: input.tag, bytes: files.bytes, surfaceId: input.surfaceId ?? null, crewLogEntryId: input.crewLogEntryId ?? null },
  });
  const [view] = await db.select(viewColumns).from(photos).leftJoin(surfaces, eq(surfaces.id, photos.surfaceId)).leftJoin(users, eq(users.id, photos.uploadedById)).where(eq(photos.id, row.id));
  return toView(view);
}

/** The job's photos the user may see, newest first; null when the job is not theirs to see. */
export async function listPhotos(user: AuthUser, jobId: string, query: PhotoListQuery): Promise<PhotoView[] | null> {
  if (!(await findJobForPhotos(user, jobId))) return null;
  const db = getDb();
  const conditions = [eq(photos.jobId, jobId), photoScope(db, user)];
  if (query.tag) conditions.push(eq(photos.tag, query.tag));
  if (query.surfaceId) conditions.push(eq(photos.surfaceId, query.surfaceId));
  const rows = await db
    .select(viewColumns)
    .from(photos)
    .leftJoin(surfaces, eq(surfaces.id, photos.surfaceId))
    .leftJoin(users, eq(users.id, photos.uploadedById))
    .where(and(...conditions))
    .orderBy(desc(photos.createdAt), desc(photos.id));
  return rows.map(toView);
}

/** The photo row (with its storage keys) if the user may see it, else null. */
export async function findReadablePhoto(user: AuthUser, photoId: string): Promise<Photo | null> {
  const db = getDb();
  const [row] = await db.select().from(photos).where(and(eq(photos.id, photoId), photoScope(db, user)));
  return row ?? null;
}

/** Surfaces of the job, for the uploader's and gallery's surface choice. */
export async function listPhotoSurfaces(user: AuthUser, jobId: string) {
  if (!(await findJobForPhotos(user, jobId))) return null;
  return getDb()
    .select({ id: surfaces.id, label: surfaces.label, kind: surfaces.kind, orientation: surfaces.orientation })
    .from(surfaces)
    .where(eq(surfaces.jobId, jobId))
    .orderBy(surfaces.position, surfaces.label);
}

/**
 * Deletes a photo's row; the caller removes its stored files. Installers may delete only photos
 * they uploaded; nobody may delete a photo an issued document shows (the document is frozen).
 */
export async function deletePhoto(user: AuthUser, photoId: string): Promise<Photo> {
  const db = getDb();
  const photo = await findReadablePhoto(user, photoId);
  if (!photo) throw notFound("Photo");
  if (user.role === "installer" && photo.uploadedById !== user.id) throw new ApiError(403, "Installers can delete only photos they uploaded.");
  const [issued] = await db.select({ id: photos.id }).from(photos).where(and(eq(photos.id, photoId), inIssuedDocument(db)));
  if (issued) throw new ApiError(409, "This photo is part of an issued document and cannot be deleted.");
  await db.delete(photos).where(eq(photos.id, photoId));
  await logActivity(db, { companyId: user.companyId, userId: user.id, action: "photo.delete", entityType: "photo", entityId: photoId, detail: { jobId: photo.jobId, tag: photo.tag } });
  return photo;
}
