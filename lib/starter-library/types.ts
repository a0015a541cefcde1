/**
 * Shapes of the starter library: the ladders seeded for every new team and for the demo.
 *
 * The progressions and numbers in this library are common practice, no source; a coach should
 * adjust them for each athlete.
 */
import type { RungTag } from "../engine/tags";
import type { Measure, PromotionMode, Standard } from "../engine/types";

/** A rung on another ladder that must be reached before this rung can be promoted to. */
export interface PrerequisiteRef {
  /** `StarterLadder.key` of a different ladder. */
  readonly ladder: string;
  /** `StarterRung.key` on that ladder. */
  readonly rung: string;
}

export interface StarterRung {
  /** Stable slug, unique within its ladder (kebab-case). */
  readonly key: string;
  readonly name: string;
  readonly measure: Measure;
  /** Assistance, box height, band, strap length… in plain words. */
  readonly setting?: string;
  /**
   * 2–4 short coaching cues, one per entry. An array (not a string with line breaks) so every
   * screen can render them as a list without parsing.
   */
  readonly cues: readonly string[];
  /** Short safety note where it matters (wall or spotter, wrist prep, elbow load, sharp pain). */
  readonly caution?: string;
  readonly tags: readonly RungTag[];
  /** Rungs on other ladders only; never the same ladder (ladder order already covers that). */
  readonly prerequisites?: readonly PrerequisiteRef[];
  readonly standard: Readonly<Standard>;
}

export interface StarterLadder {
  /** Stable slug, unique across the library (kebab-case). */
  readonly key: string;
  readonly name: string;
  readonly targetSkill: string;
  /** One or two sentences for the coach. */
  readonly notes: string;
  readonly promotionMode: PromotionMode;
  /** In order, easiest first. */
  readonly rungs: readonly StarterRung[];
}
