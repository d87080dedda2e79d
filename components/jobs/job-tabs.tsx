import Link from "next/link";

const tabs = [
  { key: "overview", label: "Overview", href: (id: string) => `/jobs/${id}` },
  { key: "assessment", label: "Assessment", href: (id: string) => `/jobs/${id}/assessment` },
  { key: "photos", label: "Photos", href: (id: string) => `/jobs/${id}/photos` },
  { key: "crew", label: "Crew log", href: (id: string) => `/jobs/${id}/crew` },
  { key: "documents", label: "Documents", href: (id: string) => `/jobs/${id}/documents` },
] as const;

export function JobTabs({ jobId, active }: { jobId: string; active: (typeof tabs)[number]["key"] }) {
  return (
    <nav aria-label="Job" className="my-4 border-b border-line">
      <ul className="flex gap-1 overflow-x-auto">
        {tabs.map((t) => (
          <li key={t.key}>
            <Link href={t.href(jobId)} aria-current={t.key === active ? "page" : undefined} className={`inline-flex min-h-11 items-center whitespace-nowrap border-b-4 px-4 font-semibold ${t.key === active ? "border-ember-500 text-spruce-900" : "border-transparent text-ink-muted hover:text-spruce-800"}`}>
              {t.label}
            </Link>
          </li>
        ))}
      </ul>
    </nav>
  );
}
