// The one role → permission map. Server guards enforce it; the UI reads it only to hide
// what a role cannot do (hiding is never the protection).
export const roleNames = ["owner", "auditor", "installer", "homeowner"] as const;
export type RoleName = (typeof roleNames)[number];

export const permissions = [
  "jobs:list",
  "jobs:read",
  "jobs:create",
  "jobs:update",
  "jobs:stage",
  "assessment:read",
  "assessment:write",
  "prices:read",
  "pricebook:manage",
  "users:manage",
  "crewlog:read",
  "crewlog:write",
  "leakage:write",
  "photos:read",
  "photos:upload",
  "photos:delete",
  "documents:issue",
  "documents:read",
  "proposals:accept",
  "outbox:read",
  "outbox:retry",
  "clients:invite",
  "portal:read",
  "activity:read",
  "account:preferences",
] as const;
export type Permission = (typeof permissions)[number];

// Every signed-in user sets their own display preferences (units); nobody else's.
const staffCommon: Permission[] = ["account:preferences", "jobs:list", "jobs:read", "assessment:read", "crewlog:read", "photos:read", "photos:upload", "photos:delete"];

const rolePermissions: Record<RoleName, ReadonlySet<Permission>> = {
  owner: new Set<Permission>([
    ...staffCommon,
    "jobs:create",
    "jobs:update",
    "jobs:stage",
    "assessment:write",
    "prices:read",
    "pricebook:manage",
    "users:manage",
    "leakage:write",
    "documents:issue",
    "documents:read",
    "outbox:read",
    "outbox:retry",
    "clients:invite",
    "activity:read",
  ]),
  auditor: new Set<Permission>([
    ...staffCommon,
    "jobs:create",
    "jobs:update",
    "jobs:stage",
    "assessment:write",
    "prices:read",
    "leakage:write",
    "documents:issue",
    "documents:read",
    "outbox:read",
    "outbox:retry",
    "clients:invite",
  ]),
  installer: new Set<Permission>([...staffCommon, "crewlog:write", "leakage:write"]),
  // photos:read reaches only the photos named by the homeowner's own issued documents (lib/data/photos.ts, photoScope).
  homeowner: new Set<Permission>(["account:preferences", "portal:read", "documents:read", "proposals:accept", "photos:read"]),
};

export function can(role: RoleName, permission: Permission): boolean {
  return rolePermissions[role]?.has(permission) ?? false;
}

export function permissionsOf(role: RoleName): Permission[] {
  return [...(rolePermissions[role] ?? [])];
}

export const isStaff = (role: RoleName) => role !== "homeowner";

export const roleLabels: Record<RoleName, string> = {
  owner: "Owner",
  auditor: "Auditor",
  installer: "Installer",
  homeowner: "Homeowner",
};
