import "server-only";
import { and, eq, inArray } from "drizzle-orm";
import { getDb } from "@/db";
import { photos, surfaces } from "@/db/schema";
import { ApiError } from "@/lib/api/errors";
import type { AuthUser } from "@/lib/authz/guard";
import { freezeCrewSummary } from "@/lib/documents/crew-summary";
import type { ReportSnapshot, SnapshotPhoto } from "@/lib/documents/snapshot";
import { getCrewLog } from "./crew-log";

/**
 * The photos chosen for a document, checked against the job: every id must be a photo of this job
 * (otherwise 422 naming `photoIds`). Repeats are dropped; the order given is the order shown.
 */
export async function photosForDocument(jobId: string, photoIds: string[]): Promise<SnapshotPhoto[]> {
  const ids = [...new Set(photoIds)];
  if (ids.length === 0) return [];
  const rows = await getDb()
    .select({ p: photos, surfaceLabel: surfaces.label })
    .from(photos)
    .leftJoin(surfaces, eq(surfaces.id, photos.surfaceId))
    .where(and(eq(photos.jobId, jobId), inArray(photos.id, ids)));
  const found = new Map(rows.map((r) => [r.p.id, r]));
  const missing = ids.filter((id) => !found.has(id));
  if (missing.length) {
    throw new ApiError(422, "Some fields need attention.", {
      photoIds: [`${missing.length === 1 ? "This photo is" : `${missing.length} of these photos are`} not part of this job: ${missing.join(", ")}. Choose photos from this job's gallery.`],
    });
  }
  return ids.map((id) => {
    const { p, surfaceLabel } = found.get(id)!;
    return { id, tag: p.tag, caption: p.caption, surfaceId: p.surfaceId, surfaceLabel, takenAt: p.takenAt?.getTime() ?? null, width: p.width, height: p.height };
  });
}

/** What an issued document adds beside the assessment: the chosen photos and the frozen crew-log summary. */
export async function documentExtras(user: AuthUser, jobId: string, photoIds: string[]): Promise<Pick<ReportSnapshot, "photoIds" | "photos" | "crewSummary">> {
  const chosen = await photosForDocument(jobId, photoIds);
  const crewSummary = freezeCrewSummary(await getCrewLog(user, jobId));
  return { photoIds: chosen.map((p) => p.id), ...(chosen.length ? { photos: chosen } : {}), ...(crewSummary ? { crewSummary } : {}) };
}
