/** fast-check generators shared by the engine's property tests. */
import fc from "fast-check";
import { addDays } from "./calendar-date";
import { MEASURES, type Measure, type Session, type SetEntry } from "./types";

/** Every measure the engine knows: one number, both sides, lowerings with reps. */
export const measureArb = fc.constantFrom<Measure>(...MEASURES);

/** A set with every field a measure may read, some with an effort rating. */
export const setArb: fc.Arbitrary<SetEntry> = fc.record({
  value: fc.integer({ min: 0, max: 40 }),
  left: fc.integer({ min: 0, max: 40 }),
  right: fc.integer({ min: 0, max: 40 }),
  reps: fc.integer({ min: 0, max: 5 }),
  rpe: fc.option(fc.integer({ min: 5, max: 10 }), { nil: undefined }),
});

/** Up to `maxLength` sessions on distinct days 0–`lastDay` after `since`, each of up to `maxSets` sets. */
export function sessionsArb(since: string, { lastDay, maxLength, maxSets }: { lastDay: number; maxLength: number; maxSets: number }): fc.Arbitrary<Session[]> {
  return fc
    .uniqueArray(fc.integer({ min: 0, max: lastDay }), { maxLength })
    .chain((days) =>
      fc.tuple(...days.map((day) => fc.record({ date: fc.constant(addDays(since, day)), sets: fc.array(setArb, { maxLength: maxSets }), pain: fc.boolean() }))),
    );
}
