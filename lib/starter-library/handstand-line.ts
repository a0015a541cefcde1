/**
 * Starter ladder: freestanding handstand.
 *
 * The progressions and numbers are common practice, no source; a coach should adjust them.
 */
import { holdStandard, repsStandard } from "./standards";
import type { StarterLadder } from "./types";

export const HANDSTAND_LINE: StarterLadder = {
  key: "freestanding-handstand",
  name: "Freestanding handstand",
  targetSkill: "Freestanding handstand held for 30 seconds",
  notes:
    "From feet-on-a-box holds to balancing on your own. The wall builds the line and the strength; the later rungs are about balance, so short fresh attempts beat long tired ones.",
  promotionMode: "auto",
  rungs: [
    {
      key: "box-pike-hold",
      name: "Pike hold, feet on a box",
      measure: "hold_seconds",
      setting: "Box about hip height, pushed against a wall so it cannot slide",
      cues: [
        "Hands shoulder-width, fingers spread",
        "Walk the hands in until the hips sit over the shoulders",
        "Push the floor away: tall shoulders, ears between the arms",
      ],
      caution:
        "Warm up the wrists first. Keep the box against a wall, and step down rather than roll if you lose it.",
      tags: ["hand_support", "wrist", "shoulder_flexion", "inversion"],
      standard: holdStandard(30, { effort: { maxRpe: 6 }, stepDown: null }),
    },
    {
      key: "wall-walk-up",
      name: "Wall walk-up",
      measure: "reps",
      setting: "Start in a push-up position with your feet at the wall",
      cues: [
        "Walk the feet up and the hands in, in small steps",
        "Only go as close as you can walk back out of",
        "Walk down with the same control",
      ],
      caution:
        "Clear space and a mat under you; have a spotter beside you for the first tries at the wall.",
      tags: ["hand_support", "wrist", "shoulder_flexion", "inversion"],
      standard: repsStandard(4),
    },
    {
      key: "chest-to-wall-hold",
      name: "Chest-to-wall handstand",
      measure: "hold_seconds",
      setting: "Walk up the wall until the hands are 10–20 cm from it",
      cues: [
        "Belly and nose facing the wall, body in one straight line",
        "Squeeze the legs together and point the toes",
        "Shoulders open, pushing tall through the hands",
      ],
      caution:
        "Practise walking down the wall before you hold for long. Stop on sharp wrist or shoulder pain.",
      tags: ["hand_support", "wrist", "shoulder_flexion", "inversion"],
      standard: holdStandard(45),
    },
    {
      key: "turn-out-bail",
      name: "Turn-out bail",
      measure: "reps_each_side",
      setting: "From a small kick-up, or with a spotter holding the legs",
      cues: [
        "Lift one hand and turn the hips toward it",
        "Step down beside your hands, like half a cartwheel",
        "Practise both sides until it happens without thinking",
      ],
      caution:
        "Learn this on soft flooring with a spotter close before trying any freestanding balance.",
      tags: ["hand_support", "wrist", "inversion"],
      standard: repsStandard(5, { sets: 2, effort: { maxRpe: 6 } }),
    },
    {
      key: "wall-toe-pulls",
      name: "Toe pulls off the wall",
      measure: "hold_seconds",
      setting: "Chest to the wall, hands close to it; log the longest balance of each set",
      cues: [
        "Press into the fingertips to bring the toes off the wall",
        "Hold the balance for as long as it stays calm",
        "Let the toes return to the wall softly",
      ],
      caution:
        "The wall is in front of you the whole time; if you tip, bring the toes back to it rather than twisting off.",
      tags: ["hand_support", "wrist", "shoulder_flexion", "inversion"],
      standard: holdStandard(5, { sets: 5 }),
    },
    {
      key: "kick-up-wall-tap",
      name: "Kick-up to a light wall touch",
      measure: "reps",
      setting: "Facing the wall, hands one hand-length from it",
      cues: [
        "Lunge, reach long, kick with a straight back leg",
        "Arrive with the heels just brushing the wall",
        "Use a little less force each time",
      ],
      caution:
        "Start close to the wall so the heels land softly, and know the turn-out bail before you kick.",
      tags: ["hand_support", "wrist", "shoulder_flexion", "inversion"],
      standard: repsStandard(6),
    },
    {
      key: "free-hold-short",
      name: "Freestanding handstand, first seconds",
      measure: "hold_seconds",
      setting: "Open floor with a wall or a spotter nearby",
      cues: [
        "Kick up with just enough force",
        "Balance through the fingers and heels of the hands, not the hips",
        "Bail out on purpose when the balance is gone",
      ],
      caution:
        "Keep a spotter or a wall close until the turn-out bail is automatic.",
      tags: ["hand_support", "wrist", "shoulder_flexion", "inversion"],
      standard: holdStandard(5, { sets: 5 }),
    },
    {
      key: "free-hold-steady",
      name: "Freestanding handstand, 15 seconds",
      measure: "hold_seconds",
      setting: "Open floor",
      cues: [
        "Stack wrists, shoulders, hips and ankles",
        "Small corrections through the fingers",
        "Breathe; don't hold your breath to hold the balance",
      ],
      caution:
        "Soft floor and clear space, with a wall or a spotter nearby. Stop when the holds get sloppy.",
      tags: ["hand_support", "wrist", "shoulder_flexion", "inversion"],
      standard: holdStandard(15, { minDaysOnRung: 14 }),
    },
    {
      key: "free-hold-long",
      name: "Freestanding handstand, 30 seconds",
      measure: "hold_seconds",
      setting: "Open floor",
      cues: [
        "Same shape every time you arrive",
        "Push tall all the way through the hold",
        "Come down on purpose, not by falling",
      ],
      caution:
        "Clear space, with a wall or a spotter nearby on tired days. Stop on sharp wrist pain.",
      tags: ["hand_support", "wrist", "shoulder_flexion", "inversion"],
      standard: holdStandard(30, { sessionsRequired: 3, sessionsWindow: 4, minDaysOnRung: 14 }),
    },
  ],
};
