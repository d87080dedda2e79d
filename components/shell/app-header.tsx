import Link from "next/link";
import { Logo } from "@/components/brand/logo";
import { can, roleLabels } from "@/lib/authz/permissions";
import type { AuthUser } from "@/lib/authz/guard";
import type { NavItem } from "@/lib/nav";
import { NavLinks } from "./nav-links";
import { SignOutButton } from "./sign-out-button";

export function AppHeader({ user, companyName, nav }: { user: AuthUser; companyName: string; nav: NavItem[] }) {
  const items = nav.filter((item) => can(user.role, item.permission)).map(({ href, label }) => ({ href, label }));
  return (
    <header className="border-b border-spruce-800 bg-spruce-700 text-white">
      <div className="mx-auto flex max-w-6xl flex-wrap items-center gap-x-6 gap-y-2 px-4 py-3">
        <Link href={items[0]?.href ?? "/"} className="flex items-center gap-2 rounded text-white">
          <Logo className="h-7 w-7 text-white" />
          <span className="flex flex-col leading-tight">
            <span className="font-display text-lg font-bold">Warmstead</span>
            <span className="text-xs text-spruce-100" data-testid="company-name">
              {companyName}
            </span>
          </span>
        </Link>
        <NavLinks items={items} />
        <div className="ml-auto flex items-center gap-3 text-sm">
          <span className="text-right leading-tight" data-testid="signed-in-user">
            <span className="block font-semibold">{user.name}</span>
            <span className="block text-spruce-100">{roleLabels[user.role]}</span>
          </span>
          <SignOutButton />
        </div>
      </div>
    </header>
  );
}
