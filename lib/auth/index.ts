import NextAuth, { CredentialsSignin } from "next-auth";
import { decode } from "next-auth/jwt";
import { cookies } from "next/headers";
import { z } from "zod";
import Credentials from "next-auth/providers/credentials";
import { getDb } from "@/db";
import type { RoleName } from "@/lib/authz/permissions";
import { signInSchema, verifyCredentials } from "./credentials";
import { clientIp } from "./ip";
import { TOKEN_PATTERN, verifySignInToken } from "./tokens";

declare module "next-auth" {
  interface User {
    role?: RoleName;
    companyId?: string;
  }
  interface Session {
    user: { id: string; role: RoleName; companyId: string; name: string; email: string };
  }
}

class RateLimited extends CredentialsSignin {
  code = "rate_limited";
}

const tokenSchema = z.object({ token: z.string().regex(TOKEN_PATTERN) });

const isProd = process.env.NODE_ENV === "production";
const useSecureCookies = isProd && (process.env.AUTH_URL ?? "").startsWith("https://");
/** next-auth's session cookie name; it is also the salt its JWE key is derived with. */
export const SESSION_COOKIE = `${useSecureCookies ? "__Secure-" : ""}authjs.session-token`;

export const { handlers, auth, signIn, signOut } = NextAuth({
  trustHost: true,
  session: { strategy: "jwt", maxAge: 12 * 60 * 60 },
  pages: { signIn: "/sign-in" },
  // HttpOnly + SameSite=Lax are next-auth's defaults; Secure (and the __Secure- prefix) whenever served over HTTPS.
  useSecureCookies,
  providers: [
    Credentials({
      credentials: { email: {}, password: {} },
      // The only way a password becomes a session; the limiter and the activity log sit inside it,
      // so posting to the callback URL directly is throttled the same as the sign-in form.
      async authorize(raw, request) {
        const parsed = signInSchema.safeParse(raw);
        if (!parsed.success) return null;
        const result = await verifyCredentials(getDb(), { ...parsed.data, ip: clientIp(request.headers) });
        if (!result.ok) {
          if (result.reason === "locked") throw new RateLimited();
          return null;
        }
        const { id, name, email, role, companyId } = result.user;
        return { id, name, email, role, companyId };
      },
    }),
    // E-mailed one-time sign-in links (/welcome/link/<token>): the token is checked and used up here,
    // so a link works once whether it arrives through the welcome page or a direct post.
    Credentials({
      id: "token",
      name: "One-time link",
      credentials: { token: {} },
      async authorize(raw, request) {
        const parsed = tokenSchema.safeParse(raw);
        if (!parsed.success) return null;
        const user = await verifySignInToken(getDb(), parsed.data.token, clientIp(request.headers));
        if (!user) return null;
        const { id, name, email, role, companyId } = user;
        return { id, name, email, role, companyId };
      },
    }),
  ],
  callbacks: {
    jwt({ token, user }) {
      if (user) {
        token.uid = user.id;
        token.role = user.role;
        token.companyId = user.companyId;
      }
      return token;
    },
    session({ session, token }) {
      session.user.id = token.uid as string;
      session.user.role = token.role as RoleName;
      session.user.companyId = token.companyId as string;
      return session;
    },
  },
  logger: {
    // next-auth prints a stack for every failed sign-in; those are expected and already in the activity log.
    error(error) {
      const type = (error as { type?: string }).type;
      if (type === "CredentialsSignin") return;
      console.error(error);
    },
  },
});

// Decoded session cookies, keyed by the cookie's value. A JWE cannot be altered without failing
// to decrypt, so a value that decoded once decodes to the same claims until it expires; caching
// it saves the key derivation and decryption (and the fresh token `auth()` encodes and throws
// away) on every request. Only the user id is kept: the guard reads the user row every time.
const decoded = new Map<string, { uid: string; exp: number }>();
const DECODED_MAX = 5_000;

/**
 * The signed-in user's id from the session cookie, or null. What `auth()` would say for this
 * request, without its per-request cryptography. The guard (lib/authz/guard.ts) is its only caller.
 */
export async function sessionUserId(): Promise<string | null> {
  const jar = await cookies();
  const token = jar.get(SESSION_COOKIE)?.value;
  const secret = process.env.AUTH_SECRET ?? process.env.NEXTAUTH_SECRET;
  // A chunked cookie (name.0, name.1…) or an unusual set-up: let next-auth read it.
  if (!token || !secret) return token || jar.has(`${SESSION_COOKIE}.0`) ? ((await auth())?.user?.id ?? null) : null;
  const now = Date.now() / 1000;
  const hit = decoded.get(token);
  if (hit) {
    if (hit.exp > now) return hit.uid;
    decoded.delete(token);
    return null;
  }
  let claims: { uid?: unknown; exp?: unknown } | null;
  try {
    claims = await decode({ token, secret, salt: SESSION_COOKIE });
  } catch {
    return null; // not ours, tampered with, or made with another secret
  }
  const uid = typeof claims?.uid === "string" ? claims.uid : null;
  const exp = typeof claims?.exp === "number" ? claims.exp : 0;
  if (!uid || exp <= now) return null;
  if (decoded.size >= DECODED_MAX) decoded.delete(decoded.keys().next().value!);
  decoded.set(token, { uid, exp });
  return uid;
}
