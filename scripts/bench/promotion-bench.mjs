// Promotion benchmark: what the engine's moves add to POST /api/v1/logs. Two worlds in one run,
// driven the same way:
//   plain    — athletes on a rung whose standard one day's post never meets: every log is written,
//              evaluated ("not yet") and its figures updated, but nobody moves;
//   promote  — athletes on a long auto ladder whose every rung is met by any pain-free set: every
//              log also records a promotion, moves the athlete, writes the audit row and queues the
//              notice, all in the log's transaction.
// Each world runs one request at a time (latency alone) and then 10 workers at a fixed 50 req/s.
// Every worker owns its athletes and posts each one's current rung (taken from the last verdict),
// so no two requests race for one athlete and every request in the promote world moves someone.
import crypto from "node:crypto";
import { percentiles, round } from "./stats.mjs";
import { createBenchTeam, placeAthletes, starterRung, withClient } from "./world.mjs";

const ATHLETES = 50;
const WORKERS = 10;
const RATE = 50;
const STAIRCASE_RUNGS = 400;

/** An auto ladder of STAIRCASE_RUNGS rungs, each met by one pain-free set of at least 1 s. */
async function staircase(dbUrl, teamId) {
  return withClient(dbUrl, async (client) => {
    const { rows: [ladder] } = await client.query(
      "insert into ladders (team_id, name, target_skill, promotion_mode) values ($1, 'Bench staircase', 'Bench', 'auto') returning id",
      [teamId],
    );
    const { rows } = await client.query(
      `insert into rungs (team_id, ladder_id, position, name, measure)
       select $1, $2, n, 'Step ' || n, 'hold_seconds' from generate_series(1, $3::int) n
       returning id, position`,
      [teamId, ladder.id, STAIRCASE_RUNGS],
    );
    await client.query(
      `insert into standards (rung_id, team_id, sets, min_value, sessions_required, sessions_window, min_days_on_rung, pain_free)
       select id, $1, 1, 1, 1, 1, 0, true from rungs where ladder_id = $2`,
      [teamId, ladder.id],
    );
    const first = rows.find((r) => r.position === 1);
    return { id: first.id, ladder_id: ladder.id };
  });
}

function body(athleteId, rungId, date, i) {
  return JSON.stringify({ athleteId, performedOn: date, entries: [{ rungId, sets: [{ value: 20 + (i % 15), rpe: 7 }, { value: 18, rpe: 7.5 }], pain: false }] });
}

/**
 * Posts logs for `seconds` from WORKERS workers, each pacing itself to its share of `rate`
 * (or as fast as it can when rate is 0), each cycling through its own athletes.
 */
async function drive(baseUrl, world, { seconds, workers, rate, date }) {
  const latencies = [];
  let errors = 0;
  let moved = 0;
  let n = 0;
  const end = performance.now() + seconds * 1000;
  const interval = rate > 0 ? (1000 * workers) / rate : 0;
  await Promise.all(
    Array.from({ length: workers }, async (_, w) => {
      const mine = world.athleteIds.filter((_, i) => i % workers === w);
      let next = performance.now() + (interval * w) / workers;
      for (let k = 0; performance.now() < end; k += 1) {
        if (interval > 0) {
          await new Promise((r) => setTimeout(r, Math.max(0, next - performance.now())));
          next += interval;
        }
        const athleteId = mine[k % mine.length];
        const started = performance.now();
        const res = await fetch(`${baseUrl}/api/v1/logs`, {
          method: "POST",
          headers: { "content-type": "application/json", authorization: `Bearer ${world.token}`, "idempotency-key": `promo-${crypto.randomUUID()}` },
          body: body(athleteId, world.rungOf.get(athleteId), date, (n += 1)),
        });
        const data = await res.json();
        latencies.push(performance.now() - started);
        if (res.status !== 201) {
          errors += 1;
          continue;
        }
        const promotedTo = data.verdicts?.[0]?.promotedTo;
        if (promotedTo) {
          moved += 1;
          world.rungOf.set(athleteId, promotedTo);
        }
      }
    }),
  );
  return { requests: latencies.length, rps: latencies.length / seconds, ...percentiles(latencies), errors, moved };
}

async function makeWorld(baseUrl, dbUrl, kind) {
  const team = await createBenchTeam(baseUrl, dbUrl);
  const rung = kind === "promote" ? await staircase(dbUrl, team.teamId) : await starterRung(dbUrl, team.teamId, "freestanding-handstand", "chest-to-wall-hold");
  const athleteIds = await placeAthletes(dbUrl, team.teamId, rung, ATHLETES, `Bench ${kind}`);
  return { ...team, athleteIds, rungOf: new Map(athleteIds.map((id) => [id, rung.id])) };
}

async function promotionsOf(dbUrl, teamId) {
  return withClient(dbUrl, async (client) => {
    const { rows: [r] } = await client.query("select count(*)::int as n from promotions where team_id = $1 and status = 'auto'", [teamId]);
    return r.n;
  });
}

export async function promotionBench({ baseUrl, dbUrl, seconds }) {
  const date = new Date(Date.now() - 86_400_000).toISOString().slice(0, 10);
  const worlds = { plain: await makeWorld(baseUrl, dbUrl, "plain"), promote: await makeWorld(baseUrl, dbUrl, "promote") };
  const results = {};
  for (const [kind, world] of Object.entries(worlds)) {
    const warm = await drive(baseUrl, world, { seconds: 2, workers: WORKERS, rate: 0, date }); // warm the route and pools
    const single = await drive(baseUrl, world, { seconds: Math.max(3, seconds / 4), workers: 1, rate: 0, date });
    const paced = await drive(baseUrl, world, { seconds, workers: WORKERS, rate: RATE, date });
    results[kind] = { warm, single, paced, promotions: await promotionsOf(dbUrl, world.teamId) };
  }
  const { plain, promote } = results;
  const ratio = (a, b) => (a && b ? round(a / b, 3) : null);
  const row = (name, r) => ({
    bench: name,
    requests: r.requests,
    "req/s": round(r.rps, 1),
    "p50 ms": round(r.p50),
    "p95 ms": round(r.p95),
    "p99 ms": round(r.p99),
    errors: r.errors,
    moved: r.moved,
  });
  return {
    name: "promotion",
    table: [
      row("plain, one at a time", plain.single),
      row("promote, one at a time", promote.single),
      row(`plain, ${RATE} req/s from ${WORKERS}`, plain.paced),
      row(`promote, ${RATE} req/s from ${WORKERS}`, promote.paced),
    ],
    summary: {
      // > 1: how much slower a log that moves the athlete is than one that does not.
      latencyRatioOneAtATime: { p50: ratio(promote.single.p50, plain.single.p50), p95: ratio(promote.single.p95, plain.single.p95) },
      latencyRatioPaced: { p50: ratio(promote.paced.p50, plain.paced.p50), p95: ratio(promote.paced.p95, plain.paced.p95) },
      // Every 201 in the promote world moved one athlete, exactly once: the rows agree.
      promotionsRecorded: promote.promotions,
      promotionsAnswered: promote.warm.moved + promote.single.moved + promote.paced.moved,
      plainPromotions: plain.promotions,
    },
    raw: results,
  };
}
