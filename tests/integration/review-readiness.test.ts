import { parse } from "csv-parse/sync";
import { getISOWeeksInYear, startOfISOWeek, endOfISOWeek, format } from "date-fns";
import { eq } from "drizzle-orm";
import { beforeAll, describe, expect, it } from "vitest";
import { GET as readinessRoute } from "@/app/api/v1/readiness/route";
import { db } from "@/db/client";
import { athletes } from "@/db/schema";
import { addDays } from "@/lib/engine/calendar-date";
import type { Actor } from "@/lib/server/actor";
import { listReviewFilters } from "@/lib/server/readiness/list-review-filters";
import { bearerFor, createAthleteRecord, createMember, createTeam } from "../support/factories";
import { call } from "../support/http";
import { appliedPromotion, createLadder, createSquad, logSession, pendingPromotion, placeAthlete } from "../support/review-factories";

// A past ISO week, so the figures count to its Sunday: Monday 2026-09-28 … Sunday 2026-10-04.
const WEEK = "2026-W40";
const MONDAY = "2026-09-28";
const SUNDAY = "2026-10-04";
const QUINN = 'Quinn, Ana "Ace"';

interface Cell {
  ladderId: string;
  ladderName: string;
  rungId: string;
  readiness: number;
  status: string;
  sessionsThisWeek: number;
  daysOnRung: number;
  pain: boolean;
  pendingPromotionId: string | null;
  promotionsThisWeek: number;
}
interface Row {
  athleteId: string;
  athleteName: string;
  ladders: Cell[];
}

let token = "";
let ownerActor: Actor;
let ids: Record<string, string> = {};
let alpha = { ladderId: "", rungIds: [] as string[] };
let beta = { ladderId: "", rungIds: [] as string[] };
let squadId = "";
let pendingId = "";
let otherTeamAthlete = "";
let otherToken = "";

async function table(query: string) {
  const res = await call(readinessRoute, { token, path: `/api/v1/readiness?week=${WEEK}&${query}` });
  expect(res.status).toBe(200);
  return res.data as unknown as { items: Row[]; nextCursor: string | null; weekStart: string; weekEnd: string };
}
const names = (rows: Row[]) => rows.map((r) => r.athleteName);

beforeAll(async () => {
  const team = await createTeam();
  const { teamId, owner } = team;
  token = await bearerFor(owner);
  ownerActor = owner;
  alpha = await createLadder(teamId, "Alpha ladder");
  beta = await createLadder(teamId, "Beta ladder");
  const quinn = await createAthleteRecord(teamId, QUINN);
  const bo = await createAthleteRecord(teamId, "Bo Berg", owner.userId);
  const cy = await createAthleteRecord(teamId, "Cy Cole");
  const di = await createAthleteRecord(teamId, "Di Dahl");
  const gone = await createAthleteRecord(teamId, "Archived Ann");
  await db.update(athletes).set({ archivedAt: new Date() }).where(eq(athletes.id, gone));
  ids = { quinn, bo, cy, di, gone };

  // Quinn: met on Alpha (two session days this week), not yet on Beta.
  await placeAthlete(teamId, quinn, alpha.ladderId, alpha.rungIds[0]!, { since: addDays(SUNDAY, -10), readiness: 80, status: "met", lastSessionOn: "2026-10-01" });
  await placeAthlete(teamId, quinn, beta.ladderId, beta.rungIds[0]!, { since: addDays(SUNDAY, -10), readiness: 20, lastSessionOn: "2026-09-20" });
  await logSession(teamId, quinn, "2026-09-29", { entries: [{ ladderId: alpha.ladderId, rungId: alpha.rungIds[0]!, best: 22 }] });
  await logSession(teamId, quinn, "2026-10-01", { entries: [{ ladderId: alpha.ladderId, rungId: alpha.rungIds[0]!, best: 24 }] });
  await logSession(teamId, quinn, "2026-10-01", { entries: [{ ladderId: alpha.ladderId, rungId: alpha.rungIds[0]!, best: 25 }] });
  // Bo: 60 days on the same rung (stalled), pain this week.
  await placeAthlete(teamId, bo, alpha.ladderId, alpha.rungIds[1]!, { since: addDays(SUNDAY, -60), readiness: 50, lastSessionOn: "2026-09-30" });
  await logSession(teamId, bo, "2026-09-30", { entries: [{ ladderId: alpha.ladderId, rungId: alpha.rungIds[1]!, best: 12, pain: true, note: "wrist ache" }] });
  // A session before the week does not count toward this week.
  await logSession(teamId, bo, addDays(MONDAY, -1), { entries: [{ ladderId: alpha.ladderId, rungId: alpha.rungIds[1]!, best: 10 }] });
  // Cy: waiting for approval on Alpha, moved up on Beta this week, no session this week.
  const cyAlpha = await placeAthlete(teamId, cy, alpha.ladderId, alpha.rungIds[0]!, { since: addDays(SUNDAY, -20), readiness: 95, status: "pending_approval", lastSessionOn: "2026-09-25" });
  const cyBeta = await placeAthlete(teamId, cy, beta.ladderId, beta.rungIds[1]!, { since: "2026-09-30", readiness: 0 });
  pendingId = await pendingPromotion({ teamId, athleteId: cy, ladderId: alpha.ladderId, positionId: cyAlpha, fromRungId: alpha.rungIds[0]!, toRungId: alpha.rungIds[1]!, effectiveOn: "2026-09-25" });
  await appliedPromotion({ teamId, athleteId: cy, ladderId: beta.ladderId, positionId: cyBeta, fromRungId: beta.rungIds[0]!, toRungId: beta.rungIds[1]!, effectiveOn: "2026-09-30" });
  // Di: on no ladder yet; in the squad with Quinn.
  squadId = await createSquad(teamId, [di, quinn]);

  const other = await createTeam();
  otherToken = await bearerFor(other.owner);
  otherTeamAthlete = await createAthleteRecord(other.teamId, "Zed Other");
  const otherLadder = await createLadder(other.teamId, "Other ladder");
  await placeAthlete(other.teamId, otherTeamAthlete, otherLadder.ladderId, otherLadder.rungIds[0]!, { since: MONDAY, readiness: 100, status: "met" });
});

describe("GET /api/v1/readiness", () => {
  it("lists every active athlete of the team by name, with this week's figures per ladder", async () => {
    const page = await table("");
    expect(page.weekStart).toBe(MONDAY);
    expect(page.weekEnd).toBe(SUNDAY);
    expect(names(page.items)).toEqual(["Bo Berg", "Cy Cole", "Di Dahl", QUINN]);
    const quinn = page.items.find((r) => r.athleteId === ids.quinn)!;
    expect(quinn.ladders.map((c) => c.ladderName)).toEqual(["Alpha ladder", "Beta ladder"]);
    // Two distinct days on Alpha (two posts on 1 Oct are one day); nothing on Beta.
    expect(quinn.ladders[0]).toMatchObject({ readiness: 80, status: "met", sessionsThisWeek: 2, pain: false, daysOnRung: 10 });
    expect(quinn.ladders[1]).toMatchObject({ sessionsThisWeek: 0, readiness: 20 });
    const bo = page.items.find((r) => r.athleteId === ids.bo)!;
    expect(bo.ladders[0]).toMatchObject({ pain: true, sessionsThisWeek: 1, daysOnRung: 60 });
    const cy = page.items.find((r) => r.athleteId === ids.cy)!;
    expect(cy.ladders[0]).toMatchObject({ pendingPromotionId: pendingId, promotionsThisWeek: 0 });
    expect(cy.ladders[1]).toMatchObject({ pendingPromotionId: null, promotionsThisWeek: 1, daysOnRung: 4 });
    expect(page.items.find((r) => r.athleteId === ids.di)!.ladders).toEqual([]);
  });

  it("shows no other team's rows, and another team sees none of ours", async () => {
    const page = await table("limit=100");
    expect(page.items.map((r) => r.athleteId)).not.toContain(otherTeamAthlete);
    const theirs = await call(readinessRoute, { token: otherToken, path: `/api/v1/readiness?week=${WEEK}` });
    expect((theirs.data.items as Row[]).map((r) => r.athleteId)).toEqual([otherTeamAthlete]);
  });

  it("sorts on the server by best and lowest readiness, and by last session", async () => {
    expect(names((await table("sort=-readiness")).items)).toEqual(["Cy Cole", QUINN, "Bo Berg", "Di Dahl"]);
    // Lowest first: Cy has just moved up on Beta (0 %), so Cy leads.
    expect(names((await table("sort=readiness")).items)).toEqual(["Cy Cole", QUINN, "Bo Berg", "Di Dahl"]);
    expect(names((await table("sort=-name")).items)).toEqual([QUINN, "Di Dahl", "Cy Cole", "Bo Berg"]);
    // Never logged first, then the longest ago.
    expect(names((await table("sort=lastSession")).items)).toEqual(["Di Dahl", "Cy Cole", "Bo Berg", QUINN]);
    expect(names((await table("sort=-lastSession")).items)).toEqual([QUINN, "Bo Berg", "Cy Cole", "Di Dahl"]);
  });

  it("filters by status, ladder, squad and primary coach on the server", async () => {
    expect(names((await table("status=ready")).items)).toEqual(["Cy Cole", QUINN]);
    expect(names((await table("status=stalled")).items)).toEqual(["Bo Berg"]);
    // With a lower bar (more than 2 weeks) Cy's 20 days count as stalled too.
    expect(names((await table("status=stalled&stalledWeeks=2")).items)).toEqual(["Bo Berg", "Cy Cole"]);
    expect(names((await table("status=pain")).items)).toEqual(["Bo Berg"]);
    expect(names((await table("status=none")).items)).toEqual(["Cy Cole", "Di Dahl"]);
    const onBeta = await table(`ladder=${beta.ladderId}`);
    expect(names(onBeta.items)).toEqual(["Cy Cole", QUINN]);
    expect(onBeta.items.every((r) => r.ladders.length === 1 && r.ladders[0]!.ladderId === beta.ladderId)).toBe(true);
    expect(names((await table(`squad=${squadId}`)).items)).toEqual(["Di Dahl", QUINN]);
    expect(names((await table("mine=true")).items)).toEqual(["Bo Berg"]);
    expect(names((await table(`status=ready&ladder=${beta.ladderId}`)).items)).toEqual([]);
  });

  it("pages with a keyset cursor that belongs to its sort order", async () => {
    const first = await table("sort=-readiness&limit=2");
    expect(names(first.items)).toEqual(["Cy Cole", QUINN]);
    const second = await table(`sort=-readiness&limit=2&cursor=${first.nextCursor}`);
    expect(names(second.items)).toEqual(["Bo Berg", "Di Dahl"]);
    expect(second.nextCursor).toBeNull();
    const byName = await table("limit=3");
    expect(names((await table(`limit=3&cursor=${byName.nextCursor}`)).items)).toEqual([QUINN]);
    const mixed = await call(readinessRoute, { token, path: `/api/v1/readiness?sort=name&cursor=${first.nextCursor}` });
    expect(mixed.status).toBe(422);
    const byLastSession = await table("sort=lastSession&limit=2");
    expect((await table(`sort=lastSession&limit=2&cursor=${byLastSession.nextCursor}`)).items).toHaveLength(2);
  });

  it("answers 422, not a database error, for a forged cursor whose key does not fit its sort", async () => {
    const id = "00000000-0000-4000-8000-000000000000";
    for (const [sort, k] of [["readiness", "abc"], ["-lastSession", "someday"], ["lastSession", 7]] as const) {
      const cursor = Buffer.from(JSON.stringify({ s: sort, k, n: "x", id })).toString("base64url");
      const res = await call(readinessRoute, { token, path: `/api/v1/readiness?sort=${sort}&cursor=${cursor}` });
      expect(res.status, `${sort} ${k}`).toBe(422);
    }
  });

  it("answers 422 for a week ISO 8601 does not have and accepts a real week 53 (cross-checked with date-fns)", async () => {
    // date-fns (reference library): 2025 has 52 ISO weeks, 2026 has 53.
    expect(getISOWeeksInYear(new Date(2025, 5, 1))).toBe(52);
    expect(getISOWeeksInYear(new Date(2026, 5, 1))).toBe(53);
    const bad = await call(readinessRoute, { token, path: "/api/v1/readiness?week=2025-W53" });
    expect(bad.status).toBe(422);
    expect(bad.data.error?.issues?.[0]?.path).toBe("week");
    expect((await call(readinessRoute, { token, path: "/api/v1/readiness?week=2026-W5" })).status).toBe(422);
    const ok = await call(readinessRoute, { token, path: "/api/v1/readiness?week=2026-W53" });
    expect(ok.status).toBe(200);
    const inWeek53 = new Date(2027, 0, 1); // 2027-01-01 is 2026-W53-5 (ISO 8601)
    expect(ok.data.weekStart).toBe(format(startOfISOWeek(inWeek53), "yyyy-MM-dd"));
    expect(ok.data.weekEnd).toBe(format(endOfISOWeek(inWeek53), "yyyy-MM-dd"));
  });

  it("offers the team's ladders as columns, shown by default when someone is placed on them", async () => {
    const unused = await createLadder(ownerActor.teamId, "Zeta ladder");
    const { ladders } = await listReviewFilters(ownerActor);
    const byId = new Map(ladders.map((l) => [l.id, l.placed]));
    expect(byId.get(alpha.ladderId)).toBe(true);
    expect(byId.get(beta.ladderId)).toBe(true);
    expect(byId.get(unused.ladderId)).toBe(false);
  });

  it("is for staff only", async () => {
    const team = await createTeam();
    const { actor } = await createMember(team.teamId, "athlete");
    expect((await call(readinessRoute, { token: await bearerFor(actor), path: "/api/v1/readiness" })).status).toBe(403);
  });
});

describe("GET /api/v1/readiness as CSV", () => {
  it("returns one line per athlete × ladder that parses back to the JSON rows, names with commas and quotes included", async () => {
    const res = await call(readinessRoute, { token, path: `/api/v1/readiness?week=${WEEK}&format=csv&limit=1` });
    expect(res.status).toBe(200);
    expect(res.headers.get("content-type")).toContain("text/csv");
    expect(res.headers.get("content-disposition")).toBe(`attachment; filename="readiness-${WEEK}.csv"`);
    const records = parse(res.data as unknown as string, { columns: true }) as Record<string, string>[];
    const json = await table("limit=100");
    const expected = json.items.flatMap((row) =>
      row.ladders.length === 0
        ? [{ athlete: row.athleteName, ladder: "", readiness: "", pain: "", pending_promotion_id: "" }]
        : row.ladders.map((c) => ({
            athlete: row.athleteName,
            ladder: c.ladderName,
            readiness: String(c.readiness),
            pain: String(c.pain),
            pending_promotion_id: c.pendingPromotionId ?? "",
          })),
    );
    // Limit does not apply to the export: the whole team.
    expect(records.map((r) => ({ athlete: r.athlete, ladder: r.ladder, readiness: r.readiness, pain: r.pain, pending_promotion_id: r.pending_promotion_id }))).toEqual(expected);
    expect(records.filter((r) => r.athlete === QUINN)).toHaveLength(2);
    expect(records.every((r) => r.week === WEEK)).toBe(true);
  });

  it("answers CSV to Accept: text/csv and keeps the filters", async () => {
    const res = await call(readinessRoute, { token, path: `/api/v1/readiness?week=${WEEK}&status=pain`, headers: { accept: "text/csv" } });
    expect(res.headers.get("content-type")).toContain("text/csv");
    const records = parse(res.data as unknown as string, { columns: true }) as Record<string, string>[];
    expect(records.map((r) => r.athlete)).toEqual(["Bo Berg"]);
    expect(records[0]!.days_on_rung).toBe("60");
  });
});
