// The job's draft proposal (per-job pricing), called as each kind of actor, with the exact answer
// each gets. Prices are for the owner and auditors; a job of another company answers 404.
import { describe, expect, it, vi } from "vitest";
import { actAs } from "../support/auth-mock";
import { call } from "../support/route";
import { actors, type Actor } from "./matrix-support";
import { ids, seededDbForFile } from "./setup";

vi.mock("@/lib/auth", () => import("../support/auth-mock"));

const proposalRoute = await import("@/app/api/jobs/[id]/proposal/route");
const ctx = seededDbForFile();

const matrix: { name: string; expect: Record<Actor, number>; run: (as: string | null) => Promise<number> }[] = [
  {
    name: "GET /api/jobs/[id]/proposal (demo job 1006)",
    expect: { anonymous: 401, "homeowner of the job": 403, "homeowner of another job": 403, "installer assigned": 403, "installer not assigned": 403, auditor: 200, owner: 200, "user of another company": 404 },
    run: async (as) => (actAs(as), (await call(proposalRoute.GET as never, { params: { id: ids.demoJob } })).status),
  },
  {
    name: "GET /api/jobs/[id]/proposal (a job that does not exist)",
    expect: { anonymous: 401, "homeowner of the job": 403, "homeowner of another job": 403, "installer assigned": 403, "installer not assigned": 403, auditor: 404, owner: 404, "user of another company": 404 },
    run: async (as) => (actAs(as), (await call(proposalRoute.GET as never, { params: { id: "00000000-0000-4000-8000-000000000404" } })).status),
  },
];

describe.each(matrix)("$name", ({ expect: expected, run }) => {
  it.each(Object.keys(actors) as Actor[])("as %s", async (actor) => {
    void ctx;
    expect(await run(actors[actor])).toBe(expected[actor]);
  });
});
