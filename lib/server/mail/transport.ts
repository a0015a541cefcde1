import "server-only";
import nodemailer, { type Transporter } from "nodemailer";
import { env } from "@/lib/env";

let transporter: Transporter | undefined;

/** One SMTP connection pool per process: the local catcher in development, a relay in production. */
export function mailTransport(): Transporter {
  if (transporter) return transporter;
  const config = env();
  transporter = nodemailer.createTransport({
    // Reuse a few SMTP connections instead of a handshake per message (the digest sends thousands).
    pool: true,
    maxConnections: 5,
    maxMessages: 500,
    host: config.SMTP_HOST,
    port: config.SMTP_PORT,
    secure: config.SMTP_SECURE,
    auth: config.SMTP_USER ? { user: config.SMTP_USER, pass: config.SMTP_PASSWORD ?? "" } : undefined,
    // The local catcher speaks plain SMTP; a relay negotiates STARTTLS on its own.
    ignoreTLS: !config.SMTP_SECURE && !config.SMTP_USER,
  });
  return transporter;
}
