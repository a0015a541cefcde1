/**
 * Fatigue-aware warnings for the order of slots in a block, read from the rungs' tags. One rule
 * table; every rule is common practice, no source (design.md §4). Rounds repeat the slot order,
 * so with more than one round the last slot is followed by the first one again.
 */
import type { RungTag } from "./tags";
import type { Measure } from "./types";

export interface PairingSlot {
  /** Shown in messages, e.g. the rung's name; "slot 3" when absent. */
  name?: string;
  tags: readonly RungTag[];
  measure: Measure;
  /** The rung's target per set (seconds for holds). */
  target: number;
}

export type PairingRuleId =
  | "grip_after_hand_support"
  | "max_effort_back_to_back"
  | "same_joint_wrist"
  | "same_joint_elbow"
  | "same_joint_shoulder_flexion";

export interface PairingWarning {
  rule: PairingRuleId;
  /** 0-based: [earlier slot, the slot that follows it]. */
  slotIndexes: [number, number];
  message: string;
}

interface PairingRule {
  rule: PairingRuleId;
  /** Order doesn't matter: with 2 slots, A→B and the wrap B→A are one warning. */
  symmetric: boolean;
  applies: (before: PairingSlot, after: PairingSlot) => boolean;
  message: (before: string, after: string) => string;
}

/** Long hand-support holds fatigue the forearms (common practice, no source). */
export const LONG_HAND_SUPPORT_SEC = 30;

const has = (slot: PairingSlot, tag: RungTag): boolean => slot.tags.includes(tag);
const isHold = (slot: PairingSlot): boolean => slot.measure === "hold_seconds" || slot.measure === "hold_seconds_each_side";
const longHandSupport = (slot: PairingSlot): boolean =>
  has(slot, "hand_support") && ((isHold(slot) && slot.target >= LONG_HAND_SUPPORT_SEC) || has(slot, "max_effort"));
const both = (tag: RungTag) => (a: PairingSlot, b: PairingSlot) => has(a, tag) && has(b, tag);

// common practice, no source
export const PAIRING_RULES: readonly PairingRule[] = [
  {
    rule: "grip_after_hand_support",
    symmetric: false,
    applies: (before, after) => longHandSupport(before) && has(after, "rings") && has(after, "grip"),
    message: (before, after) => `${after} is grip-heavy ring work right after long hand-support work in ${before}: forearms and grip start tired`,
  },
  {
    rule: "max_effort_back_to_back",
    symmetric: true,
    applies: both("max_effort"),
    message: (before, after) => `${before} and ${after} are both max effort, back to back: the second starts tired`,
  },
  {
    rule: "same_joint_wrist",
    symmetric: true,
    applies: both("wrist"),
    message: (before, after) => `${before} and ${after} both load the wrists, back to back`,
  },
  {
    rule: "same_joint_elbow",
    symmetric: true,
    // Bent-arm elbow work is routine; straight-arm loading on both sides is the strain to spread out.
    applies: (a, b) => both("elbow")(a, b) && both("straight_arm")(a, b),
    message: (before, after) => `${before} and ${after} both load straight-arm elbows, back to back`,
  },
  {
    rule: "same_joint_shoulder_flexion",
    symmetric: true,
    applies: both("shoulder_flexion"),
    message: (before, after) => `${before} and ${after} both load the shoulders overhead, back to back`,
  },
];

function labelOf(slots: readonly PairingSlot[], index: number): string {
  const name = slots[index]?.name;
  return name ? `slot ${index + 1} (${name})` : `slot ${index + 1}`;
}

function capitalise(text: string): string {
  return text.charAt(0).toUpperCase() + text.slice(1);
}

export function pairingWarnings(slots: readonly PairingSlot[], rounds: number): PairingWarning[] {
  const pairs: { i: number; j: number; wrap: boolean }[] = [];
  for (let i = 0; i + 1 < slots.length; i += 1) pairs.push({ i, j: i + 1, wrap: false });
  if (rounds > 1 && slots.length >= 2) pairs.push({ i: slots.length - 1, j: 0, wrap: true });

  const warnings: PairingWarning[] = [];
  for (const { i, j, wrap } of pairs) {
    const before = slots[i] as PairingSlot;
    const after = slots[j] as PairingSlot;
    for (const rule of PAIRING_RULES) {
      if (wrap && rule.symmetric && slots.length === 2) continue;
      if (!rule.applies(before, after)) continue;
      const text = rule.message(labelOf(slots, i), labelOf(slots, j));
      warnings.push({ rule: rule.rule, slotIndexes: [i, j], message: capitalise(wrap ? `${text} (from the end of one round into the next)` : text) });
    }
  }
  return warnings;
}
