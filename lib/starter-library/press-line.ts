/**
 * Starter ladder: straddle press to handstand.
 *
 * The progressions and numbers are common practice, no source; a coach should adjust them.
 */
import { eccentricStandard, holdStandard, repsStandard } from "./standards";
import type { StarterLadder } from "./types";

export const PRESS_LINE: StarterLadder = {
  key: "press-to-handstand",
  name: "Press to handstand",
  targetSkill: "Straddle press to handstand from the floor",
  notes:
    "Compression and lean first, then presses helped by a box, the wall or a spotter. Reps are few and slow, and the coach confirms each step up.",
  promotionMode: "approve",
  rungs: [
    {
      key: "seated-pike-lift",
      name: "Seated pike leg lifts",
      measure: "reps",
      setting: "Sit in a pike with the hands flat beside the knees",
      cues: [
        "Sit tall with the knees locked",
        "Lift both heels off the floor and pause",
        "Lower with control; don't rock back",
      ],
      tags: ["compression", "core"],
      standard: repsStandard(10, { stepDown: null }),
    },
    {
      key: "straddle-leg-lift",
      name: "Straddle leg lifts, hands in front",
      measure: "reps",
      setting: "Wide straddle sit, hands on the floor between the legs",
      cues: [
        "Press the hands down and lean forward a little",
        "Lift both legs at once, kneecaps to the ceiling",
        "Small clean lifts beat big swinging ones",
      ],
      tags: ["compression", "core"],
      standard: repsStandard(8),
    },
    {
      key: "straddle-stand-lean",
      name: "Straddle stand lean",
      measure: "hold_seconds",
      setting: "Wide straddle stand, hands flat on the floor between the feet",
      cues: [
        "Straight arms; shift the shoulders past the hands",
        "Round the upper back and push the floor away",
        "Feel the feet go light, then hold there",
      ],
      caution: "Heavy on the wrists: warm them up and stop on sharp pain.",
      tags: ["hand_support", "wrist", "straight_arm", "compression", "shoulder_flexion"],
      standard: holdStandard(10),
    },
    {
      key: "box-straddle-press",
      name: "Straddle press from a box",
      measure: "reps",
      setting: "Feet on a box about knee height, hands on the floor; lower the box as it gets easy",
      cues: [
        "Lean the shoulders forward before the hips rise",
        "Lift the hips over the hands, then open the legs wide",
        "Bring the legs up slowly to the wall or the spotter's hands",
      ],
      caution:
        "Set up beside a wall or with a spotter at the hips: first inversions are where people tip over.",
      tags: ["hand_support", "wrist", "straight_arm", "compression", "shoulder_flexion", "inversion"],
      prerequisites: [{ ladder: "freestanding-handstand", rung: "chest-to-wall-hold" }],
      standard: repsStandard(3, { minDaysOnRung: 14 }),
    },
    {
      key: "wall-straddle-press",
      name: "Straddle press, back to the wall",
      measure: "reps",
      setting: "Hands about 30 cm from the wall; let the hips slide up it",
      cues: [
        "Hips meet the wall early and slide up it",
        "Keep pushing the floor away with straight arms",
        "Bring the legs together only at the top",
      ],
      caution:
        "The wall carries you through the hard part; have a spotter too until you can bail out of a handstand.",
      tags: ["hand_support", "wrist", "straight_arm", "compression", "shoulder_flexion", "inversion"],
      prerequisites: [{ ladder: "freestanding-handstand", rung: "turn-out-bail" }],
      standard: repsStandard(3, { minDaysOnRung: 14 }),
    },
    {
      key: "straddle-press-lowering",
      name: "Straddle press lowering",
      measure: "eccentric_seconds",
      setting: "Start in a handstand with your back to the wall or a spotter holding the hips",
      cues: [
        "Open to a wide straddle before you lean",
        "The shoulders travel forward as the hips come down",
        "Feet touch down softly, as late as you can",
      ],
      caution:
        "Use a wall or a spotter for the entry, and stop the set before the shoulders give out.",
      tags: ["hand_support", "wrist", "straight_arm", "compression", "shoulder_flexion", "inversion"],
      prerequisites: [{ ladder: "freestanding-handstand", rung: "free-hold-short" }],
      standard: eccentricStandard({ lowerings: 3, seconds: 5 }, { minDaysOnRung: 14 }),
    },
    {
      key: "blocks-straddle-press",
      name: "Straddle press, hands on blocks",
      measure: "reps",
      setting: "Hands on parallettes or blocks 15–20 cm high",
      cues: [
        "The extra height gives the feet room to clear the floor",
        "Lean first, lift second",
        "Finish tall and hold the handstand for a breath",
      ],
      caution:
        "A spotter at the hips for the first sessions, and blocks that cannot tip over.",
      tags: [
        "hand_support",
        "wrist",
        "straight_arm",
        "compression",
        "shoulder_flexion",
        "inversion",
        "max_effort",
      ],
      prerequisites: [
        { ladder: "freestanding-handstand", rung: "free-hold-steady" },
        { ladder: "l-sit-to-v-sit", rung: "l-sit-floor" },
      ],
      standard: repsStandard(2, { effort: { maxRpe: 8 }, minDaysOnRung: 14 }),
    },
    {
      key: "floor-straddle-press",
      name: "Straddle press from the floor",
      measure: "reps",
      setting: "Hands flat on the floor",
      cues: [
        "Hands close to the feet, shoulders over the fingers",
        "Hips rise over the hands before the legs leave the floor",
        "Slow and smooth all the way to the top",
      ],
      caution:
        "Keep a spotter or a wall nearby on tired days. Stop on sharp wrist or shoulder pain.",
      tags: [
        "hand_support",
        "wrist",
        "straight_arm",
        "compression",
        "shoulder_flexion",
        "inversion",
        "max_effort",
      ],
      prerequisites: [{ ladder: "l-sit-to-v-sit", rung: "high-l-sit" }],
      standard: repsStandard(2, {
        effort: { maxRpe: 8 },
        sessionsRequired: 3,
        sessionsWindow: 4,
        minDaysOnRung: 14,
      }),
    },
  ],
};
