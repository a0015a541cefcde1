import "server-only";
import { render } from "@react-email/render";
import type { ReactElement } from "react";
import { env } from "@/lib/env";
import { mailTransport } from "./transport";

export interface MailMessage {
  to: string;
  subject: string;
  body: ReactElement;
  headers?: Record<string, string>;
}

/** Renders a React e-mail to HTML and plain text and sends it over SMTP. */
export async function sendMail(message: MailMessage): Promise<void> {
  const [html, text] = await Promise.all([render(message.body), render(message.body, { plainText: true })]);
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
