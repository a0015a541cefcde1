/**
 * Starter ladder: rings toward the strict muscle-up.
 *
 * The progressions and numbers are common practice, no source; a coach should adjust them.
 */
import { eccentricStandard, holdStandard, repsStandard } from "./standards";
import type { StarterLadder } from "./types";

export const RINGS_LINE: StarterLadder = {
  key: "ring-muscle-up",
  name: "Ring muscle-up",
  targetSkill: "Strict ring muscle-up",
  notes:
    "Support strength, false grip and the turn-over, practised low before high. Elbows and wrists adapt slowly, so the coach confirms each step up.",
  promotionMode: "approve",
  rungs: [
    {
      key: "ring-support-hold",
      name: "Ring support hold",
      measure: "hold_seconds",
      setting: "Rings low enough to step down from, or climb in from a box",
      cues: [
        "Straight arms, rings pressed into your sides",
        "Shoulders down, away from the ears",
        "Turn the rings out a little if you can",
      ],
      caution:
        "Rings move every way: start from a box and step down when the arms shake. Stop if the front of the shoulder pinches.",
      tags: ["rings", "grip", "straight_arm", "pushing", "scapula"],
      standard: holdStandard(30, { stepDown: null }),
    },
    {
      key: "false-grip-hang",
      name: "False-grip hang",
      measure: "hold_seconds",
      setting: "Rings high enough to hang; the feet may touch the floor at first",
      cues: [
        "Wrist over the ring, ring deep in the palm",
        "Keep the wrists bent and the grip tight",
        "Shoulders pulled down, not hanging loose",
      ],
      caution:
        "New load on the wrists and forearms: keep sets short and stop on sharp wrist or elbow pain.",
      tags: ["rings", "grip", "wrist", "pulling"],
      standard: holdStandard(20),
    },
    {
      key: "false-grip-row",
      name: "False-grip ring row",
      measure: "reps",
      setting: "Feet on the floor, body at about 45°",
      cues: [
        "Set the false grip before you lean back",
        "Pull the rings to the lower ribs",
        "Keep the grip all the way down",
      ],
      caution:
        "Don't let the grip slide. If the elbows ache, go back to hangs for a week.",
      tags: ["rings", "grip", "wrist", "pulling", "elbow"],
      standard: repsStandard(8, { effort: { minRir: 2 } }),
    },
    {
      key: "false-grip-pull-up",
      name: "False-grip pull-up to the chest",
      measure: "reps",
      setting: "Full hang, feet off the floor",
      cues: [
        "Pull the rings down to the chest",
        "Elbows travel back and close to the body",
        "Keep the false grip at the top",
      ],
      caution: "Hard on the elbows: add reps slowly and stop on sharp pain.",
      tags: ["rings", "grip", "wrist", "pulling", "elbow"],
      standard: repsStandard(5, { effort: { minRir: 2 } }),
    },
    {
      key: "ring-dip",
      name: "Ring dip",
      measure: "reps",
      setting: "Start in support; rings at a height you can step down from",
      cues: [
        "Lower until the shoulders sit just below the elbows",
        "Keep the rings close to the body",
        "Lock out and turn the rings out at the top",
      ],
      caution:
        "Warm up first, and stop short of a deep stretch that pinches the front of the shoulder.",
      tags: ["rings", "grip", "pushing", "elbow", "scapula"],
      standard: repsStandard(6, { effort: { minRir: 2 } }),
    },
    {
      key: "low-ring-transition",
      name: "Low-ring transition",
      measure: "reps",
      setting: "Rings at about chest height, feet on the floor",
      cues: [
        "Start leaning back in a false grip",
        "Pull the rings to the chest, then tip the chest over them",
        "Finish by pressing up to support",
      ],
      caution:
        "The feet stay down so the legs can help. The false grip loads the wrists and elbows: stop on sharp pain.",
      tags: ["rings", "grip", "wrist", "pulling", "pushing", "elbow"],
      standard: repsStandard(5),
    },
    {
      key: "muscle-up-lowering",
      name: "Muscle-up lowering",
      measure: "eccentric_seconds",
      setting: "Step up into support from a box",
      cues: [
        "From support, lower slowly into the bottom of a dip",
        "Roll back through the turn-over, keeping the false grip",
        "Lower to a hang as slowly as you can",
      ],
      caution:
        "Big elbow and wrist load: few lowerings, full rest, stop on sharp pain. Keep a box under you for the start.",
      tags: ["rings", "grip", "wrist", "pulling", "pushing", "elbow"],
      standard: eccentricStandard({ lowerings: 2, seconds: 5 }, { minDaysOnRung: 14 }),
    },
    {
      key: "foot-assisted-muscle-up",
      name: "Muscle-up with a foot assist",
      measure: "reps",
      setting: "Box under the rings; push lightly with one foot through the turn-over",
      cues: [
        "Use only as much foot as you need",
        "Pull high before you turn over",
        "Finish with straight arms in support",
      ],
      caution: "Watch the false grip and the elbows; stop on sharp pain.",
      tags: ["rings", "grip", "wrist", "pulling", "pushing", "elbow"],
      standard: repsStandard(3),
    },
    {
      key: "strict-muscle-up",
      name: "Strict ring muscle-up",
      measure: "reps",
      setting: "Full hang, feet clear of the floor",
      cues: [
        "Pull hard to the lower chest with a false grip",
        "Turn over quickly, chest over the rings",
        "Press out to support and pause there",
      ],
      caution:
        "Warm up the elbows and wrists well. Keep sets short and stop on sharp pain.",
      tags: ["rings", "grip", "wrist", "pulling", "pushing", "elbow", "max_effort"],
      standard: repsStandard(2, {
        effort: { maxRpe: 8 },
        sessionsRequired: 3,
        sessionsWindow: 4,
        minDaysOnRung: 14,
      }),
    },
  ],
};
