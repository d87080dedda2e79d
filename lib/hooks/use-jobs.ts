"use client";

import useSWR from "swr";
import type { JobListRow } from "@/lib/data/jobs";
import { fetcher } from "./fetcher";

export type JobListParams = { q?: string; stage?: string; sort?: string; dir?: string; page?: number; pageSize?: number };
export type JobListResponse = { jobs: JobListRow[]; total: number; page: number; pageSize: number };

export function jobsKey(params: JobListParams) {
  const search = new URLSearchParams();
  for (const [k, v] of Object.entries(params)) if (v !== undefined && v !== "") search.set(k, String(v));
  const qs = search.toString();
  return `/api/jobs${qs ? `?${qs}` : ""}`;
}

/** Jobs list, keyed by its API path; keeps the previous page on screen while the next one loads. */
export function useJobs(params: JobListParams) {
  return useSWR<JobListResponse>(jobsKey(params), fetcher, { keepPreviousData: true });
}
