/**
 * The engine judges the latest sessions only, so readers may stop at lookbackSessions(standard):
 * over generated standards (windows and step-down rules up to the validation's limits) and
 * histories (fast-check), the verdict on the whole history equals the verdict on its latest
 * lookbackSessions sessions up to today. The property is the engine's own contract; no outside source.
 */
import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { addDays } from "./calendar-date";
import { defaultStandard, MAX_LOOKBACK_SESSIONS } from "./defaults";
import { evaluate } from "./evaluate";
import { lookbackSessions } from "./lookback";
import { measureArb, sessionsArb } from "./test-arbitraries";
import type { EvaluationInput, Measure, Session, Standard, StepDownRule } from "./types";

const SINCE = "2026-01-05";
const DAYS = 60;

const ruleArb: fc.Arbitrary<StepDownRule> = fc
  .record({
    painWindow: fc.integer({ min: 1, max: MAX_LOOKBACK_SESSIONS }),
    painShare: fc.double({ min: 0, max: 1, noNaN: true }),
    dropBelowPct: fc.integer({ min: 1, max: 99 }),
    dropSessions: fc.integer({ min: 1, max: 10 }),
  })
  .map(({ painShare, ...r }) => ({ ...r, painSessions: Math.max(1, Math.round(painShare * r.painWindow)) }));

const standardArb: fc.Arbitrary<Standard> = fc
  .record({
    sets: fc.integer({ min: 1, max: 4 }),
    minValue: fc.integer({ min: 3, max: 30 }),
    maxRpe: fc.option(fc.integer({ min: 6, max: 9 }), { nil: null }),
    sessionsWindow: fc.integer({ min: 1, max: MAX_LOOKBACK_SESSIONS }),
    requiredShare: fc.double({ min: 0, max: 1, noNaN: true }),
    minDaysOnRung: fc.integer({ min: 0, max: 10 }),
    painFree: fc.boolean(),
    // Omitted (the default rule), switched off, or the coach's own.
    stepDown: fc.oneof(fc.constant(undefined), fc.constant(null), ruleArb),
  })
  .map(({ requiredShare, stepDown, ...s }) => ({
    ...s,
    minReps: null,
    minRir: null,
    sessionsRequired: Math.max(1, Math.round(requiredShare * s.sessionsWindow)),
    ...(stepDown === undefined ? {} : { stepDown }),
  }));

/** Up to 40 sessions on distinct days of the 60 after SINCE: often more than any look-back. */
const historyArb = sessionsArb(SINCE, { lastDay: DAYS, maxLength: 40, maxSets: 4 });

function input(measure: Measure, standard: Standard, sessions: Session[], today: string): EvaluationInput {
  return { measure, standard, sessions, since: SINCE, asOf: new Date(`${today}T12:00:00Z`), timeZone: "UTC", prerequisites: [] };
}

describe("lookbackSessions", () => {
  it("is the most sessions any clause looks at: the verdict on the latest that many equals the whole history's (fast-check)", () => {
    fc.assert(
      fc.property(measureArb, standardArb, historyArb, fc.integer({ min: 0, max: DAYS + 2 }), (measure, standard, sessions, day) => {
        const today = addDays(SINCE, day);
        const latest = sessions
          .filter((s) => s.date <= today)
          .sort((a, b) => (a.date < b.date ? 1 : -1))
          .slice(0, lookbackSessions(standard));
        expect(evaluate(input(measure, standard, latest, today))).toEqual(evaluate(input(measure, standard, sessions, today)));
      }),
      { numRuns: 3000 },
    );
  });

  it("covers the sessions window and, unless switched off, the step-down rule's windows", () => {
    const base = defaultStandard("hold_seconds");
    const rule = { painSessions: 2, painWindow: 9, dropBelowPct: 70, dropSessions: 4 };
    expect(lookbackSessions({ ...base, sessionsWindow: 5, stepDown: rule })).toBe(9);
    expect(lookbackSessions({ ...base, sessionsWindow: 12, stepDown: rule })).toBe(12);
    expect(lookbackSessions({ ...base, sessionsWindow: 2, stepDown: { ...rule, painWindow: 1, dropSessions: 6 } })).toBe(6);
    expect(lookbackSessions({ ...base, sessionsWindow: 2, stepDown: null })).toBe(2);
  });
});
