import { and, eq } from "drizzle-orm";
import { describe, expect, it, vi } from "vitest";
import { DELETE as deleteLog, PATCH as patchLog } from "@/app/api/v1/logs/[id]/route";
import { db } from "@/db/client";
import { athletePositions, auditEvents, logEntries, logs } from "@/db/schema";
import { addDays } from "@/lib/engine/calendar-date";
import { localDateOf } from "@/lib/engine/local-date";
import type * as EvaluateAfterLog from "@/lib/server/promotions/evaluate-after-log";
import type * as EvaluatePosition from "@/lib/server/promotions/evaluate-position";
import { loadRungSessions } from "@/lib/server/promotions/load-rung-sessions";
import { bearerFor, createMember, createTeam } from "../support/factories";
import { call } from "../support/http";
import { placeOn, postLogAs, starterRung } from "../support/logging-factories";

const evaluated = vi.hoisted(() => [] as { logId: string; positionIds: string[] }[]);
vi.mock("@/lib/server/promotions/evaluate-after-log", async (importOriginal) => ({
  // The real evaluateLoaded stays, for a log whose verdict may promote.
  ...(await importOriginal<typeof EvaluateAfterLog>()),
  evaluateAfterLog: async (_tx: unknown, _actor: unknown, input: { logId: string; positionIds: string[] }) => {
    evaluated.push(input);
    return [];
  },
}));
// Creating a log judges its positions from the read that went out with its locks.
const judgedOnCreate = vi.hoisted(() => [] as string[]);
vi.mock("@/lib/server/promotions/evaluate-position", async (importOriginal) => {
  const original = await importOriginal<typeof EvaluatePosition>();
  return {
    ...original,
    evaluateWithoutActing: (...args: Parameters<typeof original.evaluateWithoutActing>) => {
      judgedOnCreate.push(args[1].position.id);
      return original.evaluateWithoutActing(...args);
    },
  };
});

async function positionIdOf(athleteId: string, ladderId: string): Promise<string> {
  const [row] = await db
    .select({ id: athletePositions.id })
    .from(athletePositions)
    .where(and(eq(athletePositions.athleteId, athleteId), eq(athletePositions.ladderId, ladderId)));
  return row!.id;
}

const ZONE = "Europe/Amsterdam";

async function setup() {
  const { teamId } = await createTeam({ timeZone: ZONE });
  const me = await createMember(teamId, "athlete", "Editor");
  const token = await bearerFor(me.actor);
  const rung = await placeOn(teamId, me.actor.athleteId!, "freestanding-handstand", "chest-to-wall-hold");
  return { teamId, me, token, rung, today: localDateOf(new Date(), ZONE) };
}

async function logOn(token: string, rungId: string, performedOn: string) {
  const res = await postLogAs(token, { performedOn, entries: [{ rungId, sets: [{ value: 20, rpe: 8 }], pain: false }] });
  expect(res.status).toBe(201);
  return res.data as unknown as { id: string; entries: { id: string }[] };
}

describe("editing and deleting logs", () => {
  it("passes only the positions whose current rung was logged to the evaluation", async () => {
    const { teamId, me, token, rung, today } = await setup();
    const easier = await starterRung(teamId, "freestanding-handstand", "wall-walk-up");
    judgedOnCreate.length = 0;
    const res = await postLogAs(token, {
      performedOn: today,
      entries: [
        { rungId: easier.rungId, sets: [{ value: 3 }], pain: false },
        { rungId: rung.rungId, sets: [{ value: 40 }], pain: false },
        { rungId: rung.rungId, sets: [{ value: 41 }], pain: false },
      ],
    });
    expect(res.status).toBe(201);
    // The warm-up rung and the current rung share one ladder: one position, evaluated once.
    expect(judgedOnCreate).toEqual([await positionIdOf(me.actor.athleteId!, rung.ladderId)]);
  });

  it("changes sets, pain, note and session figures within 7 days, audited with before and after", async () => {
    const { token, rung, today } = await setup();
    judgedOnCreate.length = 0;
    const log = await logOn(token, rung.rungId, addDays(today, -7));
    expect(judgedOnCreate).toHaveLength(1);
    const res = await call(patchLog, {
      method: "PATCH",
      token,
      params: { id: log.id },
      json: { durationMinutes: 50, sessionRpe: 6, entries: [{ id: log.entries[0]!.id, sets: [{ value: 31, rpe: 7 }, { value: 29 }], pain: true, note: "left wrist" }] },
    });
    expect(res.status).toBe(200);
    expect(res.data).toMatchObject({ durationMinutes: 50, sessionRpe: 6, entries: [{ bestValue: 31, pain: true, note: "left wrist" }] });
    // Judged once on creation (above) and evaluated once more after the edit, for the one position.
    expect(evaluated.filter((e) => e.logId === log.id).map((e) => e.positionIds.length)).toEqual([1]);
    const [audit] = await db.select().from(auditEvents).where(and(eq(auditEvents.subjectId, log.id), eq(auditEvents.action, "log.updated")));
    const data = audit!.data as { before: { durationMinutes: unknown; entries: { sets: unknown }[] }; after: { durationMinutes: unknown } };
    expect(data.before.durationMinutes).toBeNull();
    expect(data.before.entries[0]!.sets).toEqual([{ value: 20, rpe: 8 }]);
    expect(data.after.durationMinutes).toBe(50);
  });

  it("refuses changes and deletion after 7 days with 409", async () => {
    const { token, rung, today } = await setup();
    const log = await logOn(token, rung.rungId, addDays(today, -8));
    const patch = await call(patchLog, { method: "PATCH", token, params: { id: log.id }, json: { sessionRpe: 5 } });
    expect(patch.status).toBe(409);
    expect((await call(deleteLog, { method: "DELETE", token, params: { id: log.id } })).status).toBe(409);
    const [row] = await db.select({ sessionRpe: logs.sessionRpe, deletedAt: logs.deletedAt }).from(logs).where(eq(logs.id, log.id));
    expect(row).toEqual({ sessionRpe: null, deletedAt: null });
  });

  it("soft-deletes a log: gone from sessions, kept as a row, audited; a second delete is 404", async () => {
    const { me, token, rung, today } = await setup();
    const log = await logOn(token, rung.rungId, today);
    const res = await call(deleteLog, { method: "DELETE", token, params: { id: log.id } });
    expect(res.status).toBe(204);
    expect(await loadRungSessions(db, { athleteId: me.actor.athleteId!, rungId: rung.rungId, since: addDays(today, -30) })).toEqual([]);
    const entries = await db.select({ deletedAt: logEntries.deletedAt }).from(logEntries).where(eq(logEntries.logId, log.id));
    expect(entries[0]!.deletedAt).not.toBeNull();
    const audits = await db.select().from(auditEvents).where(and(eq(auditEvents.subjectId, log.id), eq(auditEvents.action, "log.deleted")));
    expect(audits).toHaveLength(1);
    expect((await call(deleteLog, { method: "DELETE", token, params: { id: log.id } })).status).toBe(404);
  });

  it("keeps other people's logs out of reach (404) and names unknown entries (422)", async () => {
    const { teamId, token, rung, today } = await setup();
    const log = await logOn(token, rung.rungId, today);
    const other = await createMember(teamId, "athlete", "Nosy");
    const otherToken = await bearerFor(other.actor);
    expect((await call(patchLog, { method: "PATCH", token: otherToken, params: { id: log.id }, json: { sessionRpe: 5 } })).status).toBe(404);
    expect((await call(deleteLog, { method: "DELETE", token: otherToken, params: { id: log.id } })).status).toBe(404);
    const foreign = await createTeam({ timeZone: ZONE });
    expect((await call(patchLog, { method: "PATCH", token: await bearerFor(foreign.owner), params: { id: log.id }, json: { sessionRpe: 5 } })).status).toBe(404);
    const bad = await call(patchLog, {
      method: "PATCH",
      token,
      params: { id: log.id },
      json: { entries: [{ id: "00000000-0000-4000-8000-000000000000", pain: true }] },
    });
    expect(bad.status).toBe(422);
    expect(bad.data.error?.issues?.[0]?.path).toBe("entries.0.id");
  });
});
