/**
 * Starter ladder: front lever.
 *
 * The progressions and numbers are common practice, no source; a coach should adjust them.
 */
import { eccentricStandard, holdStandard, repsStandard } from "./standards";
import type { StarterLadder } from "./types";

export const FRONT_LEVER_LINE: StarterLadder = {
  key: "front-lever",
  name: "Front lever",
  targetSkill: "Full front lever held for 8 seconds",
  notes:
    "Straight-arm pulling built by opening the body bit by bit: tuck, flat-back tuck, one leg, straddle, full. Short crisp holds; end the set when the hips drop.",
  promotionMode: "auto",
  rungs: [
    {
      key: "scapula-pull",
      name: "Hanging shoulder-blade pulls",
      measure: "reps",
      setting: "Hang from a pull-up bar, hands shoulder-width",
      cues: [
        "Arms stay straight the whole time",
        "Pull the shoulders down and back to lift the body a little",
        "Pause at the top, then lower slowly",
      ],
      tags: ["pulling", "straight_arm", "scapula", "grip"],
      standard: repsStandard(10, { effort: { minRir: 3 }, stepDown: null }),
    },
    {
      key: "hollow-hold",
      name: "Hollow body hold",
      measure: "hold_seconds",
      setting: "On the floor; bend the knees to make it easier",
      cues: [
        "Lower back pressed into the floor",
        "Arms by the ears, legs long and low",
        "Small breaths; don't let the back lift",
      ],
      tags: ["core"],
      standard: holdStandard(30),
    },
    {
      key: "tuck-lever",
      name: "Tuck front lever",
      measure: "hold_seconds",
      setting: "Pull-up bar, hands shoulder-width",
      cues: [
        "Straight arms; push the bar down toward the hips",
        "Knees to the chest, hips level with the shoulders",
        "Keep the back rounded and the shoulders down",
      ],
      caution: "Straight-arm pulling loads the elbows and the front of the arm: build up slowly.",
      tags: ["straight_arm", "pulling", "core", "scapula", "grip"],
      standard: holdStandard(15),
    },
    {
      key: "flat-tuck-lever",
      name: "Flat-back tuck front lever",
      measure: "hold_seconds",
      setting: "Pull-up bar, hands shoulder-width",
      cues: [
        "Open the hips until the back is flat",
        "Knees stay bent at about a right angle",
        "Hips level with the shoulders; stop when they sag",
      ],
      caution: "Stop on sharp elbow or shoulder pain.",
      tags: ["straight_arm", "pulling", "core", "scapula", "grip"],
      standard: holdStandard(12, { minDaysOnRung: 14 }),
    },
    {
      key: "one-leg-lever",
      name: "One-leg front lever",
      measure: "hold_seconds_each_side",
      setting: "One leg straight, the other tucked; swap legs each set",
      cues: [
        "Straight leg long and in line with the body",
        "Tucked knee stays close to the chest",
        "Log the weaker side",
      ],
      caution: "Stop on sharp elbow or shoulder pain.",
      tags: ["straight_arm", "pulling", "core", "scapula", "grip"],
      standard: holdStandard(8, { minDaysOnRung: 14 }),
    },
    {
      key: "straddle-lever-lowering",
      name: "Straddle lever lowering",
      measure: "eccentric_seconds",
      setting: "Start in a tuck with the hips at bar height, open to a straddle, then lower",
      cues: [
        "Open to a wide straddle with straight arms",
        "Lower slowly through level, body long",
        "End the rep when the arms bend",
      ],
      caution: "Few lowerings, full rest; stop on sharp elbow or shoulder pain.",
      tags: ["straight_arm", "pulling", "core", "scapula", "grip"],
      standard: eccentricStandard({ lowerings: 3, seconds: 4 }),
    },
    {
      key: "straddle-lever",
      name: "Straddle front lever",
      measure: "hold_seconds",
      setting: "Pull-up bar, legs in a wide straddle",
      cues: [
        "Hips level, legs wide and straight",
        "Push the bar toward the hips",
        "Bring the legs closer together as it gets easier",
      ],
      caution: "Near-maximal straight-arm work: long rests, stop on sharp elbow pain.",
      tags: ["straight_arm", "pulling", "core", "scapula", "grip", "max_effort"],
      standard: holdStandard(8, { effort: { maxRpe: 8 }, minDaysOnRung: 14 }),
    },
    {
      key: "full-lever",
      name: "Full front lever",
      measure: "hold_seconds",
      setting: "Pull-up bar, legs together",
      cues: [
        "One straight line from shoulders to toes",
        "Squeeze the legs and glutes together",
        "Stop the hold the moment the hips drop",
      ],
      caution: "Near-maximal straight-arm work: long rests, stop on sharp elbow pain.",
      tags: ["straight_arm", "pulling", "core", "scapula", "grip", "max_effort"],
      standard: holdStandard(8, {
        effort: { maxRpe: 8 },
        sessionsRequired: 3,
        sessionsWindow: 4,
        minDaysOnRung: 14,
      }),
    },
  ],
};
