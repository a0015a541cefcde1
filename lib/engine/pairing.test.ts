import { describe, expect, it } from "vitest";
import { pairingWarnings, type PairingSlot } from "./pairing";

// Every rule here is common practice, no source (design.md §4 fatigue-aware warnings).
const handstand = (target: number, extra: PairingSlot["tags"] = []): PairingSlot => ({
  name: "Wall handstand",
  tags: ["hand_support", "inversion", ...extra],
  measure: "hold_seconds",
  target,
});
const ringHang: PairingSlot = { name: "False-grip hang", tags: ["rings", "grip"], measure: "hold_seconds", target: 20 };
const core: PairingSlot = { name: "Hollow hold", tags: ["core"], measure: "hold_seconds", target: 30 };
const rows: PairingSlot = { name: "Ring row", tags: ["rings", "pulling"], measure: "reps", target: 8 };

describe("pairingWarnings (common practice, no source)", () => {
  it("warns when grip-heavy ring work follows a hold of ≥ 30 s on the hands", () => {
    expect(pairingWarnings([handstand(30), ringHang, core], 1)).toEqual([
      {
        rule: "grip_after_hand_support",
        slotIndexes: [0, 1],
        message: "Slot 2 (False-grip hang) is grip-heavy ring work right after long hand-support work in slot 1 (Wall handstand): forearms and grip start tired",
      },
    ]);
  });

  it.each([
    ["a 29 s hold is not long", [handstand(29), ringHang], 0],
    ["max effort on the hands counts whatever the time", [handstand(10, ["max_effort"]), ringHang], 1],
    ["ring work without grip tag is fine", [handstand(40), rows], 0],
    ["the other order is fine", [ringHang, handstand(40)], 0],
  ])("%s", (_label, slots, count) => {
    expect(pairingWarnings(slots as PairingSlot[], 1).filter((w) => w.rule === "grip_after_hand_support")).toHaveLength(count as number);
  });

  it("warns on two max-effort slots back to back, including the wrap across rounds", () => {
    const press: PairingSlot = { name: "Press", tags: ["max_effort", "pushing"], measure: "reps", target: 3 };
    const lever: PairingSlot = { name: "Lever", tags: ["max_effort", "pulling"], measure: "hold_seconds", target: 8 };
    const slots = [press, core, lever];
    expect(pairingWarnings(slots, 1)).toEqual([]);
    const wrapped = pairingWarnings(slots, 3);
    expect(wrapped.map((w) => [w.rule, w.slotIndexes])).toEqual([["max_effort_back_to_back", [2, 0]]]);
    expect(wrapped[0]?.message).toBe(
      "Slot 3 (Lever) and slot 1 (Press) are both max effort, back to back: the second starts tired (from the end of one round into the next)",
    );
  });

  it("with two slots, a symmetric rule warns once even across rounds, an ordered one per direction", () => {
    const a: PairingSlot = { tags: ["max_effort", "hand_support"], measure: "hold_seconds", target: 40 };
    const b: PairingSlot = { tags: ["max_effort", "rings", "grip"], measure: "hold_seconds", target: 10 };
    const warnings = pairingWarnings([a, b], 4);
    expect(warnings.map((w) => `${w.rule} ${w.slotIndexes.join("→")}`)).toEqual(["grip_after_hand_support 0→1", "max_effort_back_to_back 0→1"]);
  });

  it.each([
    ["wrist → wrist", ["wrist"], ["wrist"], "same_joint_wrist"],
    ["straight-arm elbow → straight-arm elbow", ["elbow", "straight_arm"], ["elbow", "straight_arm"], "same_joint_elbow"],
    ["shoulder flexion → shoulder flexion", ["shoulder_flexion"], ["shoulder_flexion"], "same_joint_shoulder_flexion"],
  ] as const)("warns on %s", (_label, first, second, rule) => {
    const slots: PairingSlot[] = [
      { tags: [...first], measure: "hold_seconds", target: 10 },
      { tags: [...second], measure: "hold_seconds", target: 10 },
    ];
    expect(pairingWarnings(slots, 1).map((w) => w.rule)).toEqual([rule]);
  });

  it("bent-arm elbow work next to straight-arm work is not flagged", () => {
    const slots: PairingSlot[] = [
      { tags: ["elbow", "straight_arm"], measure: "hold_seconds", target: 10 },
      { tags: ["elbow", "pushing"], measure: "reps", target: 8 },
    ];
    expect(pairingWarnings(slots, 1)).toEqual([]);
  });

  it("a single slot repeated over rounds is just sets, not a pairing", () => {
    expect(pairingWarnings([{ tags: ["max_effort", "wrist"], measure: "hold_seconds", target: 10 }], 5)).toEqual([]);
  });
});
