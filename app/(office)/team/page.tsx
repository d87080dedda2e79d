import type { Metadata } from "next";
import { AddUserForm } from "@/components/team/add-user-form";
import { UserRowActions } from "@/components/team/user-row-actions";
import { roleLabels } from "@/lib/authz/permissions";
import { listCompanyUsers } from "@/lib/data/users";
import { requireStaffPage } from "@/lib/session";

export const metadata: Metadata = { title: "Team" };

export default async function TeamPage() {
  const user = await requireStaffPage("users:manage");
  const people = await listCompanyUsers(user);
  return (
    <>
      <h1 className="text-3xl font-bold text-spruce-900">Team</h1>
      <p className="mb-6 text-ink-muted">Who can sign in, and what each role may do. A disabled account is refused on its next request.</p>
      <div className="overflow-x-auto rounded-lg border border-line bg-white">
        <table className="w-full min-w-[640px] text-left">
          <thead className="bg-paper-deep text-sm">
            <tr>
              <th scope="col" className="px-4 py-3">Name</th>
              <th scope="col" className="px-4 py-3">Role</th>
              <th scope="col" className="px-4 py-3">Status</th>
              <th scope="col" className="px-4 py-3">Change</th>
            </tr>
          </thead>
          <tbody>
            {people.map((p) => (
              <tr key={p.id} className="border-t border-line align-top" data-testid={`user-${p.email}`}>
                <td className="px-4 py-3"><span className="font-semibold">{p.name}</span><br /><span className="text-sm text-ink-muted">{p.email}</span></td>
                <td className="px-4 py-3">{roleLabels[p.role]}</td>
                <td className="px-4 py-3">{p.disabled ? <span className="font-semibold text-danger">Disabled</span> : "Active"}</td>
                <td className="px-4 py-3"><UserRowActions userId={p.id} role={p.role} disabled={p.disabled} self={p.id === user.id} /></td>
              </tr>
            ))}
          </tbody>
        </table>
      </div>
      <div className="mt-8"><AddUserForm /></div>
    </>
  );
}
