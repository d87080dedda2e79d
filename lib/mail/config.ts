// SMTP settings from the environment. With nothing set, mail goes to the local catcher on
// 127.0.0.1:2525 (scripts/mail-catcher.mjs): nothing leaves the machine unless SMTP_HOST is set.
export const DEFAULT_SMTP_HOST = "127.0.0.1";
export const DEFAULT_SMTP_PORT = 2525;
export const DEFAULT_MAIL_FROM = "Warmstead <no-reply@warmstead.localhost>";

export type MailConfig = { host: string; port: number; secure: boolean; user?: string; pass?: string; from: string };

export function mailConfig(env: Record<string, string | undefined> = process.env): MailConfig {
  const port = Number(env.SMTP_PORT);
  return {
    host: env.SMTP_HOST?.trim() || DEFAULT_SMTP_HOST,
    port: Number.isInteger(port) && port > 0 && port < 65536 ? port : DEFAULT_SMTP_PORT,
    secure: ["1", "true", "yes"].includes((env.SMTP_SECURE ?? "").trim().toLowerCase()),
    user: env.SMTP_USER?.trim() || undefined,
    pass: env.SMTP_PASS || undefined,
    from: env.MAIL_FROM?.trim() || DEFAULT_MAIL_FROM,
  };
}

export const isLoopback = (host: string) => host === "localhost" || host === "::1" || /^127\./.test(host);
