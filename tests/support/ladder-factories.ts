// Builders for ladder tests: valid rung and ladder bodies, and ladders written through the real operation.
import { randomUUID } from "node:crypto";
import { defaultStandard, type Measure } from "@/lib/engine";
import type { Actor } from "@/lib/server/actor";
import { createLadder } from "@/lib/server/ladders/create-ladder";
import type { CreateLadderInput, RungInput } from "@/lib/validation/ladders";

export function rungBody(name: string, measure: Measure = "hold_seconds", extra: Partial<RungInput> = {}) {
  const { stepDown: _default, ...standard } = defaultStandard(measure);
  return { name, measure, standard, ...extra };
}

export function ladderBody(rungNames: string[] = ["Tuck hold", "Adv tuck hold", "Straddle hold"], extra: Partial<CreateLadderInput> = {}) {
  return {
    name: `Ladder ${randomUUID().slice(0, 6)}`,
    targetSkill: "Planche",
    promotionMode: "auto" as const,
    rungs: rungNames.map((name) => rungBody(name)),
    ...extra,
  };
}

/** A ladder written through createLadder (the same operation the API uses). */
export function makeLadder(actor: Actor, rungNames?: string[], extra?: Partial<CreateLadderInput>) {
  return createLadder(actor, { ...ladderBody(rungNames), ...extra } as CreateLadderInput);
}
