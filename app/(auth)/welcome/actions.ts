"use server";

import { AuthError } from "next-auth";
import { headers } from "next/headers";
import { redirect } from "next/navigation";
import { fieldErrorsFrom } from "@/lib/api/errors";
import { signIn } from "@/lib/auth";
import { clientIp } from "@/lib/auth/ip";
import type { ActionState } from "@/lib/authz/actions";
import { acceptInvite, linkState } from "@/lib/data/invites";
import { LINK_GONE, linkSignInSchema, newPasswordSchema } from "@/lib/validation/invite";

// Public actions (there is no session yet): the one-time token in the form is the authority.

export async function setPasswordAction(_prev: ActionState, formData: FormData): Promise<ActionState> {
  const parsed = newPasswordSchema.safeParse({ token: formData.get("token"), password: formData.get("password"), confirm: formData.get("confirm") });
  // Passwords are never sent back into the form.
  if (!parsed.success) return { ok: false, message: "Some fields need attention.", fields: fieldErrorsFrom(parsed.error), values: {} };
  const account = await acceptInvite(parsed.data.token, parsed.data.password, clientIp(await headers()));
  if (!account) return { ok: false, message: LINK_GONE, values: {} };
  try {
    await signIn("credentials", { email: account.email, password: parsed.data.password, redirect: false });
  } catch (err) {
    if (err instanceof AuthError) return { ok: true, message: "Your password is set. Sign in with it on the sign-in page." };
    throw err;
  }
  redirect(account.role === "homeowner" ? "/portal" : "/jobs");
}

export async function linkSignInAction(_prev: ActionState, formData: FormData): Promise<ActionState> {
  const parsed = linkSignInSchema.safeParse({ token: formData.get("token") });
  if (!parsed.success) return { ok: false, message: LINK_GONE };
  // A plain answer for a dead link; the "token" provider checks again and uses the link up.
  if ((await linkState(parsed.data.token, "sign-in")).status !== "valid") return { ok: false, message: LINK_GONE };
  try {
    await signIn("token", { token: parsed.data.token, redirect: false });
  } catch (err) {
    if (err instanceof AuthError) return { ok: false, message: LINK_GONE };
    throw err;
  }
  redirect("/portal");
}
