"use client";

import useSWR, { useSWRConfig } from "swr";
import type { PhotoView } from "@/lib/data/photos";
import { fetcher } from "./fetcher";

export type PhotoFilter = { tag?: string; surfaceId?: string };
export type PhotoListResponse = { photos: PhotoView[] };

export function photosKey(jobId: string, filter: PhotoFilter = {}) {
  const search = new URLSearchParams();
  for (const [k, v] of Object.entries(filter)) if (v) search.set(k, v);
  const qs = search.toString();
  return `/api/jobs/${jobId}/photos${qs ? `?${qs}` : ""}`;
}

/** A job's photos, keyed by the API path (filters in the query string). */
export function usePhotos(jobId: string, filter: PhotoFilter = {}) {
  return useSWR<PhotoListResponse>(photosKey(jobId, filter), fetcher, { keepPreviousData: true });
}

/** Revalidates every photo list of the job (all filters) after an upload or delete. */
export function useRefreshPhotos(jobId: string) {
  const { mutate } = useSWRConfig();
  const prefix = `/api/jobs/${jobId}/photos`;
  return () => mutate((key) => typeof key === "string" && (key === prefix || key.startsWith(`${prefix}?`)));
}
