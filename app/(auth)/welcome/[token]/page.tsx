import type { Metadata } from "next";
import { AuthShell } from "@/components/auth/auth-shell";
import { LinkProblem } from "@/components/auth/link-problem";
import { SetPasswordForm } from "@/components/auth/set-password-form";
import { linkState } from "@/lib/data/invites";
import { ensureMailRetryLoop } from "@/lib/mail";

export const metadata: Metadata = { title: "Welcome", robots: { index: false, follow: false } };

export default async function WelcomePage({ params }: { params: Promise<{ token: string }> }) {
  ensureMailRetryLoop();
  const { token } = await params;
  const state = await linkState(token, "invite");
  if (state.status !== "valid") return <AuthShell><LinkProblem status={state.status} purpose="invite" /></AuthShell>;
  return (
    <AuthShell>
      <div className="card mt-6">
        <h1 className="text-2xl font-bold text-spruce-900">Welcome, {state.name.split(" ")[0]}</h1>
        <p className="mt-1 text-ink-muted">
          {state.companyName} has set up a Warmstead account for you, so you can read your home&rsquo;s savings report and proposal. Choose a password for <span className="font-semibold text-charcoal">{state.email}</span>.
        </p>
        <SetPasswordForm token={token} email={state.email} />
      </div>
    </AuthShell>
  );
}
