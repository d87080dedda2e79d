import { and, eq } from "drizzle-orm";
import { describe, expect, it, vi } from "vitest";
import { activityLog, priceBookItems } from "@/db/schema";
import { seedId } from "@/db/seed";
import { actAs } from "../support/auth-mock";
import { call } from "../support/route";
import { ids, seededDbForFile } from "./setup";

vi.mock("@/lib/auth", () => import("../support/auth-mock"));

const listRoute = await import("@/app/api/price-book/route");
const itemRoute = await import("@/app/api/price-book/[id]/route");

const ctx = seededDbForFile();

type Item = { id: string; code: string; name: string; description: string | null; kind: string; unit: string; unitPriceCents: number; taxable: boolean; active: boolean; createdAt: number; updatedAt: number };
type Body = { item: Item; items: Item[]; error: string; fields: Record<string, string[]>; current: Item };

const list = (qs = "") => call<Body>(listRoute.GET as never, { path: `/api/price-book${qs}` });
const create = (body: unknown) => call<Body>(listRoute.POST as never, { method: "POST", path: "/api/price-book", body });
const get = (id: string) => call<Body>(itemRoute.GET as never, { params: { id } });
const patch = (id: string, body: unknown) => call<Body>(itemRoute.PATCH as never, { method: "PATCH", params: { id }, body });

const celluloseId = seedId("price:CEL-BAG");
const good = { code: "soffit-baffle", name: "Soffit baffle", kind: "material", unit: "each", unitPrice: "3.75" };

describe("GET /api/price-book", () => {
  it("lists the seven seeded items of the company, prices in cents, active first then by code", async () => {
    actAs(ids.owner);
    const r = await list();
    expect(r.status).toBe(200);
    expect(r.json.items.map((i) => i.code)).toEqual(["AIR-SEAL", "ATTIC-BLOWN", "CEL-BAG", "DRILL-PLUG", "LAB-INS", "PERMIT", "WINDOW"]);
    const cellulose = r.json.items.find((i) => i.code === "CEL-BAG")!;
    expect(cellulose).toMatchObject({ name: "Dense-pack cellulose", kind: "material", unit: "bag", unitPriceCents: 1650, taxable: true, active: true });
    expect(typeof cellulose.updatedAt).toBe("number");
    expect(r.json.items.find((i) => i.code === "PERMIT")!.taxable).toBe(false);
  });

  it("lets an auditor read it too", async () => {
    actAs(ids.auditor);
    expect((await list()).json.items).toHaveLength(7);
    expect((await get(celluloseId)).json.item.code).toBe("CEL-BAG");
  });

  it("answers a bad filter with 422 naming it", async () => {
    actAs(ids.owner);
    const r = await list("?active=maybe");
    expect(r.status).toBe(422);
    expect(r.json.fields.active[0]).toMatch(/^Active must be/);
  });
});

describe("POST /api/price-book", () => {
  it("creates an item, reading dollars as integer cents and the code in capitals", async () => {
    actAs(ids.owner);
    const r = await create({ ...good, description: "  Rafter vent, 22 in.  ", taxable: false });
    expect(r.status).toBe(201);
    expect(r.json.item).toMatchObject({ code: "SOFFIT-BAFFLE", name: "Soffit baffle", description: "Rafter vent, 22 in.", kind: "material", unit: "each", unitPriceCents: 375, taxable: false, active: true });
    const [row] = await ctx.t.db.select().from(priceBookItems).where(eq(priceBookItems.id, r.json.item.id));
    expect(row.companyId).not.toBe(ids.otherCompany);
    expect(row.unitPriceCents).toBe(375);
    const [logged] = await ctx.t.db.select().from(activityLog).where(and(eq(activityLog.action, "pricebook.create"), eq(activityLog.entityId, r.json.item.id)));
    expect(logged).toMatchObject({ userId: ids.owner, entityType: "price_book_item" });
  });

  it.each([
    ["12.50", 1250],
    ["$1,250", 125_000],
    ["0.29", 29],
    ["7", 700],
    [".5", 50],
    ["0", 0],
    ["100000.00", 10_000_000],
    [19.99, 1999],
  ])("reads %j dollars as %i cents", async (unitPrice, cents) => {
    actAs(ids.owner);
    const r = await create({ ...good, code: `CENTS-${cents}-${String(unitPrice).length}`, unitPrice });
    expect(r.status).toBe(201);
    expect(r.json.item.unitPriceCents).toBe(cents);
  });

  it("refuses a code the company already uses, whatever its case, with the reason on the code field", async () => {
    actAs(ids.owner);
    const r = await create({ ...good, code: "cel-bag" });
    expect(r.status).toBe(409);
    expect(r.json.fields.code[0]).toBe("Code CEL-BAG is already used by “Dense-pack cellulose”. Choose another code.");
    expect((await list()).json.items.filter((i) => i.code === "CEL-BAG")).toHaveLength(1);
  });

  it.each([
    ["unitPrice", "-4.00", "Unit price cannot be negative."],
    ["unitPrice", -4, "Unit price cannot be negative."],
    ["unitPrice", "12.505", "Unit price can have at most two decimal places (whole cents)."],
    ["unitPrice", "100000.01", "Unit price must be at most $100,000.00."],
    ["unitPrice", "1e9", "Unit price must be an amount in dollars, e.g. 12.50."],
    ["unitPrice", "twelve", "Unit price must be an amount in dollars, e.g. 12.50."],
    ["unitPrice", "", "Enter unit price in dollars, e.g. 12.50."],
    ["unitPrice", null, "Enter unit price in dollars, e.g. 12.50."],
    ["unitPrice", true, "Unit price must be an amount in dollars, e.g. 12.50."],
    ["code", "", "Enter code."],
    ["code", "A B", "Code may use only letters, digits, dots, dashes and underscores, and must start with a letter or digit."],
    ["code", "X".repeat(33), "Code must be at most 32 characters."],
    ["name", "   ", "Enter name."],
    ["kind", "gadget", "Choose kind from the list."],
    ["unit", "m3", "Choose unit from the list."],
    ["taxable", "perhaps", "Taxable must be yes or no."],
  ])("answers %s = %j with 422 and the message on that field", async (field, value, message) => {
    actAs(ids.owner);
    const r = await create({ ...good, code: "BAD-INPUT", [field]: value });
    expect(r.status).toBe(422);
    expect(r.json.fields[field]).toEqual([message]);
    expect(Object.keys(r.json.fields)).toEqual([field]);
  });

  it("names every missing field at once, and an unknown one", async () => {
    actAs(ids.owner);
    const r = await create({ unitPriceCents: 100 });
    expect(r.status).toBe(422);
    expect(Object.keys(r.json.fields).sort()).toEqual(["_form", "code", "kind", "name", "unit", "unitPrice"]);
    expect(r.json.fields._form).toEqual(["Unknown field: unitPriceCents."]);
  });

  it("never answers 500 for a body that is not an item", async () => {
    actAs(ids.owner);
    for (const body of ["[1,2]", "null", '"text"', "42"]) {
      const r = await create(body);
      expect(r.status).toBe(422);
      expect(r.json.fields._form).toEqual(["Send the price book item as a JSON object."]);
    }
    expect((await create("{not json")).status).toBe(400);
    expect((await call(listRoute.POST as never, { method: "POST", body: "code=X", headers: { "content-type": "application/x-www-form-urlencoded" } })).status).toBe(415);
  });
});

describe("PATCH /api/price-book/[id]", () => {
  it("edits an item, with dollars read as cents, and logs what changed", async () => {
    actAs(ids.owner);
    const before = (await get(seedId("price:DRILL-PLUG"))).json.item;
    const r = await patch(before.id, { unitPrice: "9.75", name: "Drill, plug and patch (plaster)", updatedAt: before.updatedAt });
    expect(r.status).toBe(200);
    expect(r.json.item).toMatchObject({ code: "DRILL-PLUG", name: "Drill, plug and patch (plaster)", unitPriceCents: 975 });
    expect(r.json.item.updatedAt).toBeGreaterThan(before.updatedAt);
    const [logged] = await ctx.t.db.select().from(activityLog).where(and(eq(activityLog.action, "pricebook.update"), eq(activityLog.entityId, before.id)));
    expect(logged.detail).toMatchObject({ code: "DRILL-PLUG", changes: { unitPriceCents: { from: 900, to: 975 }, name: { from: "Drill, plug and patch", to: "Drill, plug and patch (plaster)" } } });
  });

  it("deactivates and reactivates instead of deleting, and ?active filters", async () => {
    actAs(ids.owner);
    const id = seedId("price:ATTIC-BLOWN");
    const off = await patch(id, { active: false });
    expect(off.status).toBe(200);
    expect(off.json.item.active).toBe(false);
    expect((await list("?active=true")).json.items.map((i) => i.code)).not.toContain("ATTIC-BLOWN");
    expect((await list("?active=false")).json.items.map((i) => i.code)).toEqual(["ATTIC-BLOWN"]);
    expect((await list()).json.items.at(-1)!.code).toBe("ATTIC-BLOWN"); // inactive items last
    const on = await patch(id, { active: true });
    expect(on.json.item.active).toBe(true);
    const actions = (await ctx.t.db.select().from(activityLog).where(eq(activityLog.entityId, id))).map((a) => a.action);
    expect(actions).toEqual(expect.arrayContaining(["pricebook.deactivate", "pricebook.reactivate"]));
  });

  it("clears the description when sent blank or null, keeps it when left out", async () => {
    actAs(ids.owner);
    const id = seedId("price:LAB-INS");
    expect((await patch(id, { description: "Crew of two" })).json.item.description).toBe("Crew of two");
    expect((await patch(id, { name: "Insulation labour" })).json.item.description).toBe("Crew of two");
    expect((await patch(id, { description: "" })).json.item.description).toBeNull();
    await patch(id, { description: "again" });
    expect((await patch(id, { description: null })).json.item.description).toBeNull();
  });

  it("refuses a stale updatedAt with 409 and the item as it is now", async () => {
    actAs(ids.owner);
    const id = seedId("price:AIR-SEAL");
    const seen = (await get(id)).json.item;
    const first = await patch(id, { unitPrice: "97.00", updatedAt: seen.updatedAt });
    expect(first.status).toBe(200);
    const second = await patch(id, { unitPrice: "99.00", updatedAt: seen.updatedAt });
    expect(second.status).toBe(409);
    expect(second.json.current).toMatchObject({ id, unitPriceCents: 9700, updatedAt: first.json.item.updatedAt });
    expect((await get(id)).json.item.unitPriceCents).toBe(9700);
    // Sent again with the current stamp, it applies.
    expect((await patch(id, { unitPrice: "99.00", updatedAt: second.json.current.updatedAt })).json.item.unitPriceCents).toBe(9900);
  });

  it("refuses renaming onto another item's code with 409 on the code field", async () => {
    actAs(ids.owner);
    const r = await patch(seedId("price:PERMIT"), { code: "lab-ins" });
    expect(r.status).toBe(409);
    expect(r.json.fields.code[0]).toMatch(/^Code LAB-INS is already used by “Insulation labour”/);
    // Its own code is not a clash.
    expect((await patch(seedId("price:PERMIT"), { code: "permit", name: "Building permit and inspection" })).status).toBe(200);
  });

  it.each([
    [{ unitPrice: "-1" }, "unitPrice", "Unit price cannot be negative."],
    [{ unitPrice: "3.333" }, "unitPrice", "Unit price can have at most two decimal places (whole cents)."],
    [{ unitPrice: null }, "unitPrice", "Enter unit price in dollars, e.g. 12.50."],
    [{ name: "" }, "name", "Enter name."],
    [{ active: "sometimes" }, "active", "Active must be yes or no."],
    [{ updatedAt: "yesterday", name: "X" }, "updatedAt", "Send updatedAt as the item's last-changed time in milliseconds."],
    [{}, "_form", "Change at least one field."],
    [{ updatedAt: 1 }, "_form", "Change at least one field."],
    [{ companyId: ids.otherCompany }, "_form", "Unknown field: companyId."],
  ])("answers %j with 422 naming %s", async (body, field, message) => {
    actAs(ids.owner);
    const r = await patch(celluloseId, body);
    expect(r.status).toBe(422);
    expect(r.json.fields[field]).toEqual([message]);
  });

  it("answers 404 for an id that is not an item", async () => {
    actAs(ids.owner);
    expect((await patch("not-an-id", { name: "X" })).status).toBe(404);
    expect((await get("not-an-id")).status).toBe(404);
  });
});

describe("company isolation", () => {
  it("keeps each company's price book apart: lists, reads, edits and codes", async () => {
    actAs(ids.otherOwner);
    expect((await list()).json.items).toEqual([]);
    expect((await get(celluloseId)).status).toBe(404);
    expect((await patch(celluloseId, { unitPrice: "0.01" })).status).toBe(404);
    // The same code is free in another company.
    const mine = await create({ ...good, code: "CEL-BAG", name: "Other Co cellulose" });
    expect(mine.status).toBe(201);
    expect((await list()).json.items.map((i) => i.name)).toEqual(["Other Co cellulose"]);

    actAs(ids.owner);
    const kestrel = (await list()).json.items;
    expect(kestrel.find((i) => i.code === "CEL-BAG")!.unitPriceCents).toBe(1650);
    expect(kestrel.map((i) => i.name)).not.toContain("Other Co cellulose");
    expect((await get(mine.json.item.id)).status).toBe(404);
    expect((await patch(mine.json.item.id, { active: false })).status).toBe(404);
    const [theirs] = await ctx.t.db.select().from(priceBookItems).where(eq(priceBookItems.id, mine.json.item.id));
    expect(theirs).toMatchObject({ companyId: ids.otherCompany, active: true });
  });
});
