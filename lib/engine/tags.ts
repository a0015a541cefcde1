/**
 * Fixed vocabulary a coach tags rungs with. The pairing rules (fatigue-aware block warnings) read
 * these tags, so the list is closed: new tags need a rule review.
 */
export const RUNG_TAGS = [
  "hand_support",
  "grip",
  "wrist",
  "shoulder_flexion",
  "straight_arm",
  "max_effort",
  "inversion",
  "rings",
  "elbow",
  "core",
  "pulling",
  "pushing",
  "scapula",
  "compression",
] as const;

export type RungTag = (typeof RUNG_TAGS)[number];
