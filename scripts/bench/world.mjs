// Bench data shared by the log benches: a team made through the API (so it gets the starter
// library), an API token for its owner, and athletes placed on a rung, all written through pg.
import crypto from "node:crypto";
import pg from "pg";

export async function withClient(dbUrl, work) {
  const client = new pg.Client({ connectionString: dbUrl });
  await client.connect();
  try {
    return await work(client);
  } finally {
    await client.end();
  }
}

/** Signs up a team owner and gives them an API token: { teamId, ownerId, token }. */
export async function createBenchTeam(baseUrl, dbUrl) {
  const email = `bench-${crypto.randomUUID().slice(0, 8)}@bench.test`;
  const signup = await fetch(`${baseUrl}/api/v1/signup`, {
    method: "POST",
    headers: { "content-type": "application/json" },
    body: JSON.stringify({ email, password: "bench-password-123", name: "Bench Owner", teamName: "Bench Club", timeZone: "Europe/Amsterdam" }),
  });
  if (signup.status !== 201) throw new Error(`sign-up failed: ${signup.status} ${await signup.text()}`);
  return withClient(dbUrl, async (client) => {
    const { rows: [owner] } = await client.query("select id, team_id from users where email = $1", [email]);
    const token = `rw_${crypto.randomBytes(32).toString("base64url")}`;
    await client.query("insert into api_tokens (team_id, user_id, name, token_hash, prefix) values ($1, $2, 'bench', $3, $4)", [
      owner.team_id, owner.id, crypto.createHash("sha256").update(token).digest("hex"), token.slice(0, 10),
    ]);
    return { teamId: owner.team_id, ownerId: owner.id, token };
  });
}

/** A starter rung of the team by its keys: { id, ladder_id }. */
export function starterRung(dbUrl, teamId, ladderKey, rungKey) {
  return withClient(dbUrl, async (client) => {
    const { rows: [rung] } = await client.query(
      `select r.id, r.ladder_id from rungs r join ladders l on l.id = r.ladder_id
        where r.team_id = $1 and l.starter_key = $2 and r.starter_key = $3`,
      [teamId, ladderKey, rungKey],
    );
    return rung;
  });
}

/** `count` new athletes placed on one rung since 2020; their ids. */
export function placeAthletes(dbUrl, teamId, rung, count, label) {
  return withClient(dbUrl, async (client) => {
    const ids = [];
    for (let i = 0; i < count; i += 1) {
      const { rows: [a] } = await client.query("insert into athletes (team_id, name) values ($1, $2) returning id", [teamId, `${label} ${i + 1}`]);
      await client.query(
        "insert into athlete_positions (team_id, athlete_id, ladder_id, rung_id, since) values ($1, $2, $3, $4, '2020-01-01')",
        [teamId, a.id, rung.ladder_id, rung.id],
      );
      ids.push(a.id);
    }
    return ids;
  });
}
