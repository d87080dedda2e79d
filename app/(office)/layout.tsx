import { AppHeader } from "@/components/shell/app-header";
import { getCompany } from "@/lib/data/company";
import { officeNav } from "@/lib/nav";
import { requireStaffPage } from "@/lib/session";

export default async function OfficeLayout({ children }: { children: React.ReactNode }) {
  const user = await requireStaffPage();
  const company = await getCompany(user);
  return (
    <>
      <AppHeader user={user} companyName={company?.name ?? ""} nav={officeNav} />
      <main className="mx-auto max-w-6xl px-4 py-6 sm:py-8">{children}</main>
    </>
  );
}
