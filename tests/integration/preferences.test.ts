// Display units per user: stored in users.unit_system, set by the user themself through the guard.
import { eq } from "drizzle-orm";
import { describe, expect, it, vi } from "vitest";
import { activityLog, users } from "@/db/schema";
import { actAs } from "../support/auth-mock";
import { call } from "../support/route";
import { ids, seededDbForFile } from "./setup";

vi.mock("@/lib/auth", () => import("../support/auth-mock"));

const route = await import("@/app/api/me/preferences/route");
const ctx = seededDbForFile();

const unitsOf = async (id: string) => (await ctx.t.db.select({ u: users.unitSystem }).from(users).where(eq(users.id, id)))[0]!.u;

describe("PUT /api/me/preferences", () => {
  it("stores the signed-in user's units, reads them back, and leaves everyone else's alone", async () => {
    actAs(ids.auditor);
    expect((await call(route.GET as never)).json).toEqual({ unitSystem: "ip" });
    const put = await call(route.PUT as never, { method: "PUT", body: { unitSystem: "si" } });
    expect(put.status).toBe(200);
    expect(put.json).toEqual({ unitSystem: "si" });
    expect(await unitsOf(ids.auditor)).toBe("si");
    expect(await unitsOf(ids.owner)).toBe("ip");
    expect((await call(route.GET as never)).json).toEqual({ unitSystem: "si" });

    const logged = await ctx.t.db.select().from(activityLog).where(eq(activityLog.action, "user.preferences"));
    expect(logged.map((l) => [l.userId, l.entityId])).toEqual([[ids.auditor, ids.auditor]]);

    // Back to IP; the same value twice is a no-op that still answers 200 (and logs nothing new).
    expect((await call(route.PUT as never, { method: "PUT", body: { unitSystem: "ip" } })).status).toBe(200);
    expect((await call(route.PUT as never, { method: "PUT", body: { unitSystem: "ip" } })).status).toBe(200);
    expect(await unitsOf(ids.auditor)).toBe("ip");
    expect(await ctx.t.db.select().from(activityLog).where(eq(activityLog.action, "user.preferences"))).toHaveLength(2);
  });

  it("refuses another value with a message naming the field", async () => {
    actAs(ids.owner);
    const bad = await call<{ error: string; fields: Record<string, string[]> }>(route.PUT as never, { method: "PUT", body: { unitSystem: "metric" } });
    expect(bad.status).toBe(422);
    expect(bad.json.fields.unitSystem).toEqual(["Units must be “ip” (US units) or “si” (metric)."]);
    const missing = await call<{ fields: Record<string, string[]> }>(route.PUT as never, { method: "PUT", body: {} });
    expect(missing.status).toBe(422);
    expect(missing.json.fields.unitSystem?.[0]).toMatch(/Units/);
    const notJson = await call(route.PUT as never, { method: "PUT", body: "{units", headers: { "content-type": "application/json" } });
    expect(notJson.status).toBe(400);
    expect(await unitsOf(ids.owner)).toBe("ip");
  });

  it("ignores a user id in the body: only your own row changes", async () => {
    actAs(ids.installer);
    expect((await call(route.PUT as never, { method: "PUT", body: { unitSystem: "si", userId: ids.owner } })).status).toBe(200);
    expect(await unitsOf(ids.installer)).toBe("si");
    expect(await unitsOf(ids.owner)).toBe("ip");
  });
});
