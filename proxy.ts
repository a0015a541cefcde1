import { NextResponse, type NextRequest } from "next/server";
import { hasSessionCookie } from "@/lib/session-cookies";

const PUBLIC = ["/", "/sign-in", "/sign-up", "/forgot-password"];
const PUBLIC_PREFIXES = ["/invite/", "/reset-password/", "/approve/", "/unsubscribe/"];

/**
 * Only a convenience redirect for signed-out visitors on pages. It never authorizes anything: every
 * page, handler and action checks identity and team in the data layer. API routes are skipped and
 * answer 401 JSON themselves.
 */
export function proxy(request: NextRequest) {
  const { pathname } = request.nextUrl;
  if (PUBLIC.includes(pathname) || PUBLIC_PREFIXES.some((p) => pathname.startsWith(p))) return NextResponse.next();
  if (hasSessionCookie(request.headers.get("cookie"))) return NextResponse.next();
  const url = new URL("/sign-in", request.url);
  return NextResponse.redirect(url);
}

export const config = {
  matcher: ["/((?!api/|_next/|icon.svg|favicon.ico|manifest.webmanifest|sw.js|.*\\.(?:png|svg|jpg|webp|woff2?)$).*)"],
};
