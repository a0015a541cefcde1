import { describe, expect, it } from "vitest";
import { evaluate } from "./evaluate";
import { explainClause, explainVerdict } from "./explain";
import { holdStandard, session, sets } from "./test-fixtures";
import type { EvaluationInput, Session, Verdict } from "./types";

// Expected wording follows design.md §4 ("Verdicts are explainable") — our own phrasing. Thresholds
// are design.md §4 defaults (common practice, no source).
const good = (date: string): Session => session(date, sets(3, { value: 22, rpe: 6 }));

function verdictOf(sessions: Session[], overrides: Partial<EvaluationInput> = {}): Verdict {
  return evaluate({
    measure: "hold_seconds",
    standard: holdStandard(),
    sessions,
    since: "2026-03-01",
    asOf: new Date("2026-03-05T12:00:00Z"), // 4 days on the rung
    timeZone: "UTC",
    prerequisites: [],
    ...overrides,
  });
}

describe("explainVerdict", () => {
  it("names the missing days when the sessions are there", () => {
    expect(explainVerdict(verdictOf([good("2026-03-02"), good("2026-03-03"), good("2026-03-04")]))).toBe(
      "3 of 3 sessions met — needs 3 more days on this rung",
    );
    expect(explainVerdict(verdictOf([good("2026-03-02"), good("2026-03-04")], { asOf: new Date("2026-03-07T12:00:00Z") }))).toBe(
      "2 of 3 sessions met — needs 1 more day on this rung",
    );
  });

  it("names missing sessions, days and why the best session fell short", () => {
    const short = session("2026-03-04", [{ value: 22 }, { value: 22 }, { value: 15 }]);
    expect(explainVerdict(verdictOf([short]))).toBe(
      "0 of 3 sessions met — needs 2 more sessions meeting the standard and 3 more days on this rung; best session reached the target in 2 of 3 sets",
    );
    const hard = session("2026-03-04", sets(3, { value: 22, rpe: 9 }));
    expect(explainVerdict(verdictOf([hard]))).toContain("best session had 0 of 3 sets at RPE 7 or easier");
  });

  it("says a pain-flagged latest session holds promotion back", () => {
    const verdict = verdictOf([good("2026-03-02"), { ...good("2026-03-04"), pain: true }], {
      asOf: new Date("2026-03-09T12:00:00Z"),
    });
    expect(explainVerdict(verdict)).toBe("1 of 3 sessions met — needs 1 more session meeting the standard and a pain-free session (the latest was flagged pain)");
  });

  it("proposes a step down after pain in 2 of the last 3 sessions", () => {
    const verdict = verdictOf([{ ...good("2026-03-02"), pain: true }, good("2026-03-03"), { ...good("2026-03-04"), pain: true }]);
    expect(explainVerdict(verdict)).toBe("Pain flagged in 2 of the last 3 sessions — step down proposed");
  });

  it("says what a ready athlete waits for", () => {
    const verdict = verdictOf([good("2026-03-02"), good("2026-03-04")], {
      asOf: new Date("2026-03-09T12:00:00Z"),
      prerequisites: [{ rungId: "p4", ladderName: "Press", rungName: "Tuck press rung 4", reached: false }],
    });
    expect(explainVerdict(verdict)).toBe("Ready: waiting for Tuck press rung 4 on the Press line");
  });

  it("confirms a met standard", () => {
    const verdict = verdictOf([good("2026-03-02"), good("2026-03-04")], { asOf: new Date("2026-03-09T12:00:00Z") });
    expect(explainVerdict(verdict)).toBe("Ready to move up: 2 of 3 sessions met, 8 days on this rung");
  });
});

describe("explainClause", () => {
  it("gives one line per clause", () => {
    const verdict = verdictOf([good("2026-03-04")]);
    expect(verdict.clauses.map(explainClause)).toEqual([
      "Best session: 3 of 3 sets reached the target",
      "Best session: 3 of 3 sets at RPE 7 or easier",
      "1 of the last 3 sessions met (needs 2)",
      "4 of 7 days on this rung",
      "Latest session pain-free",
      "No prerequisites",
    ]);
  });
});
