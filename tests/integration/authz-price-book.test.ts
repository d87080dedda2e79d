// The price book's routes, called as each kind of actor, with the exact answer each gets.
// Reading prices is for the owner and auditors; changing them is for the owner; installers and
// homeowners get neither. An item of another company answers 404, as if it did not exist.
import { describe, expect, it, vi } from "vitest";
import { seedId } from "@/db/seed";
import { actAs } from "../support/auth-mock";
import { call } from "../support/route";
import { actors, type Actor } from "./matrix-support";
import { seededDbForFile } from "./setup";

vi.mock("@/lib/auth", () => import("../support/auth-mock"));

const listRoute = await import("@/app/api/price-book/route");
const itemRoute = await import("@/app/api/price-book/[id]/route");
const taxRoute = await import("@/app/api/price-book/tax-rate/route");

const ctx = seededDbForFile();

const kestrelItem = seedId("price:CEL-BAG");
let n = 0;
const newItem = () => ({ code: `MATRIX-${++n}`, name: "Matrix item", kind: "other", unit: "each", unitPrice: "1.00" });

const matrix: { name: string; expect: Record<Actor, number>; run: (as: string | null) => Promise<number> }[] = [
  {
    name: "GET /api/price-book",
    expect: { anonymous: 401, "homeowner of the job": 403, "homeowner of another job": 403, "installer assigned": 403, "installer not assigned": 403, auditor: 200, owner: 200, "user of another company": 200 },
    run: async (as) => (actAs(as), await call(listRoute.GET as never, { path: "/api/price-book" })).status,
  },
  {
    name: "POST /api/price-book",
    expect: { anonymous: 401, "homeowner of the job": 403, "homeowner of another job": 403, "installer assigned": 403, "installer not assigned": 403, auditor: 403, owner: 201, "user of another company": 201 },
    run: async (as) => (actAs(as), await call(listRoute.POST as never, { method: "POST", path: "/api/price-book", body: newItem() })).status,
  },
  {
    name: "GET /api/price-book/[id] (a Kestrel Bay item)",
    expect: { anonymous: 401, "homeowner of the job": 403, "homeowner of another job": 403, "installer assigned": 403, "installer not assigned": 403, auditor: 200, owner: 200, "user of another company": 404 },
    run: async (as) => (actAs(as), await call(itemRoute.GET as never, { params: { id: kestrelItem } })).status,
  },
  {
    name: "PATCH /api/price-book/[id] (a Kestrel Bay item)",
    expect: { anonymous: 401, "homeowner of the job": 403, "homeowner of another job": 403, "installer assigned": 403, "installer not assigned": 403, auditor: 403, owner: 200, "user of another company": 404 },
    run: async (as) => (actAs(as), await call(itemRoute.PATCH as never, { method: "PATCH", params: { id: kestrelItem }, body: { description: `Edited by the matrix ${++n}` } })).status,
  },
  {
    name: "PATCH /api/price-book/[id] deactivate (a Kestrel Bay item)",
    expect: { anonymous: 401, "homeowner of the job": 403, "homeowner of another job": 403, "installer assigned": 403, "installer not assigned": 403, auditor: 403, owner: 200, "user of another company": 404 },
    run: async (as) => (actAs(as), await call(itemRoute.PATCH as never, { method: "PATCH", params: { id: seedId("price:PERMIT") }, body: { active: false } })).status,
  },
  {
    name: "GET /api/price-book/tax-rate",
    expect: { anonymous: 401, "homeowner of the job": 403, "homeowner of another job": 403, "installer assigned": 403, "installer not assigned": 403, auditor: 200, owner: 200, "user of another company": 200 },
    run: async (as) => (actAs(as), await call(taxRoute.GET as never, { path: "/api/price-book/tax-rate" })).status,
  },
  {
    name: "PUT /api/price-book/tax-rate",
    expect: { anonymous: 401, "homeowner of the job": 403, "homeowner of another job": 403, "installer assigned": 403, "installer not assigned": 403, auditor: 403, owner: 200, "user of another company": 200 },
    run: async (as) => (actAs(as), await call(taxRoute.PUT as never, { method: "PUT", path: "/api/price-book/tax-rate", body: { taxRatePercent: "6.625" } })).status,
  },
];

describe.each(matrix)("$name", ({ expect: expected, run }) => {
  it.each(Object.keys(actors) as Actor[])("as %s", async (actor) => {
    void ctx;
    expect(await run(actors[actor])).toBe(expected[actor]);
  });
});

describe("a data-changing request from another site", () => {
  it("is refused with 403 before anything else, even for the owner", async () => {
    void ctx;
    actAs(actors.owner);
    const post = await call(listRoute.POST as never, { method: "POST", body: newItem(), headers: { origin: "https://elsewhere.example" } });
    expect(post.status).toBe(403);
    const patch = await call(itemRoute.PATCH as never, { method: "PATCH", params: { id: kestrelItem }, body: { name: "Hijacked" }, headers: { origin: "https://elsewhere.example" } });
    expect(patch.status).toBe(403);
  });
});
