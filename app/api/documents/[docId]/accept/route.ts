import { parseWith } from "@/lib/api/errors";
import { json, readJson } from "@/lib/api/respond";
import { clientIp } from "@/lib/auth/ip";
import { withAuth } from "@/lib/authz/guard";
import { acceptProposal } from "@/lib/data/documents";
import { acceptProposalSchema } from "@/lib/validation/document";

export const POST = withAuth<{ docId: string }>(
  async (req, { user, params }) => {
    const input = parseWith(acceptProposalSchema, await readJson(req));
    const r = await acceptProposal(user, params.docId, input, clientIp(req.headers), req.headers.get("user-agent"));
    return json(r, 201);
  },
  { permission: "proposals:accept" },
);
