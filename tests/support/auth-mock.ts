// Stands in for `@/lib/auth` in integration tests: `actAs(userId)` decides whose session the
// guard sees. Everything after the session (the user row, disabled flag, role, scope) is real.
import { vi } from "vitest";

let currentUserId: string | null = null;

export function actAs(userId: string | null) {
  currentUserId = userId;
}

export const auth = vi.fn(async () => (currentUserId ? { user: { id: currentUserId }, expires: new Date(Date.now() + 3600_000).toISOString() } : null));
export const sessionUserId = vi.fn(async () => currentUserId);
export const SESSION_COOKIE = "authjs.session-token";
export const signIn = vi.fn();
export const signOut = vi.fn();
export const handlers = { GET: vi.fn(), POST: vi.fn() };
