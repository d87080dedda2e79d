"use server";

import { revalidatePath } from "next/cache";
import { headers } from "next/headers";
import { authedAction } from "@/lib/authz/actions";
import { inviteHomeowner } from "@/lib/data/invites";
import { appOrigin } from "@/lib/mail";
import { inviteFormSchema } from "@/lib/validation/invite";

/**
 * The job page's "Invite homeowner" button: a form with `jobId` (hidden) and, when the client has
 * no e-mail yet, `email`. Answers `{ ok, message }`, or field reasons under `fields.email`.
 */
export const inviteHomeownerAction = authedAction("clients:invite", inviteFormSchema, async ({ jobId, email }, user) => {
  const invite = await inviteHomeowner(user, jobId, { email }, appOrigin(await headers()));
  revalidatePath("/outbox");
  const message =
    invite.mail.status === "sent"
      ? `Invitation sent to ${invite.to}. The link works once, within 7 days.`
      : `Invitation saved, but the e-mail to ${invite.to} could not be sent yet. It is retried automatically; see the Outbox.`;
  return { ok: true, message };
});
