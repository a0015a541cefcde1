import "server-only";
import { and, eq } from "drizzle-orm";
import { alias } from "drizzle-orm/pg-core";
import { db } from "@/db/client";
import { athletes, ladders, promotions, rungs, usedMailLinks } from "@/db/schema";
import { Conflict } from "@/lib/errors";
import { loadActor } from "@/lib/server/auth/load-actor";
import { appLink } from "@/lib/server/mail/send-mail";
import { signLink, verifyLink } from "@/lib/server/mail/signed-link";
import { approvePromotion } from "@/lib/server/promotions/approve-promotion";

export const APPROVAL_LINK_DAYS = 7;

/** A signed, single-use, 7-day link for one coach to approve one promotion. */
export function approvalLink(promotionId: string, coachUserId: string, now = new Date()): string {
  return appLink(`/approve/${signLink("approve", `${promotionId}|${coachUserId}`, APPROVAL_LINK_DAYS * 24 * 3600, now)}`);
}

function readToken(token: string) {
  const claims = verifyLink(token, "approve");
  if (!claims) return null;
  const [promotionId, userId] = claims.subject.split("|");
  if (!promotionId || !userId) return null;
  return { promotionId, userId, nonce: claims.nonce };
}

const toRung = alias(rungs, "to_rung");
const fromRung = alias(rungs, "from_rung");

export type ApprovalLinkState =
  | { state: "invalid" }
  | { state: "used" }
  | {
      state: "ready";
      athleteName: string;
      ladderName: string;
      fromRungName: string;
      toRungName: string | null;
      direction: "up" | "down";
    };

/** What the confirm page shows for a link (GET changes nothing: mail scanners follow links). */
export async function approvalLinkState(token: string): Promise<ApprovalLinkState> {
  const parsed = readToken(token);
  if (!parsed) return { state: "invalid" };
  const actor = await loadActor(parsed.userId);
  if (!actor || actor.role === "athlete") return { state: "invalid" };
  const [used] = await db.select({ nonce: usedMailLinks.nonce }).from(usedMailLinks).where(eq(usedMailLinks.nonce, parsed.nonce));
  if (used) return { state: "used" };
  const [row] = await db
    .select({
      status: promotions.status,
      direction: promotions.direction,
      athleteName: athletes.name,
      ladderName: ladders.name,
      fromRungName: fromRung.name,
      toRungName: toRung.name,
    })
    .from(promotions)
    .innerJoin(athletes, eq(athletes.id, promotions.athleteId))
    .innerJoin(ladders, eq(ladders.id, promotions.ladderId))
    .innerJoin(fromRung, eq(fromRung.id, promotions.fromRungId))
    .leftJoin(toRung, eq(toRung.id, promotions.toRungId))
    .where(and(eq(promotions.id, parsed.promotionId), eq(promotions.teamId, actor.teamId)));
  if (!row) return { state: "invalid" };
  if (row.status !== "pending") return { state: "used" };
  const { status: _status, ...rest } = row;
  return { state: "ready", ...rest };
}

/**
 * The POST behind the confirm page: approves through the promotions domain's approve operation as
 * the coach the link was made for, then burns the link. "used" when it was used (or decided) already.
 */
export async function approveByLink(token: string): Promise<"approved" | "used" | "invalid"> {
  const parsed = readToken(token);
  if (!parsed) return "invalid";
  const actor = await loadActor(parsed.userId);
  if (!actor || actor.role === "athlete") return "invalid";
  const [used] = await db.select({ nonce: usedMailLinks.nonce }).from(usedMailLinks).where(eq(usedMailLinks.nonce, parsed.nonce));
  if (used) return "used";
  let outcome: "approved" | "used" = "approved";
  try {
    await approvePromotion(actor, parsed.promotionId);
  } catch (error) {
    if (!(error instanceof Conflict)) throw error;
    outcome = "used";
  }
  const burned = await db.insert(usedMailLinks).values({ nonce: parsed.nonce }).onConflictDoNothing().returning();
  return burned.length === 0 ? "used" : outcome;
}
