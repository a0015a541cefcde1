import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { backtest } from "./backtest";
import { addDays, daysBetween } from "./calendar-date";
import { evaluate } from "./evaluate";
import { endOfLocalDay } from "./local-date";
import { holdStandard, session, sets } from "./test-fixtures";
import type { Session, Standard } from "./types";

// Standard: design.md §4 hold default (common practice, no source): 3 × ≥ 20 s at ≤ RPE 7, 2 of
// the last 3 sessions, ≥ 7 days on the rung, pain-free.
const SINCE = "2026-03-01";
const good = (date: string): Session => session(date, sets(3, { value: 22, rpe: 6 }));
const weak = (date: string): Session => session(date, sets(3, { value: 15, rpe: 6 }));

function run(sessions: Session[], standard: Standard = holdStandard(), timeZone = "UTC"): string | null {
  return backtest({ measure: "hold_seconds", standard, sessions, since: SINCE, timeZone });
}

describe("backtest", () => {
  it("sessions met early, days missing → the day the days clause comes true", () => {
    expect(run([good("2026-03-04"), good("2026-03-02")])).toBe("2026-03-08");
  });

  it("met on a session date once days were already enough", () => {
    expect(run([good("2026-03-05"), weak("2026-03-07"), good("2026-03-10")])).toBe("2026-03-10");
  });

  it("a pain session on the day days come true holds it back; replay continues", () => {
    expect(run([good("2026-03-02"), good("2026-03-04"), { ...good("2026-03-08"), pain: true }, good("2026-03-11")])).toBe("2026-03-11");
  });

  it("a session after the day days come true does not move the answer", () => {
    expect(run([good("2026-03-02"), good("2026-03-04"), { ...good("2026-03-09"), pain: true }])).toBe("2026-03-08");
  });

  it("a weak session before the days come true can push the good ones out of the window", () => {
    // k = 2 of n = 2: the weak session on 03-05 leaves 1 of the last 2 met.
    const standard = holdStandard({ sessionsWindow: 2 });
    expect(run([good("2026-03-02"), good("2026-03-04"), weak("2026-03-05")], standard)).toBeNull();
  });

  it("never → null; sessions before `since` never count", () => {
    expect(run([weak("2026-03-02"), weak("2026-03-09")])).toBeNull();
    expect(run([good("2026-02-20"), good("2026-02-25")])).toBeNull();
    expect(run([])).toBeNull();
  });

  it.each(["Pacific/Auckland", "Asia/Tokyo", "America/Los_Angeles", "Europe/Berlin"])(
    "gives the same local dates in %s (session dates are already local)",
    (zone) => {
      const history = [good("2026-03-22"), good("2026-03-25"), weak("2026-03-27"), good("2026-03-29")];
      expect(run(history, holdStandard(), zone)).toBe(run(history));
    },
  );

  it("agrees with evaluate day by day: not met the day before, met on the day (property, fast-check)", () => {
    const historyArb = fc.uniqueArray(fc.integer({ min: 0, max: 20 }), { maxLength: 6 }).chain((days) =>
      fc.tuple(
        ...days.map((day) =>
          fc.record({
            date: fc.constant(addDays(SINCE, day)),
            sets: fc.array(fc.record({ value: fc.integer({ min: 12, max: 26 }), rpe: fc.integer({ min: 5, max: 9 }) }), { maxLength: 4 }),
            pain: fc.boolean(),
          }),
        ),
      ),
    );
    fc.assert(
      fc.property(historyArb, fc.constantFrom("UTC", "Pacific/Auckland", "America/New_York"), (history, zone) => {
        const standard = holdStandard({ stepDown: null });
        const answer = backtest({ measure: "hold_seconds", standard, sessions: history, since: SINCE, timeZone: zone });
        const statusOn = (date: string) =>
          evaluate({ measure: "hold_seconds", standard, sessions: history, since: SINCE, asOf: endOfLocalDay(date, zone), timeZone: zone, prerequisites: [] }).status;
        const lastDay = answer ?? addDays(SINCE, 30);
        for (let d = 0; d < daysBetween(SINCE, lastDay); d += 1) expect(statusOn(addDays(SINCE, d))).not.toBe("met");
        if (answer) expect(statusOn(answer)).toBe("met");
      }),
      { numRuns: 200 },
    );
  });
});
