import { json } from "@/lib/api/respond";
import { withAuth } from "@/lib/authz/guard";
import { getDraftProposal } from "@/lib/data/proposals";

type Params = { id: string };

/**
 * The job's draft proposal, priced from the price book and the job's per-job overrides exactly as
 * the upgrade costs are (and written to `proposals`/`proposal_line_items` on the way). Prices: staff
 * who may read them; a job outside the user's scope answers 404.
 */
export const GET = withAuth<Params>(async (_req, { user, params }) => json({ proposal: await getDraftProposal(user, params.id) }), { permission: "prices:read" });
