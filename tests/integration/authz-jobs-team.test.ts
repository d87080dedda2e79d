// Every route handler and server action, called as each kind of actor, with the exact answer each gets.
import { describe, expect, it, vi } from "vitest";
import { actAs } from "../support/auth-mock";
import { call, form } from "../support/route";
import { actors, runAction, type Actor } from "./matrix-support";
import { ids, seededDbForFile } from "./setup";

vi.mock("@/lib/auth", () => import("../support/auth-mock"));
vi.mock("next/cache", () => ({ revalidatePath: vi.fn() }));

const jobsRoute = await import("@/app/api/jobs/route");
const jobRoute = await import("@/app/api/jobs/[id]/route");
const newJobActions = await import("@/app/(office)/jobs/new/actions");
const teamActions = await import("@/app/(office)/team/actions");

const ctx = seededDbForFile();

const newJob = {
  client: { name: "Matrix Client" },
  house: { street: "1 Test Lane", city: "Harrowmere", state: "NJ", postalCode: "07000", yearBuilt: 1950, stories: "1", conditionedAreaFt2: 1200, volumeFt3: 9600, bedrooms: 2, foundation: "slab", shielding: "normal" },
};

async function currentVersion() {
  actAs(ids.owner);
  const r = await call(jobRoute.GET as never, { params: { id: ids.demoJob } });
  return (r.json.job as { version: number }).version;
}

const matrix: { name: string; expect: Record<Actor, number>; run: (as: string | null) => Promise<number> }[] = [
  {
    name: "GET /api/jobs",
    expect: { anonymous: 401, "homeowner of the job": 403, "homeowner of another job": 403, "installer assigned": 200, "installer not assigned": 200, auditor: 200, owner: 200, "user of another company": 200 },
    run: async (as) => (actAs(as), await call(jobsRoute.GET as never, { path: "/api/jobs" })).status,
  },
  {
    name: "POST /api/jobs",
    expect: { anonymous: 401, "homeowner of the job": 403, "homeowner of another job": 403, "installer assigned": 403, "installer not assigned": 403, auditor: 201, owner: 201, "user of another company": 201 },
    run: async (as) => (actAs(as), await call(jobsRoute.POST as never, { method: "POST", body: newJob })).status,
  },
  {
    name: "GET /api/jobs/[id]",
    expect: { anonymous: 401, "homeowner of the job": 403, "homeowner of another job": 403, "installer assigned": 200, "installer not assigned": 404, auditor: 200, owner: 200, "user of another company": 404 },
    run: async (as) => (actAs(as), await call(jobRoute.GET as never, { params: { id: ids.demoJob } })).status,
  },
  {
    name: "PATCH /api/jobs/[id]",
    expect: { anonymous: 401, "homeowner of the job": 403, "homeowner of another job": 403, "installer assigned": 403, "installer not assigned": 403, auditor: 200, owner: 200, "user of another company": 404 },
    run: async (as) => {
      const version = await currentVersion();
      actAs(as);
      return (await call(jobRoute.PATCH as never, { method: "PATCH", params: { id: ids.demoJob }, body: { version, title: "Renamed by the matrix" } })).status;
    },
  },
  {
    name: "action createJob",
    expect: { anonymous: 401, "homeowner of the job": 403, "homeowner of another job": 403, "installer assigned": 403, "installer not assigned": 403, auditor: 303, owner: 303, "user of another company": 303 },
    run: (as) =>
      (actAs(as), runAction(newJobActions.createJobAction, form({ "client.name": "Action Client", "house.street": "2 Test Lane", "house.city": "Harrowmere", "house.state": "NJ", "house.postalCode": "07000", "house.yearBuilt": 1960, "house.stories": "2", "house.conditionedAreaFt2": 1500, "house.ceilingHeightFt": 8, "house.bedrooms": 3, "house.foundation": "basement", "house.shielding": "normal" }))),
  },
  {
    name: "action addUser",
    expect: { anonymous: 401, "homeowner of the job": 403, "homeowner of another job": 403, "installer assigned": 403, "installer not assigned": 403, auditor: 403, owner: 200, "user of another company": 200 },
    run: (as) => (actAs(as), runAction(teamActions.addUserAction, form({ name: "New Person", email: `p${Math.random().toString(36).slice(2)}@kestrelbay.example`, role: "installer", password: "long-enough-password" }))),
  },
  {
    name: "action setRole (on a Kestrel Bay installer)",
    expect: { anonymous: 401, "homeowner of the job": 403, "homeowner of another job": 403, "installer assigned": 403, "installer not assigned": 403, auditor: 403, owner: 200, "user of another company": 404 },
    run: (as) => (actAs(as), runAction(teamActions.setRoleAction, form({ userId: ids.installer2, role: "installer" }))),
  },
  {
    name: "action setDisabled (enable a Kestrel Bay installer)",
    expect: { anonymous: 401, "homeowner of the job": 403, "homeowner of another job": 403, "installer assigned": 403, "installer not assigned": 403, auditor: 403, owner: 200, "user of another company": 404 },
    run: (as) => (actAs(as), runAction(teamActions.setDisabledAction, form({ userId: ids.installer2, disabled: "false" }))),
  },
];

describe.each(matrix)("$name", ({ expect: expected, run }) => {
  it.each(Object.keys(actors) as Actor[])("as %s", async (actor) => {
    void ctx;
    expect(await run(actors[actor])).toBe(expected[actor]);
  });
});
