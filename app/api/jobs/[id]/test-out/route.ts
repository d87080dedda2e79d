import { parseWith } from "@/lib/api/errors";
import { json, readJson } from "@/lib/api/respond";
import { withAuth } from "@/lib/authz/guard";
import { recordTestOut } from "@/lib/data/crew-log";
import { testOutSchema } from "@/lib/validation/crew-log";

type Params = { id: string };

/** A test-out blower-door reading: moves an installing job to Verified; answers predicted vs measured. */
export const POST = withAuth<Params>(
  async (req, { user, params }) => {
    const input = parseWith(testOutSchema, await readJson(req));
    const saved = await recordTestOut(user, params.id, input);
    return json(saved, saved.replayed ? 200 : 201);
  },
  { permission: "leakage:write" },
);
