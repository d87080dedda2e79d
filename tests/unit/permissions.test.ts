import { describe, expect, it } from "vitest";
import { can, permissions, roleNames } from "@/lib/authz/permissions";

describe("role → permission map", () => {
  it("gives homeowners only portal reading, their documents, the photos in them, accepting a proposal and their own display units", () => {
    const granted = permissions.filter((p) => can("homeowner", p));
    // photos:read is limited by the data layer to photos named by their own issued documents
    expect(granted.sort()).toEqual(["account:preferences", "documents:read", "photos:read", "portal:read", "proposals:accept"]);
    expect(can("homeowner", "photos:upload")).toBe(false);
    expect(can("homeowner", "photos:delete")).toBe(false);
  });

  it("keeps prices and user management away from installers", () => {
    expect(can("installer", "prices:read")).toBe(false);
    expect(can("installer", "users:manage")).toBe(false);
    expect(can("installer", "assessment:write")).toBe(false);
    expect(can("installer", "crewlog:write")).toBe(true);
  });

  it("lets only the owner manage users and the price book", () => {
    for (const role of roleNames) {
      expect(can(role, "users:manage")).toBe(role === "owner");
      expect(can(role, "pricebook:manage")).toBe(role === "owner");
    }
  });

  it("lets every role set its own display units", () => {
    for (const role of roleNames) expect(can(role, "account:preferences")).toBe(true);
  });

  it("refuses an unknown role", () => {
    expect(can("janitor" as never, "jobs:read")).toBe(false);
  });
});
