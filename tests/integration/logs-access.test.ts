import { describe, expect, it } from "vitest";
import { GET as athleteLogs } from "@/app/api/v1/athletes/[id]/logs/route";
import { GET as athleteToday } from "@/app/api/v1/athletes/[id]/today/route";
import { GET as myToday } from "@/app/api/v1/me/today/route";
import { addDays } from "@/lib/engine/calendar-date";
import { localDateOf } from "@/lib/engine/local-date";
import { db } from "@/db/client";
import { loadRungSessions } from "@/lib/server/promotions/load-rung-sessions";
import { bearerFor, createAthleteRecord, createMember, createTeam } from "../support/factories";
import { call } from "../support/http";
import { placeOn, postLogAs } from "../support/logging-factories";

const ZONE = "Europe/Amsterdam";
const today = () => localDateOf(new Date(), ZONE);

describe("who may log for whom", () => {
  it("lets a coach log for an athlete without an account, stored with the coach as enteredById", async () => {
    const { teamId } = await createTeam({ timeZone: ZONE });
    const coach = await createMember(teamId, "coach", "Coach Kim");
    const athleteId = await createAthleteRecord(teamId, "No Account");
    const rung = await placeOn(teamId, athleteId, "front-lever", "tuck-lever");
    const res = await postLogAs(await bearerFor(coach.actor), {
      athleteId,
      performedOn: today(),
      durationMinutes: 45,
      sessionRpe: 7,
      entries: [{ rungId: rung.rungId, sets: [{ value: 12, rpe: 7 }], pain: false }],
    });
    expect(res.status).toBe(201);
    expect(res.data).toMatchObject({ athleteId, enteredById: coach.actor.userId, durationMinutes: 45, sessionRpe: 7 });
  });

  it("asks staff to name the athlete (422 at athleteId)", async () => {
    const { teamId, owner } = await createTeam({ timeZone: ZONE });
    const athleteId = await createAthleteRecord(teamId);
    const rung = await placeOn(teamId, athleteId, "front-lever", "tuck-lever");
    const res = await postLogAs(await bearerFor(owner), { performedOn: today(), entries: [{ rungId: rung.rungId, sets: [{ value: 10 }], pain: false }] });
    expect(res.status).toBe(422);
    expect(res.data.error?.issues?.[0]?.path).toBe("athleteId");
  });

  it("does not let an athlete log for another athlete (404)", async () => {
    const { teamId } = await createTeam({ timeZone: ZONE });
    const me = await createMember(teamId, "athlete", "Me");
    const other = await createAthleteRecord(teamId, "Someone Else");
    const rung = await placeOn(teamId, other, "front-lever", "tuck-lever");
    await placeOn(teamId, me.actor.athleteId!, "front-lever", "tuck-lever");
    const res = await postLogAs(await bearerFor(me.actor), {
      athleteId: other,
      performedOn: today(),
      entries: [{ rungId: rung.rungId, sets: [{ value: 10 }], pain: false }],
    });
    expect(res.status).toBe(404);
  });

  it("answers 404 for another team's athlete, rung and history", async () => {
    const a = await createTeam({ timeZone: ZONE });
    const b = await createTeam({ timeZone: ZONE });
    const athleteA = await createAthleteRecord(a.teamId, "Team A athlete");
    const athleteB = await createAthleteRecord(b.teamId, "Team B athlete");
    const rungB = await placeOn(b.teamId, athleteB, "front-lever", "tuck-lever");
    await placeOn(a.teamId, athleteA, "front-lever", "tuck-lever");
    const tokenA = await bearerFor(a.owner);
    const entries = [{ rungId: rungB.rungId, sets: [{ value: 10 }], pain: false }];
    expect((await postLogAs(tokenA, { athleteId: athleteB, performedOn: today(), entries })).status).toBe(404);
    expect((await postLogAs(tokenA, { athleteId: athleteA, performedOn: today(), entries })).status).toBe(404);
    expect((await call(athleteLogs, { token: tokenA, params: { id: athleteB } })).status).toBe(404);
    expect((await call(athleteToday, { token: tokenA, params: { id: athleteB } })).status).toBe(404);
  });

  it("merges set-by-set posts on one rung and date into one session", async () => {
    const { teamId } = await createTeam({ timeZone: ZONE });
    const me = await createMember(teamId, "athlete", "Set By Set");
    const token = await bearerFor(me.actor);
    const rung = await placeOn(teamId, me.actor.athleteId!, "freestanding-handstand", "chest-to-wall-hold");
    const day = today();
    for (const value of [20, 25, 30]) {
      const res = await postLogAs(token, { performedOn: day, entries: [{ rungId: rung.rungId, sets: [{ value, rpe: 7 }], pain: value === 30 }] });
      expect(res.status).toBe(201);
    }
    const yesterday = addDays(day, -1);
    expect((await postLogAs(token, { performedOn: yesterday, entries: [{ rungId: rung.rungId, sets: [{ value: 18 }], pain: false }] })).status).toBe(201);
    const sessions = await loadRungSessions(db, { athleteId: me.actor.athleteId!, rungId: rung.rungId, since: addDays(day, -7) });
    expect(sessions).toHaveLength(2);
    expect(sessions[0]).toEqual({ date: day, sets: [{ value: 20, rpe: 7 }, { value: 25, rpe: 7 }, { value: 30, rpe: 7 }], pain: true });
    expect(sessions[1]).toEqual({ date: yesterday, sets: [{ value: 18 }], pain: false });
    // `since` is inclusive and cuts older sessions.
    expect(await loadRungSessions(db, { athleteId: me.actor.athleteId!, rungId: rung.rungId, since: day })).toHaveLength(1);
  });

  it("accepts an easier rung of a placed ladder but only reports the current rung's entries to promotion", async () => {
    const { teamId } = await createTeam({ timeZone: ZONE });
    const me = await createMember(teamId, "athlete", "Warm Up");
    const token = await bearerFor(me.actor);
    const current = await placeOn(teamId, me.actor.athleteId!, "freestanding-handstand", "chest-to-wall-hold");
    const { starterRung } = await import("../support/logging-factories");
    const easier = await starterRung(teamId, "freestanding-handstand", "wall-walk-up");
    const res = await postLogAs(token, {
      performedOn: today(),
      entries: [
        { rungId: easier.rungId, sets: [{ value: 3 }], pain: false },
        { rungId: current.rungId, sets: [{ value: 40 }], pain: false },
      ],
    });
    expect(res.status).toBe(201);
    expect((res.data.entries as unknown[]).length).toBe(2);
  });

  it("shows an athlete's Today with their positions and the day's logged sets", async () => {
    const { teamId } = await createTeam({ timeZone: ZONE });
    const me = await createMember(teamId, "athlete", "Today Person");
    const token = await bearerFor(me.actor);
    const rung = await placeOn(teamId, me.actor.athleteId!, "freestanding-handstand", "chest-to-wall-hold");
    await postLogAs(token, { performedOn: today(), entries: [{ rungId: rung.rungId, sets: [{ value: 22 }], pain: false }] });
    const res = await call(myToday, { token, path: "/api/v1/me/today" });
    expect(res.status).toBe(200);
    const data = res.data as unknown as { date: string; blocks: unknown[]; positions: { rungId: string; standardText: string; explanation: string | null; logged: { sets: unknown[] }[] }[] };
    expect(data.date).toBe(today());
    expect(data.blocks).toEqual([]);
    const position = data.positions.find((p) => p.rungId === rung.rungId)!;
    expect(position.standardText).toMatch(/sets of at least 45 s/);
    expect(position.logged[0]!.sets).toEqual([{ value: 22 }]);
    // One short set today: the engine explains what is still missing, in plain words.
    expect(position.explanation).toMatch(/^0 of \d sessions met/);
    // Another date shows nothing logged yet.
    const other = await call(myToday, { token, path: `/api/v1/me/today?date=${addDays(today(), -3)}` });
    const otherData = other.data as unknown as { positions: { logged: unknown[] }[] };
    expect(otherData.positions[0]!.logged).toEqual([]);
  });

  it("lists an athlete's logs newest first with cursor pages and a date range", async () => {
    const { teamId } = await createTeam({ timeZone: ZONE });
    const me = await createMember(teamId, "athlete", "History");
    const token = await bearerFor(me.actor);
    const rung = await placeOn(teamId, me.actor.athleteId!, "freestanding-handstand", "chest-to-wall-hold");
    const day = today();
    for (let i = 0; i < 5; i += 1) {
      await postLogAs(token, { performedOn: addDays(day, -i), entries: [{ rungId: rung.rungId, sets: [{ value: 20 + i }], pain: false }] });
    }
    const id = me.actor.athleteId!;
    const first = await call(athleteLogs, { token, params: { id }, path: `/api/v1/athletes/${id}/logs?limit=2` });
    expect(first.status).toBe(200);
    const page1 = first.data as unknown as { items: { performedOn: string }[]; nextCursor: string };
    expect(page1.items.map((l) => l.performedOn)).toEqual([day, addDays(day, -1)]);
    const second = await call(athleteLogs, { token, params: { id }, path: `/api/v1/athletes/${id}/logs?limit=2&cursor=${page1.nextCursor}` });
    const page2 = second.data as unknown as { items: { performedOn: string }[] };
    expect(page2.items.map((l) => l.performedOn)).toEqual([addDays(day, -2), addDays(day, -3)]);
    const ranged = await call(athleteLogs, { token, params: { id }, path: `/api/v1/athletes/${id}/logs?from=${addDays(day, -1)}&to=${day}` });
    expect((ranged.data as unknown as { items: unknown[] }).items).toHaveLength(2);
  });

  it("lists logs of one date newest posted first, each exactly once across pages", async () => {
    const { teamId } = await createTeam({ timeZone: ZONE });
    const me = await createMember(teamId, "athlete", "Same Day");
    const token = await bearerFor(me.actor);
    const rung = await placeOn(teamId, me.actor.athleteId!, "freestanding-handstand", "chest-to-wall-hold");
    // Five set-by-set posts on one date: ids are random, so only the time posted orders them.
    const posted: string[] = [];
    for (let i = 0; i < 5; i += 1) {
      const res = await postLogAs(token, { performedOn: today(), entries: [{ rungId: rung.rungId, sets: [{ value: 20 + i }], pain: false }] });
      posted.push((res.data as unknown as { id: string }).id);
    }
    const id = me.actor.athleteId!;
    const seen: string[] = [];
    let cursor: string | null = null;
    do {
      const path: string = `/api/v1/athletes/${id}/logs?limit=2${cursor ? `&cursor=${cursor}` : ""}`;
      const page = (await call(athleteLogs, { token, params: { id }, path })).data as unknown as { items: { id: string }[]; nextCursor: string | null };
      seen.push(...page.items.map((l) => l.id));
      cursor = page.nextCursor;
    } while (cursor);
    expect(seen).toEqual([...posted].reverse());
  });

  it("answers a cursor it did not make with 422, not a database error", async () => {
    const { teamId } = await createTeam({ timeZone: ZONE });
    const me = await createMember(teamId, "athlete", "Bad Cursor");
    const token = await bearerFor(me.actor);
    const id = me.actor.athleteId!;
    const forged = Buffer.from(JSON.stringify({ d: "2026-01-01", at: "yesterday", id: "x" })).toString("base64url");
    const res = await call(athleteLogs, { token, params: { id }, path: `/api/v1/athletes/${id}/logs?cursor=${forged}` });
    expect(res.status).toBe(422);
  });

  it("keeps a log's entries in the order they were posted", async () => {
    const { teamId } = await createTeam({ timeZone: ZONE });
    const me = await createMember(teamId, "athlete", "In Order");
    const token = await bearerFor(me.actor);
    const rung = await placeOn(teamId, me.actor.athleteId!, "freestanding-handstand", "chest-to-wall-hold");
    // Six entries written by one statement: ordered by id alone they would come back shuffled.
    const notes = ["first", "second", "third", "fourth", "fifth", "sixth"];
    const entries = notes.map((note, i) => ({ rungId: rung.rungId, sets: [{ value: 10 + i }], pain: false, note }));
    expect((await postLogAs(token, { performedOn: today(), entries })).status).toBe(201);
    const id = me.actor.athleteId!;
    const listed = await call(athleteLogs, { token, params: { id } });
    const [log] = (listed.data as unknown as { items: { entries: { note: string }[] }[] }).items;
    expect(log!.entries.map((e) => e.note)).toEqual(notes);
  });
});
