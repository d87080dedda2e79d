import { parseWith } from "@/lib/api/errors";
import { json, readJson } from "@/lib/api/respond";
import { withAuth } from "@/lib/authz/guard";
import { getPreferences, setUnitSystem } from "@/lib/data/preferences";
import { preferencesSchema } from "@/lib/validation/preferences";

/** The signed-in user's display preferences (IP or SI units), whatever their role. */
export const GET = withAuth(async (_req, { user }) => json(getPreferences(user)), { permission: "account:preferences" });

export const PUT = withAuth(
  async (req, { user }) => {
    const input = parseWith(preferencesSchema, await readJson(req));
    return json(await setUnitSystem(user, input.unitSystem));
  },
  { permission: "account:preferences" },
);
