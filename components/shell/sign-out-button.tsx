import { signOutAction } from "@/app/(auth)/sign-in/actions";

export function SignOutButton() {
  return (
    <form action={signOutAction}>
      <button type="submit" className="inline-flex min-h-11 items-center rounded-md border border-spruce-200/60 px-3 font-semibold text-white hover:bg-spruce-800">
        Sign out
      </button>
    </form>
  );
}
