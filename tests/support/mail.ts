// Reads messages back from the local SMTP catcher's HTTP API (maildev: GET /email).
export interface CaughtMail {
  id: string;
  subject: string;
  text: string;
  html: string;
  to: { address: string }[];
  headers: Record<string, string>;
}

function mailApi(): string {
  const url = process.env.MAIL_UI_URL;
  if (!url) throw new Error("MAIL_UI_URL is not set; run the tests with `npm test`.");
  return url.replace(/\/$/, "");
}

export async function mailTo(address: string): Promise<CaughtMail[]> {
  const response = await fetch(`${mailApi()}/email`);
  const all = (await response.json()) as CaughtMail[];
  return all.filter((mail) => mail.to.some((to) => to.address.toLowerCase() === address.toLowerCase()));
}

/** Waits until `count` messages to `address` have arrived (and returns them). */
export async function waitForMail(address: string, count = 1, timeoutMs = 10_000): Promise<CaughtMail[]> {
  const deadline = Date.now() + timeoutMs;
  for (;;) {
    const mails = await mailTo(address);
    if (mails.length >= count || Date.now() > deadline) return mails;
    await new Promise((resolve) => setTimeout(resolve, 200));
  }
}

export function firstLink(mail: CaughtMail, pathPart: string): string {
  const match = new RegExp(`https?://[^\\s"'<>]*${pathPart}[^\\s"'<>]*`).exec(mail.text);
  if (!match) throw new Error(`no ${pathPart} link in mail "${mail.subject}"`);
  return match[0];
}
