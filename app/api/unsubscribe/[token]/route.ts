import { NextResponse, type NextRequest } from "next/server";
import { unsubscribe } from "@/lib/server/notifications/unsubscribe";

/** RFC 8058 one-click unsubscribe (the List-Unsubscribe header's target): POST turns the mail off. */
export async function POST(_request: NextRequest, context: { params: Promise<{ token: string }> }) {
  const { token } = await context.params;
  const done = await unsubscribe(token);
  return done ? new NextResponse(null, { status: 204 }) : NextResponse.json({ error: { code: "not_found", message: "This link is not valid." } }, { status: 404 });
}

/** A person opening the header's link in a browser gets the confirm page (GET never changes anything). */
export async function GET(request: NextRequest, context: { params: Promise<{ token: string }> }) {
  const { token } = await context.params;
  return NextResponse.redirect(new URL(`/unsubscribe/${encodeURIComponent(token)}`, request.nextUrl.origin), 303);
}
