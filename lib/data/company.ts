import "server-only";
import { eq } from "drizzle-orm";
import { getDb } from "@/db";
import { companies } from "@/db/schema";
import type { AuthUser } from "@/lib/authz/guard";

export async function getCompany(user: AuthUser) {
  const [row] = await getDb().select().from(companies).where(eq(companies.id, user.companyId));
  return row ?? null;
}
