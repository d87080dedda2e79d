import { notFound, parseWith } from "@/lib/api/errors";
import { json, readJson } from "@/lib/api/respond";
import { withAuth } from "@/lib/authz/guard";
import { getPriceBookItem, updatePriceBookItem } from "@/lib/data/price-book";
import { priceBookPatchSchema } from "@/lib/validation/price-book";

type Params = { id: string };

export const GET = withAuth<Params>(
  async (_req, { user, params }) => {
    const item = await getPriceBookItem(user, params.id);
    if (!item) throw notFound("Price book item");
    return json({ item });
  },
  { permission: "prices:read" },
);

/**
 * Edits an item, or retires it with `{ active: false }` (and brings it back with `true`): items are
 * never deleted, so proposals that priced a line with one keep it. `updatedAt`, when sent, must
 * match the item's, or the answer is 409 with `current`.
 */
export const PATCH = withAuth<Params>(
  async (req, { user, params }) => {
    const patch = parseWith(priceBookPatchSchema, await readJson(req));
    return json({ item: await updatePriceBookItem(user, params.id, patch) });
  },
  { permission: "pricebook:manage" },
);
