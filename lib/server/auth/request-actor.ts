import "server-only";
import { auth } from "@/auth";
import { Unauthorized } from "@/lib/errors";
import { hasSessionCookie } from "@/lib/session-cookies";
import type { Actor } from "@/lib/server/actor";
import { loadActor } from "./load-actor";
import { actorFromApiToken } from "./token-actor";

/** Bearer token first (integrations), then the session cookie (the web app). */
export async function requestActor(request: Request): Promise<Actor | null> {
  const header = request.headers.get("authorization");
  if (header) {
    const match = /^Bearer\s+(\S+)$/i.exec(header);
    return match?.[1] ? actorFromApiToken(match[1]) : null;
  }
  // No session cookie, no session: skip Auth.js entirely (cheaper, and safe outside a request scope).
  return hasSessionCookie(request.headers.get("cookie")) ? sessionActor() : null;
}

export async function requireRequestActor(request: Request): Promise<Actor> {
  const actor = await requestActor(request);
  if (!actor) throw new Unauthorized();
  return actor;
}

/** The signed-in person in pages and server actions. */
export async function sessionActor(): Promise<Actor | null> {
  const session = await auth();
  const userId = session?.user?.id;
  return userId ? loadActor(userId) : null;
}
