import type { Permission } from "@/lib/authz/permissions";

export type NavItem = { href: string; label: string; permission: Permission; match?: string };

/** The office navigation, as data: each item is shown only to roles holding its permission. */
export const officeNav: NavItem[] = [
  { href: "/jobs", label: "Jobs", permission: "jobs:list" },
  { href: "/today", label: "Today", permission: "crewlog:write" },
  { href: "/team", label: "Team", permission: "users:manage" },
  { href: "/price-book", label: "Price book", permission: "prices:read" },
  { href: "/outbox", label: "Outbox", permission: "outbox:read" },
  { href: "/activity", label: "Activity", permission: "activity:read" },
];

export const portalNav: NavItem[] = [{ href: "/portal", label: "My home", permission: "portal:read" }];
