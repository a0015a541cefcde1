import "server-only";
import { db } from "@/db/client";
import { forecast, sessionBest } from "@/lib/engine";
import { NotFound } from "@/lib/errors";
import type { Actor } from "@/lib/server/actor";
import type { ForecastDto } from "@/lib/validation/promotions";
import { findVisiblePosition } from "./find-visible-position";
import { judgePosition } from "./judge-position";
import { loadPositionContext } from "./load-position-context";

/**
 * When might the athlete reach the value the current rung's standard asks per set? The
 * least-squares trend of their best value per session on the rung (lib/engine forecast): an
 * estimate if the trend holds, never a promise; "not trending up" when it does not rise.
 */
export async function forecastPosition(actor: Actor, athleteId: string, ladderId: string, asOf: Date = new Date()): Promise<ForecastDto> {
  const positionId = await findVisiblePosition(db, actor, athleteId, ladderId);
  const ctx = await loadPositionContext(db, { positionId, teamId: actor.teamId, asOf, history: "all" });
  if (!ctx) throw new NotFound("position");
  const { sessions, today } = judgePosition(ctx, asOf);
  const points: ForecastDto["points"] = [];
  for (const session of [...sessions].reverse()) {
    const best = sessionBest(ctx.rung.measure, session);
    if (best !== null) points.push({ date: session.date, best });
  }
  const result = forecast({ points, target: ctx.standard.minValue, asOfDate: today });
  return { ...result, target: ctx.standard.minValue, measure: ctx.rung.measure, points };
}
