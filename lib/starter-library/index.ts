/**
 * The starter library: ladders seeded for every new team and for the demo.
 *
 * The progressions and numbers are common practice, no source; a coach should adjust them. Every
 * ladder is written in our own words.
 */
import { FRONT_LEVER_LINE } from "./front-lever-line";
import { HANDSTAND_LINE } from "./handstand-line";
import { HANDSTAND_PUSH_UP_LINE } from "./handstand-push-up-line";
import { L_SIT_LINE } from "./l-sit-line";
import { PRESS_LINE } from "./press-line";
import { RINGS_LINE } from "./rings-line";
import type { StarterLadder, StarterRung } from "./types";

export type { PrerequisiteRef, StarterLadder, StarterRung } from "./types";
export {
  FRONT_LEVER_LINE,
  HANDSTAND_LINE,
  HANDSTAND_PUSH_UP_LINE,
  L_SIT_LINE,
  PRESS_LINE,
  RINGS_LINE,
};

/** Shown with the starter library (design brief §5). */
export const STARTER_LIBRARY_NOTICE =
  "These ladders are general starting points. Adjust them to each athlete. Rungwise does not replace a qualified coach, physiotherapist or physician.";

/**
 * Seed order: ladders with no prerequisites first, so a seed can insert them in this order and
 * resolve every prerequisite to a rung that already exists.
 */
export const STARTER_LADDERS: readonly StarterLadder[] = [
  HANDSTAND_LINE,
  L_SIT_LINE,
  FRONT_LEVER_LINE,
  RINGS_LINE,
  HANDSTAND_PUSH_UP_LINE,
  PRESS_LINE,
];

/** The rung `rungKey` on ladder `ladderKey`, or `undefined`. */
export function findStarterRung(ladderKey: string, rungKey: string): StarterRung | undefined {
  return STARTER_LADDERS.find((ladder) => ladder.key === ladderKey)?.rungs.find(
    (rung) => rung.key === rungKey,
  );
}
