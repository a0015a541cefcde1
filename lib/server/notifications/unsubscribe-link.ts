import "server-only";
import { appLink } from "@/lib/server/mail/send-mail";
import { signLink, verifyLink } from "@/lib/server/mail/signed-link";
import { OPTIONAL_MAIL_KINDS, type OptionalMailKind } from "@/lib/validation/notifications";

const YEAR_SECONDS = 365 * 24 * 3600;

export interface UnsubscribeTarget {
  email: string;
  kind: OptionalMailKind;
  teamId: string;
}

/** The signed page link (GET shows a confirm page) and the one-click POST endpoint for mail headers. */
export function unsubscribeLinks(target: UnsubscribeTarget) {
  const token = signLink("unsubscribe", `${target.email.toLowerCase()}|${target.kind}|${target.teamId}`, YEAR_SECONDS);
  const page = appLink(`/unsubscribe/${token}`);
  const oneClick = appLink(`/api/unsubscribe/${token}`);
  return {
    page,
    headers: { "List-Unsubscribe": `<${oneClick}>`, "List-Unsubscribe-Post": "List-Unsubscribe=One-Click" },
  };
}

export function readUnsubscribeToken(token: string): UnsubscribeTarget | null {
  const claims = verifyLink(token, "unsubscribe");
  if (!claims) return null;
  const [email, kind, teamId] = claims.subject.split("|");
  if (!email || !teamId || !(OPTIONAL_MAIL_KINDS as readonly string[]).includes(kind ?? "")) return null;
  return { email, kind: kind as OptionalMailKind, teamId };
}
