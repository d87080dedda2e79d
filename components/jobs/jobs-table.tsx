"use client";

import Link from "next/link";
import { usePathname, useRouter, useSearchParams } from "next/navigation";
import { useEffect, useState } from "react";
import { useJobs } from "@/lib/hooks/use-jobs";
import { jobStageLabels, jobStages } from "@/lib/stages";
import { StageBadge } from "./stage-badge";

const sorts = [
  { key: "updated", label: "Last updated" },
  { key: "number", label: "Job number" },
  { key: "client", label: "Client" },
  { key: "stage", label: "Stage" },
] as const;

const dateFormat = new Intl.DateTimeFormat("en-US", { month: "short", day: "numeric", year: "numeric" });

export function JobsTable() {
  const router = useRouter();
  const pathname = usePathname();
  const params = useSearchParams();
  const q = params.get("q") ?? "";
  const stage = params.get("stage") ?? "";
  const sort = params.get("sort") ?? "updated";
  const dir = params.get("dir") ?? (sort === "client" ? "asc" : "desc");
  const page = Number(params.get("page") ?? "1") || 1;
  const [search, setSearch] = useState(q);

  const setParams = (next: Record<string, string | undefined>) => {
    const merged = new URLSearchParams(params.toString());
    for (const [k, v] of Object.entries(next)) if (v) merged.set(k, v); else merged.delete(k);
    router.replace(`${pathname}?${merged.toString()}`, { scroll: false });
  };

  // Search as you type, a moment after the last keystroke.
  useEffect(() => {
    if (search === q) return;
    const t = setTimeout(() => setParams({ q: search.trim() || undefined, page: undefined }), 250);
    return () => clearTimeout(t);
    // eslint-disable-next-line react-hooks/exhaustive-deps
  }, [search]);

  const { data, error, isLoading } = useJobs({ q: q || undefined, stage: stage || undefined, sort, dir, page, pageSize: 20 });
  const pages = data ? Math.max(1, Math.ceil(data.total / data.pageSize)) : 1;

  return (
    <section aria-labelledby="jobs-heading">
      <div className="flex flex-wrap items-end gap-3">
        <div className="min-w-56 flex-1">
          <label htmlFor="job-search" className="field-label">Search</label>
          <input id="job-search" type="search" className="field-input" placeholder="Client, street, town or job number" value={search} onChange={(e) => setSearch(e.target.value)} />
        </div>
        <div>
          <label htmlFor="job-stage" className="field-label">Stage</label>
          <select id="job-stage" className="field-input" value={stage} onChange={(e) => setParams({ stage: e.target.value || undefined, page: undefined })}>
            <option value="">All stages</option>
            {jobStages.map((s) => (
              <option key={s} value={s}>{jobStageLabels[s]}</option>
            ))}
          </select>
        </div>
        <div>
          <label htmlFor="job-sort" className="field-label">Sort</label>
          <select id="job-sort" className="field-input" value={`${sort}:${dir}`} onChange={(e) => { const [s, d] = e.target.value.split(":"); setParams({ sort: s, dir: d, page: undefined }); }}>
            {sorts.flatMap((s) => [
              <option key={`${s.key}:desc`} value={`${s.key}:desc`}>{s.label} ↓</option>,
              <option key={`${s.key}:asc`} value={`${s.key}:asc`}>{s.label} ↑</option>,
            ])}
          </select>
        </div>
      </div>

      <p className="mt-4 text-sm text-ink-muted" aria-live="polite" data-testid="jobs-count">
        {error ? "" : data ? `${data.total} job${data.total === 1 ? "" : "s"}` : "Loading jobs…"}
      </p>
      {error ? <p className="mt-2 rounded-md bg-danger-bg px-3 py-2 text-danger" role="status">{error.message}</p> : null}

      <div className="mt-2 overflow-x-auto rounded-lg border border-line bg-white">
        <table className="w-full min-w-[640px] text-left">
          <thead className="bg-paper-deep text-sm text-charcoal">
            <tr>
              <th scope="col" className="px-4 py-3">Job</th>
              <th scope="col" className="px-4 py-3">Client</th>
              <th scope="col" className="px-4 py-3">Address</th>
              <th scope="col" className="px-4 py-3">Stage</th>
              <th scope="col" className="px-4 py-3">Auditor</th>
              <th scope="col" className="px-4 py-3">Updated</th>
            </tr>
          </thead>
          <tbody data-testid="jobs-rows">
            {data?.jobs.map((job) => (
              <tr key={job.id} className="border-t border-line hover:bg-paper">
                <td className="px-4 py-3 font-semibold">
                  <Link href={`/jobs/${job.id}`} className="text-spruce-700 underline-offset-2 hover:underline">#{job.number}</Link>
                </td>
                <td className="px-4 py-3">{job.clientName}</td>
                <td className="px-4 py-3 text-ink-muted">{job.address}</td>
                <td className="px-4 py-3"><StageBadge stage={job.stage} /></td>
                <td className="px-4 py-3 text-ink-muted">{job.auditorName ?? "—"}</td>
                <td className="px-4 py-3 text-ink-muted">{dateFormat.format(job.updatedAt)}</td>
              </tr>
            ))}
            {data && data.jobs.length === 0 ? (
              <tr><td colSpan={6} className="px-4 py-8 text-center text-ink-muted">No jobs match. Clear the search or choose another stage.</td></tr>
            ) : null}
            {isLoading && !data ? (
              <tr><td colSpan={6} className="px-4 py-8 text-center text-ink-muted">Loading…</td></tr>
            ) : null}
          </tbody>
        </table>
      </div>

      <nav aria-label="Pages" className="mt-4 flex items-center justify-between gap-3">
        <button type="button" className="btn-ghost" disabled={page <= 1} onClick={() => setParams({ page: String(page - 1) })}>Previous</button>
        <span className="text-sm text-ink-muted">Page {page} of {pages}</span>
        <button type="button" className="btn-ghost" disabled={page >= pages} onClick={() => setParams({ page: String(page + 1) })}>Next</button>
      </nav>
    </section>
  );
}
