import { parseWith } from "@/lib/api/errors";
import { json, readJson } from "@/lib/api/respond";
import { withAuth } from "@/lib/authz/guard";
import { createPriceBookItem, listPriceBook } from "@/lib/data/price-book";
import { newPriceBookItemSchema, priceBookQuerySchema } from "@/lib/validation/price-book";

/** The company's price book; `?active=true` (or `false`) narrows it to active (or retired) items. */
export const GET = withAuth(
  async (req, { user }) => {
    const query = parseWith(priceBookQuerySchema, Object.fromEntries(req.nextUrl.searchParams));
    return json({ items: await listPriceBook(user, query) });
  },
  { permission: "prices:read" },
);

export const POST = withAuth(
  async (req, { user }) => {
    const input = parseWith(newPriceBookItemSchema, await readJson(req));
    return json({ item: await createPriceBookItem(user, input) }, 201);
  },
  { permission: "pricebook:manage" },
);
