/**
 * Estimates and warnings for a block, shared by the API (server) and the block editor (browser) so
 * both show the same numbers. Pure: it only adapts block and rung data to lib/engine.
 *
 * Which rung: a slot points at a ladder, and every athlete works their own rung of it. A block on
 * its own has no athlete, so its estimate and warnings read each ladder's FIRST live rung (its
 * measure, its standard's value per set, its tags): the rung every newly assigned athlete starts
 * on, and the same answer for every coach looking at the block. An athlete's session (planForDay)
 * reads the athlete's current rung instead.
 */
import {
  blockDurationSec,
  pairingWarnings,
  sessionDurationSec,
  type DurationBlock,
  type Measure,
  type PairingWarning,
  type RungTag,
} from "@/lib/engine";

/** The rung an estimate reads for one slot. */
export interface RungForEstimate {
  name: string;
  measure: Measure;
  /** The standard's value per set: seconds, reps, seconds per lowering, or metres. */
  target: number;
  /** Lowerings per eccentric set. */
  lowerings: number | null;
  tags: readonly RungTag[];
}

export interface BlockForEstimate {
  rounds: number;
  restBetweenSlotsSec: number;
  restBetweenRoundsSec: number;
  slots: readonly { sets?: number | null; rung: RungForEstimate | null }[];
}

/** Change-over between blocks of one session (common practice, no source). */
export const REST_BETWEEN_BLOCKS_SEC = 60;

function toDurationBlock(block: BlockForEstimate): DurationBlock {
  return {
    rounds: block.rounds,
    restBetweenSlotsSec: block.restBetweenSlotsSec,
    restBetweenRoundsSec: block.restBetweenRoundsSec,
    // A ladder without a live rung has no work to estimate; its visits still cost the rests.
    slots: block.slots.map((slot) => ({
      measure: slot.rung?.measure ?? "hold_seconds",
      target: slot.rung?.target ?? 0,
      lowerings: slot.rung?.lowerings ?? null,
      sets: slot.sets ?? null,
    })),
  };
}

export function estimateBlockSec(block: BlockForEstimate): number {
  return Math.round(blockDurationSec(toDurationBlock(block)));
}

/** A day's blocks in order, with a change-over between blocks. */
export function estimateSessionSec(blocks: readonly BlockForEstimate[]): number {
  return Math.round(sessionDurationSec(blocks.map(toDurationBlock), { restBetweenBlocksSec: REST_BETWEEN_BLOCKS_SEC }));
}

/** Pairing warnings for the slot order; slots without a live rung carry no tags. */
export function blockWarnings(block: BlockForEstimate): PairingWarning[] {
  return pairingWarnings(
    block.slots.map((slot) => ({
      name: slot.rung?.name,
      tags: slot.rung?.tags ?? [],
      measure: slot.rung?.measure ?? "reps",
      target: slot.rung?.target ?? 0,
    })),
    block.rounds,
  );
}

/** "12 min", "45 s", "1 h 05 min": rounded to whole minutes above one minute. */
export function formatDuration(seconds: number): string {
  if (seconds < 60) return `${seconds} s`;
  const minutes = Math.round(seconds / 60);
  if (minutes < 60) return `${minutes} min`;
  return `${Math.floor(minutes / 60)} h ${String(minutes % 60).padStart(2, "0")} min`;
}
