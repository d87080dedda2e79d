import type { Metadata } from "next";
import Link from "next/link";
import { AuthShell } from "@/components/auth/auth-shell";
import { SignInLinkForm } from "@/components/auth/sign-in-link-form";

export const metadata: Metadata = { title: "E-mail me a sign-in link" };

export default function SignInLinkPage() {
  return (
    <AuthShell>
      <div className="card mt-6">
        <h1 className="text-2xl font-bold text-spruce-900">E-mail me a sign-in link</h1>
        <p className="mt-1 text-ink-muted">For homeowners: no password needed. We send a link that signs you in once, within 15 minutes.</p>
        <SignInLinkForm />
        <p className="mt-5 text-sm">
          <Link href="/sign-in" className="font-semibold text-spruce-700 underline">Sign in with a password instead</Link>
        </p>
      </div>
    </AuthShell>
  );
}
