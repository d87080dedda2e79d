import { parseWith } from "@/lib/api/errors";
import { json, readJson } from "@/lib/api/respond";
import { withAuth } from "@/lib/authz/guard";
import { inviteHomeowner } from "@/lib/data/invites";
import { appOrigin } from "@/lib/mail";
import { inviteBodySchema } from "@/lib/validation/invite";

/**
 * Invites the job's homeowner: creates their account if the client has none and e-mails a
 * set-password link. Body (optional): `{ email }`, used when the client record has no address.
 * 201 with `{ invite }`; the mail's status is in `invite.mail` (a failed send is retried).
 */
export const POST = withAuth<{ id: string }>(
  async (req, { user, params }) => {
    const hasBody = req.headers.get("content-length") !== "0" && (req.headers.get("content-type") ?? "") !== "";
    const body = parseWith(inviteBodySchema, hasBody ? await readJson(req) : {});
    const invite = await inviteHomeowner(user, params.id, body, appOrigin(req.headers));
    return json({ invite }, 201);
  },
  { permission: "clients:invite" },
);
