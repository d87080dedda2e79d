import "server-only";
import { eq } from "drizzle-orm";
import { getDb } from "@/db";
import { users, type UnitSystem } from "@/db/schema";
import type { AuthUser } from "@/lib/authz/guard";
import { logActivity } from "./activity";

/** The signed-in user's own preferences; nobody sets another user's. */
export function getPreferences(user: AuthUser): { unitSystem: UnitSystem } {
  return { unitSystem: user.unitSystem };
}

export async function setUnitSystem(user: AuthUser, unitSystem: UnitSystem): Promise<{ unitSystem: UnitSystem }> {
  const db = getDb();
  if (unitSystem !== user.unitSystem) {
    await db.update(users).set({ unitSystem }).where(eq(users.id, user.id));
    await logActivity(db, { companyId: user.companyId, userId: user.id, action: "user.preferences", entityType: "user", entityId: user.id, detail: { unitSystem: { from: user.unitSystem, to: unitSystem } } });
  }
  return { unitSystem };
}
