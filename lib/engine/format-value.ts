/** A measured value in plain words: "20 s", "8 reps", "10 m", "20 s each side". */
import type { Measure } from "./types";

function num(value: number): string {
  // One decimal at most: 12.5 s is meaningful, 12.4999 s is noise.
  return String(Math.round(value * 10) / 10);
}

export function formatValue(measure: Measure, value: number): string {
  switch (measure) {
    case "hold_seconds":
    case "eccentric_seconds":
      return `${num(value)} s`;
    case "hold_seconds_each_side":
      return `${num(value)} s each side`;
    case "reps":
      return `${num(value)} ${value === 1 ? "rep" : "reps"}`;
    case "reps_each_side":
      return `${num(value)} ${value === 1 ? "rep" : "reps"} each side`;
    case "distance_m":
      return `${num(value)} m`;
  }
}
