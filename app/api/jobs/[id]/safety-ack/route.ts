import { parseWith } from "@/lib/api/errors";
import { json, readJson } from "@/lib/api/respond";
import { withAuth } from "@/lib/authz/guard";
import { acknowledgeSafety } from "@/lib/data/crew-log";
import { safetyAckSchema } from "@/lib/validation/crew-log";

type Params = { id: string };

/** The installer acknowledges every caution of the job for today's crew day. */
export const POST = withAuth<Params>(
  async (req, { user, params }) => {
    const input = parseWith(safetyAckSchema, await readJson(req));
    return json(await acknowledgeSafety(user, params.id, input), 201);
  },
  { permission: "crewlog:write" },
);
