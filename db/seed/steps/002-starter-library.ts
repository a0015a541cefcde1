import { installStarterLibrary } from "@/lib/server/ladders/install-starter-library";
import { localDateOf } from "@/lib/engine/local-date";
import { addDays } from "@/lib/engine/calendar-date";
import { writePlacement } from "@/lib/server/positions/write-placement";
import { DEMO_CLUB, type DemoAthleteKey } from "../demo-cast";
import { demoTeam } from "../demo-team";
import type { SeedStep } from "../step";

/** [athlete, ladder, rung, days on the rung so far]: a spread of levels across the club. */
const PLACEMENTS: [DemoAthleteKey, string, string, number][] = [
  ["priya", "freestanding-handstand", "kick-up-wall-tap", 12],
  ["priya", "l-sit-to-v-sit", "l-sit-floor", 20],
  ["priya", "handstand-push-up", "high-box-pike-push-up", 9],
  ["priya", "ring-muscle-up", "false-grip-row", 15],
  ["jonas", "freestanding-handstand", "free-hold-steady", 25],
  ["jonas", "press-to-handstand", "box-straddle-press", 18],
  ["jonas", "front-lever", "one-leg-lever", 30],
  ["amara", "freestanding-handstand", "chest-to-wall-hold", 6],
  ["amara", "l-sit-to-v-sit", "one-leg-l-sit", 10],
  ["amara", "ring-muscle-up", "ring-support-hold", 4],
  ["felix", "front-lever", "tuck-lever", 40],
  ["felix", "ring-muscle-up", "low-ring-transition", 22],
  ["felix", "handstand-push-up", "wall-hspu-lowering", 14],
  ["ines", "freestanding-handstand", "wall-toe-pulls", 8],
  ["ines", "press-to-handstand", "straddle-leg-lift", 16],
  ["sol", "l-sit-to-v-sit", "high-l-sit", 35],
  ["sol", "front-lever", "flat-tuck-lever", 12],
  ["hugo", "freestanding-handstand", "wall-walk-up", 5],
  ["hugo", "handstand-push-up", "pike-push-up", 5],
  ["lotte", "l-sit-to-v-sit", "tuck-sit-hold", 3],
  ["lotte", "front-lever", "hollow-hold", 3],
];

/** The starter library for the demo club, and its athletes placed at varied rungs. */
export const starterLibrary: SeedStep = {
  name: "002-starter-library",
  async run(tx, { now }) {
    const team = await demoTeam(tx);
    await installStarterLibrary(tx, team.teamId);
    const refreshed = await demoTeam(tx);
    const today = localDateOf(now, DEMO_CLUB.timeZone);
    for (const [athlete, ladder, rung, days] of PLACEMENTS) {
      await writePlacement(tx, {
        teamId: team.teamId,
        athleteId: refreshed.athleteIds[athlete],
        ladderId: refreshed.ladderIds[ladder]!,
        rungId: refreshed.rungId(ladder, rung),
        since: addDays(today, -days),
        actorUserId: team.ownerId,
      });
    }
  },
};
