// Approvals through the API: one click, exactly one decision, the right people, the right team.
// Standards are the design brief's hold default (common practice, no source).
import { eq } from "drizzle-orm";
import { describe, expect, it } from "vitest";
import { POST as approveRoute } from "@/app/api/v1/promotions/[id]/approve/route";
import { POST as declineRoute } from "@/app/api/v1/promotions/[id]/decline/route";
import { GET as listRoute } from "@/app/api/v1/promotions/route";
import { GET as verdictRoute } from "@/app/api/v1/athletes/[id]/positions/[ladderId]/verdict/route";
import { db } from "@/db/client";
import { athletePositions, positionMoves, promotions } from "@/db/schema";
import { bearerFor, createAthleteRecord, createMember, createTeam } from "../support/factories";
import { call } from "../support/http";
import { createTestLadder, daysAgo, logAndEvaluate, placeAthlete } from "../support/log-factories";

/** A team with an approve ladder and one athlete whose two good sessions created a pending proposal. */
async function pendingScenario(options: { athleteWithAccount?: boolean } = {}) {
  const team = await createTeam();
  const member = options.athleteWithAccount ? await createMember(team.teamId, "athlete", "Signed In Athlete") : null;
  const athleteId = member ? member.actor.athleteId! : await createAthleteRecord(team.teamId, "Record Athlete");
  const ladder = await createTestLadder(team.teamId, { mode: "approve", name: "Press" });
  const positionId = await placeAthlete(team.teamId, athleteId, ladder, ladder.rungIds[0]!, daysAgo(14));
  for (const n of [4, 2]) {
    await logAndEvaluate(team.owner, { teamId: team.teamId, athleteId, ladderId: ladder.ladderId, rungId: ladder.rungIds[0]!, date: daysAgo(n) });
  }
  const [pending] = await db.select().from(promotions).where(eq(promotions.positionId, positionId));
  return { ...team, member, athleteId, ladder, positionId, promotionId: pending!.id, token: await bearerFor(team.owner) };
}

async function positionOf(positionId: string) {
  const [row] = await db.select().from(athletePositions).where(eq(athletePositions.id, positionId));
  return row!;
}

describe("approvals", () => {
  it("lists the pending proposal with its explanation, and approving moves the athlete once", async () => {
    const s = await pendingScenario();
    const list = await call(listRoute, { token: s.token, path: "/api/v1/promotions?status=pending" });
    expect(list.status).toBe(200);
    expect(list.data.items).toEqual([
      expect.objectContaining({
        id: s.promotionId,
        athlete: { id: s.athleteId, name: "Record Athlete" },
        ladder: { id: s.ladder.ladderId, name: "Press" },
        fromRung: { id: s.ladder.rungIds[0], name: "Rung 1" },
        toRung: { id: s.ladder.rungIds[1], name: "Rung 2" },
        direction: "up",
        status: "pending",
        readiness: 100,
        effectiveOn: daysAgo(2),
        explanation: "Ready to move up: 2 of 3 sessions met, 14 days on this rung",
      }),
    ]);

    const approved = await call(approveRoute, { token: s.token, method: "POST", params: { id: s.promotionId } });
    expect(approved.status).toBe(200);
    expect(approved.data).toMatchObject({ status: "approved", decidedBy: "Test Owner" });
    expect(await positionOf(s.positionId)).toMatchObject({ rungId: s.ladder.rungIds[1], since: daysAgo(2), status: "not_yet" });
    const moves = await db.select().from(positionMoves).where(eq(positionMoves.promotionId, s.promotionId));
    expect(moves).toHaveLength(1);
    expect(moves[0]).toMatchObject({ cause: "approved", actorKind: "user", actorUserId: s.owner.userId, effectiveOn: daysAgo(2) });

    const again = await call(approveRoute, { token: s.token, method: "POST", params: { id: s.promotionId } });
    expect(again.status).toBe(409);
    expect((await call(declineRoute, { token: s.token, method: "POST", params: { id: s.promotionId } })).status).toBe(409);
    expect(await db.select().from(positionMoves).where(eq(positionMoves.promotionId, s.promotionId))).toHaveLength(1);
  });

  it("declining leaves the athlete where they are and is not proposed again without a new session", async () => {
    const s = await pendingScenario();
    const declined = await call(declineRoute, { token: s.token, method: "POST", params: { id: s.promotionId } });
    expect(declined.status).toBe(200);
    expect(declined.data.status).toBe("declined");
    const position = await positionOf(s.positionId);
    expect(position).toMatchObject({ rungId: s.ladder.rungIds[0], status: "met" });
    expect((await call(approveRoute, { token: s.token, method: "POST", params: { id: s.promotionId } })).status).toBe(409);

    // A new session later proposes again: one new pending row.
    await logAndEvaluate(s.owner, { teamId: s.teamId, athleteId: s.athleteId, ladderId: s.ladder.ladderId, rungId: s.ladder.rungIds[0]!, date: daysAgo(0) });
    const rows = await db.select().from(promotions).where(eq(promotions.positionId, s.positionId));
    expect(rows.map((r) => r.status).sort()).toEqual(["declined", "pending"]);
  });

  it("answers 409 with a clear message when the athlete has left the proposal's rung", async () => {
    const s = await pendingScenario();
    // A coach moved the athlete by hand meanwhile.
    await placeAthlete(s.teamId, s.athleteId, s.ladder, s.ladder.rungIds[2]!, daysAgo(0), s.owner.userId);
    const res = await call(approveRoute, { token: s.token, method: "POST", params: { id: s.promotionId } });
    expect(res.status).toBe(409);
    expect(JSON.stringify(res.data.error)).toContain("no longer on the rung");
    expect((await positionOf(s.positionId)).rungId).toBe(s.ladder.rungIds[2]);
  });

  it("forbids athletes to decide (403) and shows them only their own promotions", async () => {
    const s = await pendingScenario({ athleteWithAccount: true });
    const other = await pendingScenario();
    const athleteToken = await bearerFor(s.member!.actor);
    expect((await call(approveRoute, { token: athleteToken, method: "POST", params: { id: s.promotionId } })).status).toBe(403);
    expect((await call(declineRoute, { token: athleteToken, method: "POST", params: { id: s.promotionId } })).status).toBe(403);
    const mine = await call(listRoute, { token: athleteToken, path: "/api/v1/promotions" });
    expect((mine.data.items as { id: string }[]).map((p) => p.id)).toEqual([s.promotionId]);
    expect((await positionOf(s.positionId)).rungId).toBe(s.ladder.rungIds[0]);

    // A teammate's record is not theirs: its promotions stay hidden even when asked for by id.
    const teammate = await createAthleteRecord(s.teamId, "Teammate");
    const filtered = await call(listRoute, { token: athleteToken, path: `/api/v1/promotions?athleteId=${teammate}` });
    expect(filtered.data.items).toEqual([]);
    expect(other.promotionId).not.toBe(s.promotionId);
  });

  it("answers 404 to another team on every promotion route and leaves their proposal alone", async () => {
    const s = await pendingScenario();
    const outsider = await createTeam();
    const token = await bearerFor(outsider.owner);
    expect((await call(approveRoute, { token, method: "POST", params: { id: s.promotionId } })).status).toBe(404);
    expect((await call(declineRoute, { token, method: "POST", params: { id: s.promotionId } })).status).toBe(404);
    const list = await call(listRoute, { token, path: `/api/v1/promotions?athleteId=${s.athleteId}` });
    expect(list.data.items).toEqual([]);
    const verdict = await call(verdictRoute, { token, params: { id: s.athleteId, ladderId: s.ladder.ladderId } });
    expect(verdict.status).toBe(404);
    expect((await db.select().from(promotions).where(eq(promotions.id, s.promotionId)))[0]!.status).toBe("pending");
  });

  it("pages through promotions with a cursor and rejects a forged one", async () => {
    const a = await pendingScenario();
    // Two more athletes with proposals in the same team.
    for (const name of ["Second", "Third"]) {
      const athleteId = await createAthleteRecord(a.teamId, name);
      await placeAthlete(a.teamId, athleteId, a.ladder, a.ladder.rungIds[0]!, daysAgo(14));
      for (const n of [4, 2]) {
        await logAndEvaluate(a.owner, { teamId: a.teamId, athleteId, ladderId: a.ladder.ladderId, rungId: a.ladder.rungIds[0]!, date: daysAgo(n) });
      }
    }
    const first = await call(listRoute, { token: a.token, path: "/api/v1/promotions?limit=2" });
    expect((first.data.items as unknown[]).length).toBe(2);
    const second = await call(listRoute, { token: a.token, path: `/api/v1/promotions?limit=2&cursor=${first.data.nextCursor as string}` });
    const names = [...(first.data.items as { athlete: { name: string } }[]), ...(second.data.items as { athlete: { name: string } }[])].map((p) => p.athlete.name);
    expect(names).toEqual(["Third", "Second", "Record Athlete"]);
    expect(second.data.nextCursor).toBeNull();
    const forged = Buffer.from(JSON.stringify({ createdAt: "yesterday", id: a.promotionId })).toString("base64url");
    expect((await call(listRoute, { token: a.token, path: `/api/v1/promotions?cursor=${forged}` })).status).toBe(422);
    expect((await call(listRoute, { token: a.token, path: "/api/v1/promotions?status=maybe" })).status).toBe(422);
  });

  it("gives the live verdict of a position in plain words", async () => {
    const s = await pendingScenario();
    const res = await call(verdictRoute, { token: s.token, params: { id: s.athleteId, ladderId: s.ladder.ladderId } });
    expect(res.status).toBe(200);
    expect(res.data).toMatchObject({
      status: "met",
      rungName: "Rung 1",
      nextRungName: "Rung 2",
      pendingPromotionId: s.promotionId,
      pendingDirection: "up",
      daysOnRung: 14,
      explanation: "Ready to move up: 2 of 3 sessions met, 14 days on this rung",
    });
    expect(res.data.clauseLines).toContain("2 of the last 3 sessions met (needs 2)");
  });

  it("approving the last rung's proposal marks the skill achieved", async () => {
    const team = await createTeam();
    const athleteId = await createAthleteRecord(team.teamId, "Finisher");
    const ladder = await createTestLadder(team.teamId, { mode: "approve", rungCount: 2 });
    const positionId = await placeAthlete(team.teamId, athleteId, ladder, ladder.rungIds[1]!, daysAgo(10));
    for (const n of [3, 1]) {
      await logAndEvaluate(team.owner, { teamId: team.teamId, athleteId, ladderId: ladder.ladderId, rungId: ladder.rungIds[1]!, date: daysAgo(n) });
    }
    const [pending] = await db.select().from(promotions).where(eq(promotions.positionId, positionId));
    expect(pending).toMatchObject({ status: "pending", toRungId: null, direction: "up" });
    expect(await positionOf(positionId)).toMatchObject({ status: "pending_approval", achievedAt: null });

    const res = await call(approveRoute, { token: await bearerFor(team.owner), method: "POST", params: { id: pending!.id } });
    expect(res.status).toBe(200);
    expect(res.data).toMatchObject({ status: "approved", toRung: null });
    const position = await positionOf(positionId);
    expect(position).toMatchObject({ status: "achieved", readiness: 100, rungId: ladder.rungIds[1] });
    expect(position.achievedAt).toBeInstanceOf(Date);
    const moves = await db.select().from(positionMoves).where(eq(positionMoves.promotionId, pending!.id));
    expect(moves).toMatchObject([{ cause: "approved", toRungId: null, fromRungId: ladder.rungIds[1] }]);
  });

  it("approving a step-down moves the athlete one rung down with a step_down audit row", async () => {
    const team = await createTeam();
    const athleteId = await createAthleteRecord(team.teamId, "Sore");
    const ladder = await createTestLadder(team.teamId, { mode: "auto" });
    const positionId = await placeAthlete(team.teamId, athleteId, ladder, ladder.rungIds[1]!, daysAgo(10));
    for (const n of [3, 1]) {
      await logAndEvaluate(team.owner, { teamId: team.teamId, athleteId, ladderId: ladder.ladderId, rungId: ladder.rungIds[1]!, date: daysAgo(n), pain: true });
    }
    const [pending] = await db.select().from(promotions).where(eq(promotions.positionId, positionId));
    expect(pending).toMatchObject({ status: "pending", direction: "down", toRungId: ladder.rungIds[0] });
    const res = await call(approveRoute, { token: await bearerFor(team.owner), method: "POST", params: { id: pending!.id } });
    expect(res.status).toBe(200);
    expect(await positionOf(positionId)).toMatchObject({ rungId: ladder.rungIds[0], since: daysAgo(1), status: "not_yet" });
    const moves = await db.select().from(positionMoves).where(eq(positionMoves.promotionId, pending!.id));
    expect(moves).toMatchObject([{ cause: "step_down", actorKind: "user", fromRungId: ladder.rungIds[1], toRungId: ladder.rungIds[0] }]);
  });
});
