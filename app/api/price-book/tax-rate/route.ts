import { parseWith } from "@/lib/api/errors";
import { json, readJson } from "@/lib/api/respond";
import { withAuth } from "@/lib/authz/guard";
import { getTaxRate, setTaxRate } from "@/lib/data/price-book";
import { taxRateSchema } from "@/lib/validation/price-book";

/** The company's sales tax rate in parts per million (6.625 % is 66 250), read with the prices. */
export const GET = withAuth(async (_req, { user }) => json(await getTaxRate(user)), { permission: "prices:read" });

/** Sets it from a percentage typed with up to four decimals: `{ taxRatePercent: "6.625" }`. */
export const PUT = withAuth(
  async (req, { user }) => {
    const { taxRatePercent } = parseWith(taxRateSchema, await readJson(req));
    return json(await setTaxRate(user, taxRatePercent));
  },
  { permission: "pricebook:manage" },
);
