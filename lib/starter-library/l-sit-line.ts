/**
 * Starter ladder: L-sit to V-sit.
 *
 * The progressions and numbers are common practice, no source; a coach should adjust them.
 */
import { holdStandard, repsStandard } from "./standards";
import type { StarterLadder } from "./types";

const SUPPORT_TAGS = ["hand_support", "wrist", "straight_arm", "core", "compression", "scapula"] as const;

export const L_SIT_LINE: StarterLadder = {
  key: "l-sit-to-v-sit",
  name: "L-sit to V-sit",
  targetSkill: "V-sit held for 5 seconds on parallettes",
  notes:
    "Straight-arm support and compression, from a tucked sit to legs high above the hips. Hold short and strong; a sagging set does not count.",
  promotionMode: "auto",
  rungs: [
    {
      key: "tuck-sit-hold",
      name: "Tuck sit on blocks",
      measure: "hold_seconds",
      setting: "Parallettes or two sturdy blocks",
      cues: [
        "Straight arms, shoulders pushed down",
        "Knees pulled up toward the chest",
        "Feet fully off the floor",
      ],
      caution: "Warm up the wrists; parallettes are kinder to them than flat hands.",
      tags: SUPPORT_TAGS,
      standard: holdStandard(20, { stepDown: null }),
    },
    {
      key: "one-leg-l-sit",
      name: "One-leg L-sit",
      measure: "hold_seconds_each_side",
      setting: "On blocks; one leg straight, the other tucked",
      cues: [
        "Straight leg locked and level with the hips",
        "Push the blocks away to lift the hips",
        "Swap legs; log the weaker side",
      ],
      tags: SUPPORT_TAGS,
      standard: holdStandard(10),
    },
    {
      key: "l-sit-blocks",
      name: "L-sit on blocks",
      measure: "hold_seconds",
      setting: "Parallettes or two sturdy blocks",
      cues: [
        "Both legs straight and together",
        "Toes pointed, knees locked",
        "Shoulders down; don't shrug",
      ],
      tags: SUPPORT_TAGS,
      standard: holdStandard(20),
    },
    {
      key: "l-sit-floor",
      name: "L-sit on the floor",
      measure: "hold_seconds",
      setting: "Hands flat on the floor beside the hips",
      cues: [
        "Lean the shoulders forward a little",
        "Pull the legs up actively; don't just hold them",
        "Push the floor away to clear the heels",
      ],
      caution: "Flat hands load the wrists more: warm them up and stop on sharp pain.",
      tags: SUPPORT_TAGS,
      standard: holdStandard(15),
    },
    {
      key: "l-sit-leg-raise",
      name: "Leg raises from an L-sit",
      measure: "reps",
      setting: "On blocks, starting from an L-sit",
      cues: [
        "Hold the L, then lift the legs higher",
        "Knees stay locked",
        "Lower back to the L, not to the floor",
      ],
      tags: SUPPORT_TAGS,
      standard: repsStandard(6, { effort: { minRir: 2 } }),
    },
    {
      key: "high-l-sit",
      name: "High L-sit",
      measure: "hold_seconds",
      setting: "Parallettes; feet clearly above hip height",
      cues: [
        "Lean back a little as the legs rise",
        "Arms straight, shoulders pushed down",
        "Squeeze the thighs toward the chest",
      ],
      tags: SUPPORT_TAGS,
      standard: holdStandard(10, { minDaysOnRung: 14 }),
    },
    {
      key: "v-sit-45",
      name: "V-sit, legs at 45°",
      measure: "hold_seconds",
      setting: "Parallettes",
      cues: [
        "Hands slightly behind the hips",
        "Legs at about 45° above level",
        "Keep the arms locked as you lean back",
      ],
      caution:
        "Hard on the front of the shoulders and the wrists: warm up well and stop on sharp pain.",
      tags: SUPPORT_TAGS,
      standard: holdStandard(8, { effort: { maxRpe: 8 }, minDaysOnRung: 14 }),
    },
    {
      key: "v-sit",
      name: "V-sit",
      measure: "hold_seconds",
      setting: "Parallettes",
      cues: [
        "Legs close to the chest, toes above the head",
        "Arms locked, shoulders open behind you",
        "Small breaths; hold the shape, then lower",
      ],
      caution:
        "Hard on the front of the shoulders and the wrists: warm up well and stop on sharp pain.",
      tags: [...SUPPORT_TAGS, "max_effort"],
      standard: holdStandard(5, {
        effort: { maxRpe: 8 },
        sessionsRequired: 3,
        sessionsWindow: 4,
        minDaysOnRung: 14,
      }),
    },
  ],
};
