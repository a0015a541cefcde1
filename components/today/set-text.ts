import { isEachSide } from "@/lib/engine/set-value";
import type { Measure, SetEntry } from "@/lib/engine/types";

function unit(measure: Measure): string {
  switch (measure) {
    case "reps":
    case "reps_each_side":
      return "reps";
    case "distance_m":
      return "m";
    default:
      return "s";
  }
}

/** One set in a few words: "25 s · RPE 7", "L 8 / R 7 reps · 2 RIR", "3 × 5 s". */
export function setText(measure: Measure, set: SetEntry): string {
  const u = unit(measure);
  let amount: string;
  if (isEachSide(measure)) amount = `L ${set.left ?? "–"} / R ${set.right ?? "–"} ${u}`;
  else if (measure === "eccentric_seconds" && set.reps) amount = `${set.reps} × ${set.value ?? "–"} ${u}`;
  else amount = `${set.value ?? "–"} ${u}`;
  const effort = typeof set.rpe === "number" ? ` · RPE ${set.rpe}` : typeof set.rir === "number" ? ` · ${set.rir} RIR` : "";
  return amount + effort;
}
