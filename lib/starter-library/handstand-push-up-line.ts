/**
 * Starter ladder: vertical pressing toward the handstand push-up.
 *
 * The progressions and numbers are common practice, no source; a coach should adjust them.
 */
import { eccentricStandard, repsStandard } from "./standards";
import type { StarterLadder } from "./types";

export const HANDSTAND_PUSH_UP_LINE: StarterLadder = {
  key: "handstand-push-up",
  name: "Handstand push-up",
  targetSkill: "Full-range handstand push-up against the wall",
  notes:
    "Overhead pressing from pike push-ups to full push-ups against the wall. Earn the range before the reps.",
  promotionMode: "auto",
  rungs: [
    {
      key: "pike-push-up",
      name: "Pike push-up",
      measure: "reps",
      setting: "Feet on the floor, hips high",
      cues: [
        "Hips high, weight over the hands",
        "Lower the head in front of the hands to make a triangle",
        "Elbows travel back, not out wide",
      ],
      caution: "Warm up the wrists and shoulders first.",
      tags: ["hand_support", "wrist", "pushing", "shoulder_flexion"],
      standard: repsStandard(8, { effort: { minRir: 2 }, stepDown: null }),
    },
    {
      key: "low-box-pike-push-up",
      name: "Pike push-up, feet on a low box",
      measure: "reps",
      setting: "Box about knee height",
      cues: [
        "Walk the hands in until the hips are high",
        "Head lowers to a spot in front of the hands",
        "Press back up to long arms",
      ],
      caution: "Keep the box on a non-slip floor; stop on sharp wrist or shoulder pain.",
      tags: ["hand_support", "wrist", "pushing", "shoulder_flexion"],
      standard: repsStandard(8, { effort: { minRir: 2 } }),
    },
    {
      key: "high-box-pike-push-up",
      name: "Pike push-up, feet on a high box",
      measure: "reps",
      setting: "Box about hip height, hips stacked over the hands",
      cues: [
        "Hips over the shoulders, legs bent at the hips",
        "Lower the head slowly to a mat",
        "Push the floor away until the arms are straight",
      ],
      caution:
        "Put the box against a wall so it cannot slide, and lower the head under control onto a mat.",
      tags: ["hand_support", "wrist", "pushing", "shoulder_flexion", "inversion"],
      prerequisites: [{ ladder: "freestanding-handstand", rung: "box-pike-hold" }],
      standard: repsStandard(6, { effort: { minRir: 2 } }),
    },
    {
      key: "wall-hspu-lowering",
      name: "Wall handstand push-up lowering",
      measure: "eccentric_seconds",
      setting: "Kick up with your back to the wall, folded mat under the head",
      cues: [
        "Lower slowly, counting the seconds out loud",
        "The head lands a little in front of the hands",
        "Come down to the feet to reset; no pressing up yet",
      ],
      caution:
        "Wall behind you and a folded mat under your head. Never drop onto the head; stop on any neck pain.",
      tags: ["hand_support", "wrist", "pushing", "shoulder_flexion", "inversion", "elbow"],
      prerequisites: [{ ladder: "freestanding-handstand", rung: "kick-up-wall-tap" }],
      standard: eccentricStandard({ lowerings: 3, seconds: 5 }),
    },
    {
      key: "wall-hspu-partial",
      name: "Wall handstand push-up to a raised target",
      measure: "reps",
      setting:
        "Head touches a stack of folded mats about a hand's width high; take a mat away as it gets easy",
      cues: [
        "Touch the mats lightly; don't rest on them",
        "Press back to straight arms and tall shoulders",
        "Ribs in; don't arch away from the wall",
      ],
      caution:
        "Wall behind you and a soft target under the head. Stop on neck pain or sharp shoulder pain.",
      tags: ["hand_support", "wrist", "pushing", "shoulder_flexion", "inversion", "elbow"],
      standard: repsStandard(5, { effort: { minRir: 2 } }),
    },
    {
      key: "wall-hspu-single",
      name: "Full wall handstand push-up, singles",
      measure: "reps",
      setting: "Head to a thin mat, back to the wall",
      cues: [
        "Lower with the same control as the lowerings",
        "Drive up through the whole hand",
        "One clean rep, full rest, repeat",
      ],
      caution:
        "Wall behind you and a thin mat under the head. Full rest between sets; stop on neck or sharp shoulder pain.",
      tags: ["hand_support", "wrist", "pushing", "shoulder_flexion", "inversion", "elbow", "max_effort"],
      standard: repsStandard(1, { sets: 4, effort: { maxRpe: 8 }, minDaysOnRung: 14 }),
    },
    {
      key: "wall-hspu-sets",
      name: "Full wall handstand push-ups, sets of five",
      measure: "reps",
      setting: "Head to a thin mat, back to the wall",
      cues: [
        "Same depth on every rep",
        "Keep the elbows from flaring as you tire",
        "End the set when a rep slows right down",
      ],
      caution:
        "Wall behind you and a thin mat under the head. Stop on neck or sharp shoulder pain.",
      tags: ["hand_support", "wrist", "pushing", "shoulder_flexion", "inversion", "elbow", "max_effort"],
      standard: repsStandard(5, {
        effort: { maxRpe: 8 },
        sessionsRequired: 3,
        sessionsWindow: 4,
        minDaysOnRung: 14,
      }),
    },
  ],
};
