/** Auth.js session cookie names (the secure variant on https; large sessions are chunked as `.0`, `.1`…). */
export const SESSION_COOKIES = ["authjs.session-token", "__Secure-authjs.session-token"] as const;

/** Whether a Cookie header carries a session cookie (presence only; Auth.js verifies it). */
export function hasSessionCookie(cookieHeader: string | null): boolean {
  const names = (cookieHeader ?? "").split(";").map((part) => part.split("=")[0]!.trim());
  return SESSION_COOKIES.some((name) => names.includes(name) || names.includes(`${name}.0`));
}
