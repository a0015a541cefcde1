import "server-only";
import { auth } from "@/auth";
import { Unauthorized } from "@/lib/errors";
import { hasSessionCookie } from "@/lib/session-cookies";
import type { Actor } from "@/lib/server/actor";
import { loadActor } from "./load-actor";
import { actorFromApiToken, recentTokenActor } from "./token-actor";

function bearerToken(request: Request): string | null {
  const match = /^Bearer\s+(\S+)$/i.exec(request.headers.get("authorization") ?? "");
  return match?.[1] ?? null;
}

/** Bearer token first (integrations), then the session cookie (the web app). */
export async function requestActor(request: Request): Promise<Actor | null> {
  if (request.headers.get("authorization")) {
    const token = bearerToken(request);
    return token ? actorFromApiToken(token) : null;
  }
  // No session cookie, no session: skip Auth.js entirely (cheaper, and safe outside a request scope).
  return hasSessionCookie(request.headers.get("cookie")) ? sessionActor() : null;
}

/**
 * The actor of a Bearer token this process resolved within the last minute, unconfirmed: only for
 * an operation that confirms it in its own transaction before writing (withIdempotency does).
 */
export function recentRequestActor(request: Request): Actor | null {
  const token = bearerToken(request);
  return token ? recentTokenActor(token) : null;
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
