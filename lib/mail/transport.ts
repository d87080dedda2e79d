import nodemailer, { type Transporter } from "nodemailer";
import { isLoopback, mailConfig, type MailConfig } from "./config";

// One transport per process, created on first send and replaced when the settings change
// (tests point it at catchers on different ports).
const holder = globalThis as typeof globalThis & { __warmsteadMail?: { key: string; transport: Transporter } };

export function createTransport(config: MailConfig): Transporter {
  return nodemailer.createTransport({
    host: config.host,
    port: config.port,
    secure: config.secure,
    auth: config.user ? { user: config.user, pass: config.pass ?? "" } : undefined,
    // The local catcher speaks plain SMTP; a real server upgrades with STARTTLS when it offers it.
    ignoreTLS: isLoopback(config.host) && !config.secure,
    connectionTimeout: 10_000,
    greetingTimeout: 10_000,
    socketTimeout: 30_000,
  });
}

export function getTransport(): { transport: Transporter; from: string } {
  const config = mailConfig();
  const key = JSON.stringify(config);
  if (holder.__warmsteadMail?.key !== key) {
    holder.__warmsteadMail?.transport.close();
    holder.__warmsteadMail = { key, transport: createTransport(config) };
  }
  return { transport: holder.__warmsteadMail.transport, from: config.from };
}
