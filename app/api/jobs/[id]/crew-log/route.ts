import { parseWith } from "@/lib/api/errors";
import { json, readJson } from "@/lib/api/respond";
import { withAuth } from "@/lib/authz/guard";
import { addCrewLogEntry, getCrewLog } from "@/lib/data/crew-log";
import { crewLogEntrySchema } from "@/lib/validation/crew-log";

type Params = { id: string };

/** The job's crew log: per dense-pack wall expected vs logged, calc's check, warnings, safety and the summary. */
export const GET = withAuth<Params>(
  async (_req, { user, params }) => json(await getCrewLog(user, params.id), { headers: { "cache-control": "no-store" } }),
  { permission: "crewlog:read" },
);

/** One entry (201); the same clientRequestId again answers the stored entry (200), never a duplicate. */
export const POST = withAuth<Params>(
  async (req, { user, params }) => {
    const input = parseWith(crewLogEntrySchema, await readJson(req));
    const saved = await addCrewLogEntry(user, params.id, input);
    return json(saved, saved.replayed ? 200 : 201);
  },
  { permission: "crewlog:write" },
);
