import type { ReactNode } from "react";
import { Wordmark } from "@/components/brand/logo";

/** The narrow, centred frame of the public pages (sign-in, welcome links). */
export function AuthShell({ children }: { children: ReactNode }) {
  return (
    <main className="mx-auto flex min-h-screen max-w-md flex-col justify-center px-5 py-10">
      <Wordmark />
      {children}
    </main>
  );
}
