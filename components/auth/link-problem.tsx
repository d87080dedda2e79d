import Link from "next/link";
import type { LinkState } from "@/lib/data/invites";

type Problem = Exclude<LinkState["status"], "valid">;

const copy: Record<"invite" | "sign-in", Record<Problem, [string, string]>> = {
  invite: {
    unknown: ["This invitation link is not valid", "It may have been cut short when it was copied. Open it straight from the e-mail, or ask your contractor to send a new invitation."],
    expired: ["This invitation has expired", "Invitation links work for 7 days. Ask your contractor to send a new one, or, if you already set a password, sign in with it."],
    used: ["This invitation has already been used", "A password was set with it, or a newer invitation replaced it. Sign in with your password, or have a sign-in link e-mailed to you."],
    disabled: ["This account is not active", "Please contact your contractor."],
  },
  "sign-in": {
    unknown: ["This sign-in link is not valid", "It may have been cut short when it was copied. Open it straight from the e-mail, or ask for a new one."],
    expired: ["This sign-in link has expired", "Sign-in links work for 15 minutes. Ask for a new one; it takes a moment."],
    used: ["This sign-in link has already been used", "Each link works once, and a newer one replaces it. Ask for a new one, or sign in with your password."],
    disabled: ["This account is not active", "Please contact your contractor."],
  },
};

export function LinkProblem({ status, purpose }: { status: Problem; purpose: "invite" | "sign-in" }) {
  const [title, body] = copy[purpose][status];
  return (
    <div className="card mt-6" data-testid="link-problem" data-status={status}>
      <h1 className="text-2xl font-bold text-spruce-900">{title}</h1>
      <p className="mt-2 text-ink-muted">{body}</p>
      <div className="mt-5 flex flex-wrap gap-3">
        <Link href="/sign-in/link" className="btn-primary">E-mail me a sign-in link</Link>
        <Link href="/sign-in" className="btn-ghost">Sign in with a password</Link>
      </div>
    </div>
  );
}
