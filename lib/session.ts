import "server-only";
import { redirect } from "next/navigation";
import { getSessionUser, type AuthUser } from "@/lib/authz/guard";
import { can, isStaff, type Permission } from "@/lib/authz/permissions";

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
