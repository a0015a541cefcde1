import type { OpenAPIRegistry } from "@asteasolutions/zod-to-openapi";
import { z } from "zod";
import { ZBacktestRequest, ZBacktestResult } from "@/lib/validation/backtest";
import { ZPositionVerdict } from "@/lib/validation/position-verdict";
import { ZForecast, ZPromotion, ZPromotionListQuery } from "@/lib/validation/promotions";
import { defineOperation, pageOf, zIdParam } from "../define";

const zPositionParams = z.object({ id: z.uuid(), ladderId: z.uuid() });

/** Promotions, approvals, the what-if replay, verdicts and forecasts of positions. */
export function registerPromotionPaths(registry: OpenAPIRegistry): void {
  defineOperation(registry, {
    method: "get",
    path: "/api/v1/promotions",
    tag: "Promotions",
    summary: "Promotions and proposals, newest first (athletes see their own)",
    query: ZPromotionListQuery,
    ok: { status: 200, schema: pageOf(ZPromotion) },
  });
  defineOperation(registry, {
    method: "post",
    path: "/api/v1/promotions/{id}/approve",
    tag: "Promotions",
    summary: "Approve a pending proposal: the athlete moves (or achieves the skill) if still on the rung it was made for",
    params: zIdParam,
    ok: { status: 200, schema: ZPromotion },
    errors: [404, 409],
  });
  defineOperation(registry, {
    method: "post",
    path: "/api/v1/promotions/{id}/decline",
    tag: "Promotions",
    summary: "Decline a pending proposal: the athlete stays; the same move is proposed again only after a new session",
    params: zIdParam,
    ok: { status: 200, schema: ZPromotion },
    errors: [404, 409],
  });
  defineOperation(registry, {
    method: "post",
    path: "/api/v1/ladders/{id}/backtest",
    tag: "Ladders",
    summary: "What if a rung had this standard? Replays the stored sessions of every athlete who has been on it",
    params: zIdParam,
    body: ZBacktestRequest,
    ok: { status: 200, schema: ZBacktestResult },
    errors: [404],
  });
  defineOperation(registry, {
    method: "get",
    path: "/api/v1/athletes/{id}/positions/{ladderId}/forecast",
    tag: "Readiness",
    summary: "An estimated date the current rung's value is reached if the trend holds (an estimate, never a promise)",
    params: zPositionParams,
    ok: { status: 200, schema: ZForecast },
    errors: [404],
  });
  defineOperation(registry, {
    method: "get",
    path: "/api/v1/athletes/{id}/positions/{ladderId}/verdict",
    tag: "Readiness",
    summary: "The live verdict of an athlete's position, evaluated now and explained",
    params: zPositionParams,
    ok: { status: 200, schema: ZPositionVerdict },
    errors: [404],
  });
}
