import type { Metadata } from "next";
import Link from "next/link";
import { redirect } from "next/navigation";
import { Wordmark } from "@/components/brand/logo";
import { SignInForm } from "@/components/auth/sign-in-form";
import { getSessionUser } from "@/lib/authz/guard";

export const metadata: Metadata = { title: "Sign in" };

export default async function SignInPage({ searchParams }: { searchParams: Promise<{ next?: string }> }) {
  const user = await getSessionUser();
  if (user) redirect(user.role === "homeowner" ? "/portal" : "/jobs");
  const { next } = await searchParams;
  return (
    <main className="mx-auto flex min-h-screen max-w-md flex-col justify-center px-5 py-10">
      <Wordmark />
      <div className="card mt-6">
        <h1 className="text-2xl font-bold text-spruce-900">Sign in</h1>
        <p className="mt-1 text-ink-muted">Staff and homeowners use the same page.</p>
        <SignInForm next={next} />
        <p className="mt-5 border-t border-line pt-4 text-sm text-ink-muted">
          Homeowner without a password, or forgot it?{" "}
          <Link href="/sign-in/link" className="font-semibold text-spruce-700 underline">E-mail me a sign-in link</Link>
        </p>
      </div>
    </main>
  );
}
