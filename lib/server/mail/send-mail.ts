import "server-only";
import { render, toPlainText } from "@react-email/render";
import type { ReactElement } from "react";
import { env } from "@/lib/env";
import { mailTransport } from "./transport";

export interface MailMessage {
  to: string;
  subject: string;
  body: ReactElement;
  headers?: Record<string, string>;
}

/**
 * Renders a React e-mail to HTML (once) and derives the plain-text part from that HTML, then sends
 * both over SMTP.
 */
export async function sendMail(message: MailMessage): Promise<void> {
  const html = await render(message.body);
  const text = toPlainText(html);
  await mailTransport().sendMail({
    from: env().MAIL_FROM,
    to: message.to,
    subject: message.subject,
    html,
    text,
    headers: message.headers,
  });
}

/** An absolute link into the app, for e-mails. */
export function appLink(path: string): string {
  return new URL(path, env().APP_URL).toString();
}
