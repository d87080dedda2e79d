import { AppHeader } from "@/components/shell/app-header";
import { getCompany } from "@/lib/data/company";
import { portalNav } from "@/lib/nav";
import { requireHomeownerPage } from "@/lib/session";

export default async function PortalLayout({ children }: { children: React.ReactNode }) {
  const user = await requireHomeownerPage();
  const company = await getCompany(user);
  return (
    <>
      <AppHeader user={user} companyName={company?.name ?? ""} nav={portalNav} />
      <main className="mx-auto max-w-4xl px-4 py-6 sm:py-8">{children}</main>
    </>
  );
}
