/**
 * Properties of every verdict, over generated standards and histories (fast-check). The rules
 * tested are design.md §4 (a pain flag never promotes) and the readiness contract in readiness.ts.
 */
import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { addDays } from "./calendar-date";
import { DEFAULT_STEP_DOWN } from "./defaults";
import { evaluate } from "./evaluate";
import { setValue } from "./set-value";
import { measureArb, sessionsArb } from "./test-arbitraries";
import type { EvaluationInput, Measure, Session, Standard } from "./types";

const SINCE = "2026-03-01";

const standardArb: fc.Arbitrary<Standard> = fc
  .record({
    sets: fc.integer({ min: 1, max: 4 }),
    minValue: fc.integer({ min: 3, max: 30 }),
    minReps: fc.option(fc.integer({ min: 1, max: 4 }), { nil: null }),
    maxRpe: fc.option(fc.integer({ min: 6, max: 9 }), { nil: null }),
    minRir: fc.option(fc.integer({ min: 1, max: 4 }), { nil: null }),
    sessionsRequired: fc.integer({ min: 1, max: 3 }),
    extraWindow: fc.integer({ min: 0, max: 2 }),
    minDaysOnRung: fc.integer({ min: 0, max: 10 }),
    painFree: fc.boolean(),
    stepDownOn: fc.boolean(),
  })
  .map(({ extraWindow, stepDownOn, ...s }) => ({
    ...s,
    sessionsWindow: s.sessionsRequired + extraWindow,
    stepDown: stepDownOn ? DEFAULT_STEP_DOWN : null,
  }));

/** Sessions on distinct days 0–20 after SINCE. */
const sessionsArbitrary = sessionsArb(SINCE, { lastDay: 20, maxLength: 8, maxSets: 5 });

interface Case {
  measure: Measure;
  standard: Standard;
  sessions: Session[];
  asOfDay: number;
  reached: boolean[];
}

const caseArb: fc.Arbitrary<Case> = fc.record({
  measure: measureArb,
  standard: standardArb,
  sessions: sessionsArbitrary,
  asOfDay: fc.integer({ min: 0, max: 25 }),
  reached: fc.array(fc.boolean(), { maxLength: 2 }),
});

function input(c: Case, sessions = c.sessions): EvaluationInput {
  return {
    measure: c.measure,
    standard: c.standard,
    sessions,
    since: SINCE,
    // Noon UTC so sessions on later days than asOf are dropped by the defensive filter too.
    asOf: new Date(`${addDays(SINCE, c.asOfDay)}T12:00:00Z`),
    timeZone: "UTC",
    prerequisites: c.reached.map((reached, i) => ({ rungId: `r${i}`, ladderName: "Press", rungName: `rung ${i}`, reached })),
  };
}

/** A session at least as good as every logged one: more sets, longer values, no effort, no pain. */
function betterSession(measure: Measure, standard: Standard, sessions: Session[], date: string, floor: number): Session {
  let top = floor;
  let reps = standard.minReps ?? 0;
  let count = standard.sets;
  for (const s of sessions) {
    count = Math.max(count, s.sets.length);
    for (const set of s.sets) {
      top = Math.max(top, setValue(measure, set) ?? 0);
      reps = Math.max(reps, set.reps ?? 0);
    }
  }
  return { date, pain: false, sets: Array.from({ length: count }, () => ({ value: top, left: top, right: top, reps })) };
}

describe("verdict properties (fast-check)", () => {
  it("is never met when the latest session carries a pain flag (design.md §4)", () => {
    fc.assert(
      fc.property(caseArb, (c) => {
        const visible = c.sessions.filter((s) => s.date <= addDays(SINCE, c.asOfDay));
        if (visible.length === 0) return;
        const latest = visible.reduce((a, b) => (a.date > b.date ? a : b));
        const sessions = c.sessions.map((s) => (s === latest ? { ...s, pain: true } : s));
        const verdict = evaluate(input(c, sessions));
        expect(verdict.status).not.toBe("met");
        expect(verdict.readiness).toBeLessThan(100);
      }),
      { numRuns: 3000 },
    );
  });

  it("keeps readiness an integer in 0–100 that is 100 exactly when met", () => {
    fc.assert(
      fc.property(caseArb, (c) => {
        const verdict = evaluate(input(c));
        expect(Number.isInteger(verdict.readiness)).toBe(true);
        expect(verdict.readiness).toBeGreaterThanOrEqual(0);
        expect(verdict.readiness).toBeLessThanOrEqual(100);
        expect(verdict.readiness === 100).toBe(verdict.status === "met");
      }),
      { numRuns: 3000 },
    );
  });

  it("never lowers readiness when a better session is added", () => {
    fc.assert(
      fc.property(caseArb, fc.integer({ min: 0, max: 25 }), fc.integer({ min: 0, max: 40 }), (c, day, floor) => {
        const date = addDays(SINCE, day);
        if (c.sessions.some((s) => s.date === date)) return;
        const before = evaluate(input(c));
        const after = evaluate(input(c, [...c.sessions, betterSession(c.measure, c.standard, c.sessions, date, floor)]));
        expect(after.readiness).toBeGreaterThanOrEqual(before.readiness);
      }),
      { numRuns: 3000 },
    );
  });

  it("is met only if every clause passes and no step down fires", () => {
    fc.assert(
      fc.property(caseArb, (c) => {
        const verdict = evaluate(input(c));
        const allPass = verdict.clauses.every((cl) => cl.pass);
        if (verdict.status === "met") expect(allPass && verdict.stepDown === null).toBe(true);
        if (verdict.stepDown) expect(verdict.status).toBe("step_down");
        else expect(verdict.status === "met").toBe(allPass);
      }),
      { numRuns: 2000 },
    );
  });
});
