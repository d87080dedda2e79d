"use server";

import { eq } from "drizzle-orm";
import { AuthError } from "next-auth";
import { headers } from "next/headers";
import { redirect } from "next/navigation";
import { getDb } from "@/db";
import { users } from "@/db/schema";
import { fieldErrorsFrom } from "@/lib/api/errors";
import { signIn, signOut } from "@/lib/auth";
import { lockedMessage, SIGN_IN_INVALID, signInSchema } from "@/lib/auth/credentials";
import { clientIp } from "@/lib/auth/ip";
import { retryAfterSeconds } from "@/lib/auth/limiter";
import type { ActionState } from "@/lib/authz/actions";
import { requestSignInLink } from "@/lib/data/invites";
import { appOrigin } from "@/lib/mail";
import { SIGN_IN_LINK_SENT, signInLinkRequestSchema } from "@/lib/validation/invite";

/** Only same-site relative paths are followed after sign-in. */
function safeNext(value: FormDataEntryValue | null): string | null {
  return typeof value === "string" && value.startsWith("/") && !value.startsWith("//") ? value : null;
}

// Signing in is the one public action: it cannot go through the guard, since there is no session yet.
export async function signInAction(_prev: ActionState, formData: FormData): Promise<ActionState> {
  const values = { email: String(formData.get("email") ?? "") };
  const parsed = signInSchema.safeParse({ email: formData.get("email"), password: formData.get("password") });
  if (!parsed.success) return { ok: false, fields: fieldErrorsFrom(parsed.error), values };

  const db = getDb();
  const email = parsed.data.email.toLowerCase();
  const ip = clientIp(await headers());
  const wait = await retryAfterSeconds(db, { email, ip });
  if (wait > 0) return { ok: false, message: lockedMessage(wait), values };

  try {
    await signIn("credentials", { email, password: parsed.data.password, redirect: false });
  } catch (err) {
    if (err instanceof AuthError) {
      const after = await retryAfterSeconds(db, { email, ip });
      return { ok: false, message: after > 0 ? lockedMessage(after) : SIGN_IN_INVALID, values };
    }
    throw err;
  }
  const [user] = await db.select({ role: users.role }).from(users).where(eq(users.email, email));
  const home = user?.role === "homeowner" ? "/portal" : "/jobs";
  redirect(safeNext(formData.get("next")) ?? home);
}

/** "E-mail me a sign-in link": the same answer whether or not the address has an account. */
export async function requestSignInLinkAction(_prev: ActionState, formData: FormData): Promise<ActionState> {
  const values = { email: String(formData.get("email") ?? "") };
  const parsed = signInLinkRequestSchema.safeParse({ email: formData.get("email") });
  if (!parsed.success) return { ok: false, fields: fieldErrorsFrom(parsed.error), values };
  const h = await headers();
  await requestSignInLink(parsed.data.email, appOrigin(h), clientIp(h));
  return { ok: true, message: SIGN_IN_LINK_SENT, values };
}

export async function signOutAction() {
  await signOut({ redirectTo: "/sign-in" });
}
