import "server-only";
import { redirect } from "next/navigation";
import { homeFor } from "@/lib/navigation";
import { isStaff } from "@/lib/permissions";
import type { Actor } from "@/lib/server/actor";
import { sessionActor } from "./request-actor";

/** The signed-in actor for a page, or a redirect: to sign-in when signed out, home when the area is not theirs. */
export async function requirePageActor(area: "any" | "staff" | "athlete" = "any"): Promise<Actor> {
  const actor = await sessionActor();
  if (!actor) redirect("/sign-in");
  if (area === "staff" && !isStaff(actor.role)) redirect(homeFor(actor.role));
  if (area === "athlete" && actor.role !== "athlete") redirect(homeFor(actor.role));
  return actor;
}
