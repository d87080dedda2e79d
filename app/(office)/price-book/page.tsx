import type { Metadata } from "next";
import { PriceBookScreen } from "@/components/price-book/price-book-screen";
import { TaxRateForm } from "@/components/price-book/tax-rate-form";
import { can } from "@/lib/authz/permissions";
import { getTaxRate, listPriceBook } from "@/lib/data/price-book";
import { requireStaffPage } from "@/lib/session";

export const metadata: Metadata = { title: "Price book" };

export default async function PriceBookPage() {
  const user = await requireStaffPage("prices:read");
  const canEdit = can(user.role, "pricebook:manage");
  const [items, { taxRatePpm }] = await Promise.all([listPriceBook(user), getTaxRate(user)]);
  return (
    <>
      <div className="mb-6 flex flex-wrap items-center justify-between gap-3">
        <div>
          <h1 id="price-book-heading" className="text-3xl font-bold text-spruce-900">
            Price book
          </h1>
          <p className="max-w-prose text-ink-muted">
            Materials and labour with their units and unit prices, used to price upgrades and proposals.{" "}
            {canEdit
              ? "An item you no longer sell is made inactive, not deleted, so proposals already sent keep their lines."
              : "Prices are set by the company owner; you can read them here."}
          </p>
        </div>
        {canEdit ? (
          <a href="#add-item" className="btn-accent">
            Add item
          </a>
        ) : null}
      </div>
      <TaxRateForm canEdit={canEdit} initialPpm={taxRatePpm} />
      <PriceBookScreen canEdit={canEdit} initial={{ items }} />
    </>
  );
}
