import type { Metadata } from "next";
import { AuthShell } from "@/components/auth/auth-shell";
import { LinkProblem } from "@/components/auth/link-problem";
import { LinkSignInForm } from "@/components/auth/link-sign-in-form";
import { linkState } from "@/lib/data/invites";

export const metadata: Metadata = { title: "Sign in", robots: { index: false, follow: false } };

export default async function LinkSignInPage({ params }: { params: Promise<{ token: string }> }) {
  const { token } = await params;
  const state = await linkState(token, "sign-in");
  if (state.status !== "valid") return <AuthShell><LinkProblem status={state.status} purpose="sign-in" /></AuthShell>;
  return (
    <AuthShell>
      <div className="card mt-6">
        <h1 className="text-2xl font-bold text-spruce-900">Sign in, {state.name.split(" ")[0]}</h1>
        <p className="mt-1 text-ink-muted">
          You asked for a sign-in link for <span className="font-semibold text-charcoal">{state.email}</span> ({state.companyName}). It works once.
        </p>
        <LinkSignInForm token={token} />
      </div>
    </AuthShell>
  );
}
