import type { Metadata } from "next";
import { getDb } from "@/db";
import { listActivity } from "@/lib/data/activity";
import { requireStaffPage } from "@/lib/session";

export const metadata: Metadata = { title: "Activity" };
const when = new Intl.DateTimeFormat("en-US", { dateStyle: "medium", timeStyle: "medium", timeZone: "America/New_York" });

export default async function ActivityPage() {
  const user = await requireStaffPage("activity:read");
  const rows = await listActivity(getDb(), user.companyId);
  return (
    <>
      <h1 className="text-3xl font-bold text-spruce-900">Activity</h1>
      <p className="mb-6 text-ink-muted">Sign-ins, failed sign-ins and every change, newest first (last 100).</p>
      <div className="overflow-x-auto rounded-lg border border-line bg-white">
        <table className="w-full min-w-[640px] text-left text-sm">
          <thead className="bg-paper-deep">
            <tr><th scope="col" className="px-4 py-2">When</th><th scope="col" className="px-4 py-2">Who</th><th scope="col" className="px-4 py-2">What</th><th scope="col" className="px-4 py-2">Record</th></tr>
          </thead>
          <tbody>
            {rows.map((r) => (
              <tr key={r.id} className="border-t border-line">
                <td className="px-4 py-2 whitespace-nowrap">{when.format(r.at)}</td>
                <td className="px-4 py-2">{r.userName ?? "—"}</td>
                <td className="px-4 py-2 font-semibold">{r.action}</td>
                <td className="px-4 py-2 text-ink-muted">{r.entityType ?? ""}</td>
              </tr>
            ))}
          </tbody>
        </table>
      </div>
    </>
  );
}
