// Display preferences: every signed-in user, of any role or company, sets their own; nobody else.
import { describe, expect, it, vi } from "vitest";
import { actAs } from "../support/auth-mock";
import { call } from "../support/route";
import { actors, type Actor } from "./matrix-support";
import { seededDbForFile } from "./setup";

vi.mock("@/lib/auth", () => import("../support/auth-mock"));

const route = await import("@/app/api/me/preferences/route");
const ctx = seededDbForFile();

const everyone = (ok: number): Record<Actor, number> => ({ anonymous: 401, "homeowner of the job": ok, "homeowner of another job": ok, "installer assigned": ok, "installer not assigned": ok, auditor: ok, owner: ok, "user of another company": ok });

const matrix: { name: string; expect: Record<Actor, number>; run: (as: string | null) => Promise<number> }[] = [
  { name: "GET /api/me/preferences", expect: everyone(200), run: async (as) => (actAs(as), await call(route.GET as never)).status },
  { name: "PUT /api/me/preferences", expect: everyone(200), run: async (as) => (actAs(as), await call(route.PUT as never, { method: "PUT", body: { unitSystem: "si" } })).status },
];

describe.each(matrix)("$name", ({ expect: expected, run }) => {
  it.each(Object.keys(actors) as Actor[])("as %s", async (actor) => {
    void ctx;
    expect(await run(actors[actor])).toBe(expected[actor]);
  });
});

describe("a preference change from another site", () => {
  it("is refused with 403", async () => {
    void ctx;
    actAs(actors.owner);
    expect((await call(route.PUT as never, { method: "PUT", body: { unitSystem: "si" }, headers: { origin: "https://elsewhere.example" } })).status).toBe(403);
  });
});
