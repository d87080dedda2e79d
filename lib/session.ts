import "server-only";
import { notFound, redirect } from "next/navigation";
import { getSessionUser, type AuthUser } from "@/lib/authz/guard";
import { can, isStaff, type Permission } from "@/lib/authz/permissions";
import { getJob } from "@/lib/data/jobs";

/** For pages: the signed-in staff member, or a redirect to sign-in / the portal / the jobs list. */
export async function requireStaffPage(permission?: Permission): Promise<AuthUser> {
  const user = await getSessionUser();
  if (!user) redirect("/sign-in");
  if (!isStaff(user.role)) redirect("/portal");
  if (permission && !can(user.role, permission)) redirect("/jobs?denied=1");
  return user;
}

export async function requireHomeownerPage(): Promise<AuthUser> {
  const user = await getSessionUser();
  if (!user) redirect("/sign-in");
  if (isStaff(user.role)) redirect("/jobs");
  return user;
}

/** For a job's own pages: the staff member (as requireStaffPage) and the job, or the 404 page if it is outside their scope. */
export async function requireJobPage(params: Promise<{ id: string }>, permission: Permission) {
  const user = await requireStaffPage(permission);
  const { id } = await params;
  const job = await getJob(user, id);
  if (!job) notFound();
  return { user, job };
}
