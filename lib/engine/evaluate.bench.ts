/**
 * Speed of one verdict for a typical rung (4 sessions of 3 sets, one prerequisite). Goal: median
 * under 5 µs. Run with `npx vitest bench --run lib/engine`.
 */
import { bench, describe } from "vitest";
import { defaultStandard } from "./defaults";
import { evaluate } from "./evaluate";
import type { EvaluationInput } from "./types";

const input: EvaluationInput = {
  measure: "hold_seconds",
  standard: defaultStandard("hold_seconds"),
  sessions: [
    { date: "2026-03-02", pain: false, sets: [{ value: 21, rpe: 7 }, { value: 20, rpe: 7 }, { value: 18, rpe: 8 }] },
    { date: "2026-03-05", pain: false, sets: [{ value: 22, rpe: 6 }, { value: 21, rpe: 7 }, { value: 20, rpe: 7 }] },
    { date: "2026-03-07", pain: false, sets: [{ value: 23, rpe: 6 }, { value: 22, rpe: 7 }, { value: 21, rpe: 7 }] },
    { date: "2026-03-09", pain: false, sets: [{ value: 19, rpe: 7 }, { value: 22, rpe: 7 }, { value: 21, rpe: 7 }] },
  ],
  since: "2026-03-01",
  asOf: new Date("2026-03-10T10:00:00Z"),
  timeZone: "Europe/Berlin",
  prerequisites: [{ rungId: "p", ladderName: "Press", rungName: "Tuck press rung 4", reached: true }],
};

let tick = 0;

describe("evaluate", () => {
  bench("one instant for a batch (usual server case)", () => {
    evaluate(input);
  });
  bench("a new instant every call", () => {
    tick += 1;
    evaluate({ ...input, asOf: new Date(1_773_136_800_000 + tick) });
  });
});
