// The address put in e-mailed links: APP_URL when set (it should be, in production), else the
// origin the request came to.
let warned = false;

export function appOrigin(headers: Headers, env: Record<string, string | undefined> = process.env): string {
  const configured = (env.APP_URL || env.AUTH_URL)?.trim().replace(/\/+$/, "");
  if (configured) return new URL(configured).origin;
  if (env.NODE_ENV === "production" && !warned) {
    warned = true;
    console.warn("APP_URL is not set: e-mailed links use the Host header of the request. Set APP_URL to the public address.");
  }
  const host = headers.get("x-forwarded-host") ?? headers.get("host") ?? "localhost:3000";
  const proto = headers.get("x-forwarded-proto")?.split(",")[0]?.trim() ?? "http"; // next start itself serves only http
  return `${proto}://${host}`;
}
