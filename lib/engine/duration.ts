/**
 * Estimated time for a block (a superset done in rounds) and for a whole session of blocks.
 *
 * Sets and rounds: a block of N rounds does each slot once per round, one set per visit, so a
 * slot's sets default to the number of rounds. A slot with explicit `sets` spreads them over the
 * rounds, earlier rounds first: 5 sets over 3 rounds → 2, 2, 1; 2 sets over 3 rounds → 1, 1, 0.
 * Within a round, consecutive visits are separated by `restBetweenSlotsSec`; between rounds the
 * round rest replaces the slot rest; a round with no visits is skipped with its rest; nothing is
 * added after the last round.
 */
import type { Measure } from "./types";

/** Seconds of work per unit (common practice, no source). */
export const WORK_PACE = {
  secondsPerRep: 3,
  secondsPerMetre: 1,
  /** Set-up between lowerings of an eccentric set. */
  extraSecondsPerLowering: 2,
} as const;

export interface DurationSlot {
  measure: Measure;
  /** Seconds (hold, per lowering), reps, or metres, per set (per side for each-side measures). */
  target: number;
  /** Lowerings per eccentric set; 1 when absent. */
  lowerings?: number | null;
  /** Total sets of this slot in the block; defaults to the block's rounds. */
  sets?: number | null;
}

export interface DurationBlock {
  rounds: number;
  restBetweenSlotsSec: number;
  restBetweenRoundsSec: number;
  slots: readonly DurationSlot[];
}

/** Work seconds of one set; each-side measures count both sides. */
export function workSecondsPerSet(slot: DurationSlot): number {
  switch (slot.measure) {
    case "hold_seconds":
      return slot.target;
    case "hold_seconds_each_side":
      return 2 * slot.target;
    case "reps":
      return slot.target * WORK_PACE.secondsPerRep;
    case "reps_each_side":
      return 2 * slot.target * WORK_PACE.secondsPerRep;
    case "eccentric_seconds":
      return (slot.lowerings ?? 1) * (slot.target + WORK_PACE.extraSecondsPerLowering);
    case "distance_m":
      return slot.target * WORK_PACE.secondsPerMetre;
  }
}

/** Sets done in each round: `totalSets` spread over `rounds`, earlier rounds first. */
export function setsPerRound(totalSets: number, rounds: number): number[] {
  const base = Math.floor(totalSets / rounds);
  const extra = totalSets % rounds;
  return Array.from({ length: rounds }, (_, r) => base + (r < extra ? 1 : 0));
}

export function blockDurationSec(block: DurationBlock): number {
  const rounds = Math.max(0, Math.floor(block.rounds));
  if (rounds === 0) return 0;
  const plans = block.slots.map((slot) => ({
    perRound: setsPerRound(Math.max(0, Math.floor(slot.sets ?? rounds)), rounds),
    work: workSecondsPerSet(slot),
  }));
  let total = 0;
  let activeRounds = 0;
  for (let r = 0; r < rounds; r += 1) {
    let visits = 0;
    for (const plan of plans) {
      const sets = plan.perRound[r] as number;
      visits += sets;
      total += sets * plan.work;
    }
    if (visits === 0) continue;
    activeRounds += 1;
    total += (visits - 1) * block.restBetweenSlotsSec;
  }
  return total + Math.max(0, activeRounds - 1) * block.restBetweenRoundsSec;
}

export function sessionDurationSec(blocks: readonly DurationBlock[], options: { restBetweenBlocksSec?: number } = {}): number {
  const work = blocks.reduce((sum, block) => sum + blockDurationSec(block), 0);
  return work + Math.max(0, blocks.length - 1) * (options.restBetweenBlocksSec ?? 0);
}
