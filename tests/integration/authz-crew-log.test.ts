// Every crew-log route (crew log, safety acknowledgement, test-out), called as each kind of actor,
// with the exact answer each gets. Installers reach only the jobs they are assigned to (job 1006:
// installer assigned, installer2 not); a job outside the scope answers 404.
import { describe, expect, it, vi } from "vitest";
import { actAs } from "../support/auth-mock";
import { call } from "../support/route";
import { actors, type Actor } from "./matrix-support";
import { ids, seededDbForFile } from "./setup";

vi.mock("@/lib/auth", () => import("../support/auth-mock"));

const crewRoute = await import("@/app/api/jobs/[id]/crew-log/route");
const ackRoute = await import("@/app/api/jobs/[id]/safety-ack/route");
const testOutRoute = await import("@/app/api/jobs/[id]/test-out/route");

const ctx = seededDbForFile();
const params = { id: ids.demoJob };

/** The demo job's first dense-pack wall and its cautions, read as the owner. */
async function demo() {
  actAs(ids.owner);
  const r = await call<{ walls: { surfaceId: string }[]; safety: { cautions: { id: string }[] } }>(crewRoute.GET as never, { params });
  return { surfaceId: r.json.walls[0]!.surfaceId, cautionKeys: r.json.safety.cautions.map((c) => c.id) };
}

const matrix: { name: string; expect: Record<Actor, number>; run: (as: string | null) => Promise<number> }[] = [
  {
    name: "GET /api/jobs/[id]/crew-log",
    expect: { anonymous: 401, "homeowner of the job": 403, "homeowner of another job": 403, "installer assigned": 200, "installer not assigned": 404, auditor: 200, owner: 200, "user of another company": 404 },
    run: async (as) => (actAs(as), await call(crewRoute.GET as never, { params })).status,
  },
  {
    name: "POST /api/jobs/[id]/crew-log",
    expect: { anonymous: 401, "homeowner of the job": 403, "homeowner of another job": 403, "installer assigned": 201, "installer not assigned": 404, auditor: 403, owner: 403, "user of another company": 403 },
    run: async (as) => {
      const { surfaceId } = await demo();
      actAs(as);
      return (await call(crewRoute.POST as never, { method: "POST", params, body: { clientRequestId: crypto.randomUUID(), surfaceId, bagsBlown: 1.5, holesDrilled: 2 } })).status;
    },
  },
  {
    name: "POST /api/jobs/[id]/safety-ack",
    expect: { anonymous: 401, "homeowner of the job": 403, "homeowner of another job": 403, "installer assigned": 201, "installer not assigned": 404, auditor: 403, owner: 403, "user of another company": 403 },
    run: async (as) => {
      const { cautionKeys } = await demo();
      actAs(as);
      return (await call(ackRoute.POST as never, { method: "POST", params, body: { cautionKeys } })).status;
    },
  },
  {
    name: "POST /api/jobs/[id]/test-out",
    expect: { anonymous: 401, "homeowner of the job": 403, "homeowner of another job": 403, "installer assigned": 201, "installer not assigned": 404, auditor: 201, owner: 201, "user of another company": 404 },
    run: async (as) => (actAs(as), await call(testOutRoute.POST as never, { method: "POST", params, body: { clientRequestId: crypto.randomUUID(), cfm50: 2400 } })).status,
  },
];

describe.each(matrix)("$name", ({ expect: expected, run }) => {
  it.each(Object.keys(actors) as Actor[])("as %s", async (actor) => {
    void ctx;
    expect(await run(actors[actor])).toBe(expected[actor]);
  });
});

describe("a job of another company", () => {
  it("answers 404 to the owner of another company, for reads and for a test-out", async () => {
    actAs(ids.otherOwner);
    expect((await call(crewRoute.GET as never, { params })).status).toBe(404);
    expect((await call(testOutRoute.POST as never, { method: "POST", params, body: { clientRequestId: crypto.randomUUID(), cfm50: 2400 } })).status).toBe(404);
  });

  it("refuses a cross-site POST with 403 before anything is stored", async () => {
    const { surfaceId } = await demo();
    actAs(ids.installer);
    const r = await call(crewRoute.POST as never, { method: "POST", params, headers: { origin: "https://evil.example" }, body: { clientRequestId: crypto.randomUUID(), surfaceId, bagsBlown: 1 } });
    expect(r.status).toBe(403);
  });
});

describe("an installer on a job they are not assigned to", () => {
  it("gets 404 and never sees that it exists", async () => {
    actAs(ids.installer2);
    const r = await call<{ error: string }>(crewRoute.GET as never, { params });
    expect(r.status).toBe(404);
    expect(r.json.error).toBe("Job not found.");
  });
});
