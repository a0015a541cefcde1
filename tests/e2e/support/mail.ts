// Reads the invite and reset e-mails back from the mail catcher that `npm test` started.
export async function waitForLink(to: string, pathPart: string, timeoutMs = 15_000): Promise<string> {
  const api = (process.env.MAIL_UI_URL ?? "http://127.0.0.1:1080").replace(/\/$/, "");
  const deadline = Date.now() + timeoutMs;
  while (Date.now() < deadline) {
    const mails = (await (await fetch(`${api}/email`)).json()) as { to: { address: string }[]; text: string }[];
    const mail = mails.reverse().find((m) => m.to.some((t) => t.address.toLowerCase() === to.toLowerCase()));
    const link = mail ? new RegExp(`https?://[^\\s"'<>]*${pathPart}[^\\s"'<>]*`).exec(mail.text)?.[0] : undefined;
    if (link) return link;
    await new Promise((resolve) => setTimeout(resolve, 250));
  }
  throw new Error(`no ${pathPart} e-mail to ${to}`);
}

export function uniqueEmail(label: string): string {
  return `${label}-${Date.now().toString(36)}${Math.random().toString(36).slice(2, 6)}@example.test`;
}
