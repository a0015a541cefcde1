import { NextResponse, type NextRequest } from "next/server";
import { homeFor } from "@/lib/navigation";
import { sessionActor } from "@/lib/server/auth/request-actor";

/** Sends a signed-in person to their role's home (sign-in and invites land here). */
export async function GET(request: NextRequest) {
  const actor = await sessionActor();
  return NextResponse.redirect(new URL(actor ? homeFor(actor.role) : "/sign-in", request.url));
}
