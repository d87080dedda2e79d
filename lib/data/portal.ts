import "server-only";
import { and, desc, eq } from "drizzle-orm";
import { getDb } from "@/db";
import { houses, jobs } from "@/db/schema";
import type { AuthUser } from "@/lib/authz/guard";
import { jobScope } from "./scope";

/** A homeowner's own houses, each with the stage of its job; never another client's. */
export async function listHomeownerHouses(user: AuthUser) {
  const db = getDb();
  return db
    .select({ jobId: jobs.id, number: jobs.number, stage: jobs.stage, street: houses.street, city: houses.city, state: houses.state, yearBuilt: houses.yearBuilt })
    .from(jobs)
    .innerJoin(houses, eq(houses.id, jobs.houseId))
    .where(and(jobScope(db, user)))
    .orderBy(desc(jobs.updatedAt));
}
