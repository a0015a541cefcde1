import { describe, expect, it } from "vitest";
import { defaultStandard } from "./defaults";
import { evaluate } from "./evaluate";
import { mergeSessions } from "./merge-sessions";
import { holdStandard, session, sets } from "./test-fixtures";
import type { ClauseName, EvaluationInput, Measure, Session, Standard, Verdict } from "./types";

// Thresholds below are the design.md §4 defaults: 3 sets ≥ 20 s at ≤ RPE 7, 2 of the last 3
// sessions, ≥ 7 days, pain-free (common practice, no source).
const SINCE = "2026-03-01";
const AS_OF = new Date("2026-03-12T12:00:00Z"); // 11 days after SINCE in UTC

function run(sessions: Session[], overrides: Partial<EvaluationInput> = {}): Verdict {
  return evaluate({
    measure: "hold_seconds",
    standard: holdStandard(),
    sessions,
    since: SINCE,
    asOf: AS_OF,
    timeZone: "UTC",
    prerequisites: [],
    ...overrides,
  });
}

function clause(verdict: Verdict, name: ClauseName) {
  const found = verdict.clauses.find((c) => c.clause === name);
  if (!found) throw new Error(`no ${name} clause`);
  return found;
}

const good = (date: string) => session(date, sets(3, { value: 20, rpe: 7 }));

describe("evaluate: sets clause at the threshold (common practice, no source: 20 s hold)", () => {
  it.each([
    ["exactly 20 s passes", 20, true],
    ["19 s, one second short, fails", 19, false],
    ["19.9 s fails", 19.9, false],
  ])("%s", (_label, value, pass) => {
    const verdict = run([session("2026-03-10", sets(3, { value, rpe: 6 })), session("2026-03-11", sets(3, { value, rpe: 6 }))]);
    expect(clause(verdict, "sets").pass).toBe(pass);
    expect(clause(verdict, "sets").have).toBe(pass ? 3 : 0);
    expect(verdict.status).toBe(pass ? "met" : "not_yet");
  });

  it("needs `sets` qualifying sets in one session, not across sessions", () => {
    const verdict = run([
      session("2026-03-10", [{ value: 20 }, { value: 20 }, { value: 10 }]),
      session("2026-03-11", [{ value: 20 }, { value: 20 }, { value: 10 }]),
    ]);
    expect(clause(verdict, "sets")).toMatchObject({ pass: false, have: 2, required: 3 });
    expect(clause(verdict, "sessions")).toMatchObject({ pass: false, have: 0, required: 2, window: 3 });
  });
});

describe("evaluate: effort clause, RPE and RIR (Zourdos et al. 2016: rpe = 10 − rir)", () => {
  it.each([
    ["RPE 7 within RPE 7", { maxRpe: 7 }, { rpe: 7 }, true],
    ["RPE 8 over RPE 7", { maxRpe: 7 }, { rpe: 8 }, false],
    ["3 RIR (= RPE 7) within RPE 7", { maxRpe: 7 }, { rir: 3 }, true],
    ["2 RIR (= RPE 8) over RPE 7", { maxRpe: 7 }, { rir: 2 }, false],
    ["RPE 7 (= 3 RIR) meets ≥ 3 RIR", { maxRpe: null, minRir: 3 }, { rpe: 7 }, true],
    ["RPE 8 (= 2 RIR) misses ≥ 3 RIR", { maxRpe: null, minRir: 3 }, { rpe: 8 }, false],
    ["no effort recorded is not held against the athlete", { maxRpe: 7 }, {}, true],
  ])("%s", (_label, ceiling, effort, pass) => {
    const standard = holdStandard(ceiling);
    const entries = sets(3, { value: 25, ...effort });
    const verdict = run([session("2026-03-10", entries), session("2026-03-11", entries)], { standard });
    expect(clause(verdict, "sets").pass).toBe(true);
    expect(clause(verdict, "effort").pass).toBe(pass);
    expect(clause(verdict, "effort").have).toBe(pass ? 3 : 0);
    expect(verdict.status).toBe(pass ? "met" : "not_yet");
  });
});

describe("evaluate: sessions clause, k of the last n", () => {
  it("counts only the last n sessions when history is longer than the window", () => {
    const weak = (date: string) => session(date, sets(3, { value: 12, rpe: 6 }));
    // Two old good sessions fall outside the window of 3.
    const verdict = run([good("2026-03-02"), good("2026-03-03"), weak("2026-03-05"), weak("2026-03-07"), weak("2026-03-09")]);
    expect(clause(verdict, "sessions")).toMatchObject({ pass: false, have: 0, required: 2, window: 3 });
    expect(verdict.sessionsMet).toBe(0);
    expect(verdict.lastSessionDate).toBe("2026-03-09");
  });

  it("orders by date, not by input order", () => {
    const weak = (date: string) => session(date, sets(3, { value: 12 }));
    const verdict = run([good("2026-03-10"), weak("2026-03-02"), good("2026-03-11"), weak("2026-03-03")]);
    expect(clause(verdict, "sessions").have).toBe(2);
    expect(verdict.status).toBe("met");
  });

  it("ignores sessions before `since` or after the local date of `asOf`", () => {
    const verdict = run([good("2026-02-27"), good("2026-02-28"), good("2026-03-13")]);
    expect(verdict.lastSessionDate).toBeNull();
    expect(clause(verdict, "sessions").have).toBe(0);
  });

  it("fewer sessions than the window can still meet k", () => {
    const verdict = run([good("2026-03-10"), good("2026-03-11")]);
    expect(clause(verdict, "sessions")).toMatchObject({ pass: true, have: 2 });
  });
});

describe("evaluate: sessions merged from set-by-set entries", () => {
  const entries = [
    session("2026-03-11", [{ value: 21, rpe: 6 }]),
    session("2026-03-11", [{ value: 20, rpe: 7 }]),
    session("2026-03-11", [{ value: 22, rpe: 7 }]),
  ];

  it("a session of 3 separate 1-set entries, merged by the caller, counts", () => {
    const merged = mergeSessions(entries);
    expect(merged).toHaveLength(1);
    expect(merged[0]?.sets).toHaveLength(3);
    const verdict = run([good("2026-03-08"), ...merged]);
    expect(clause(verdict, "sets").have).toBe(3);
    expect(clause(verdict, "sessions").have).toBe(2);
  });

  it("unmerged entries of one date are merged defensively, keeping any pain flag", () => {
    expect(clause(run([good("2026-03-08"), ...entries]), "sessions").have).toBe(2);
    const withPain = [...entries, session("2026-03-11", [], true)];
    const verdict = run([good("2026-03-08"), ...withPain]);
    expect(clause(verdict, "sessions").have).toBe(1);
    expect(clause(verdict, "pain").pass).toBe(false);
  });
});

describe("evaluate: pain (design.md §4: a pain flag never counts and never promotes)", () => {
  it("a pain session never counts toward k of n on a painFree standard", () => {
    const verdict = run([good("2026-03-09"), { ...good("2026-03-10"), pain: true }, good("2026-03-11")]);
    expect(clause(verdict, "sessions").have).toBe(2);
    expect(clause(verdict, "pain").pass).toBe(true);
    expect(verdict.status).toBe("met");
  });

  it("a pain-flagged latest session blocks promotion even when k of n is met", () => {
    const verdict = run([good("2026-03-09"), good("2026-03-10"), { ...good("2026-03-11"), pain: true }]);
    expect(clause(verdict, "sessions").pass).toBe(true);
    expect(clause(verdict, "pain")).toMatchObject({ pass: false, have: 1 });
    expect(verdict.status).toBe("not_yet");
    expect(verdict.readiness).toBeLessThan(100);
  });

  it("painFree off lets earlier pain sessions count, but a pain-flagged latest session still never promotes", () => {
    const standard = holdStandard({ painFree: false, stepDown: null });
    const earlierPain = run([{ ...good("2026-03-10"), pain: true }, good("2026-03-11")], { standard });
    expect(earlierPain.status).toBe("met");
    const latestPain = run([good("2026-03-10"), { ...good("2026-03-11"), pain: true }], { standard });
    expect(clause(latestPain, "sessions").have).toBe(2);
    expect(latestPain.status).toBe("not_yet");
  });
});

describe("evaluate: days clause", () => {
  it.each([
    ["2026-03-08T12:00:00Z", 7, true],
    ["2026-03-07T23:59:59Z", 6, false],
    ["2026-02-20T00:00:00Z", 0, false], // asOf before since: never negative
  ])("asOf %s → %i days", (iso, days, pass) => {
    const verdict = run([], { asOf: new Date(iso) });
    expect(verdict.daysOnRung).toBe(days);
    expect(clause(verdict, "days")).toMatchObject({ pass, have: days, required: 7 });
  });

  it("rejects a malformed since date", () => {
    expect(() => run([], { since: "2026-3-1" })).toThrow(RangeError);
  });
});

describe("evaluate: each-side and eccentric measures", () => {
  it.each<[string, Measure, Standard, Session["sets"], boolean]>([
    ["each side: weaker side 20 s passes", "hold_seconds_each_side", defaultStandard("hold_seconds_each_side"), sets(3, { left: 24, right: 20 }), true],
    ["each side: weaker side 19 s fails even if the other is 30 s", "hold_seconds_each_side", defaultStandard("hold_seconds_each_side"), sets(3, { left: 30, right: 19 }), false],
    ["each side: one side missing can't be judged", "hold_seconds_each_side", defaultStandard("hold_seconds_each_side"), sets(3, { left: 30 }), false],
    ["reps each side: weaker side decides", "reps_each_side", defaultStandard("reps_each_side"), sets(3, { left: 6, right: 9 }), true],
    ["eccentric: 3 lowerings of 5 s pass", "eccentric_seconds", defaultStandard("eccentric_seconds"), sets(3, { value: 5, reps: 3 }), true],
    ["eccentric: 2 lowerings fail", "eccentric_seconds", defaultStandard("eccentric_seconds"), sets(3, { value: 6, reps: 2 }), false],
    ["eccentric: 4.5 s lowerings fail", "eccentric_seconds", defaultStandard("eccentric_seconds"), sets(3, { value: 4.5, reps: 3 }), false],
    ["eccentric: lowerings not logged can't be judged", "eccentric_seconds", defaultStandard("eccentric_seconds"), sets(3, { value: 6 }), false],
    ["distance: 10 m passes", "distance_m", defaultStandard("distance_m"), sets(3, { value: 10 }), true],
  ])("%s", (_label, measure, standard, entries, pass) => {
    const verdict = run([session("2026-03-10", entries), session("2026-03-11", entries)], { measure, standard });
    expect(clause(verdict, "sets").pass).toBe(pass);
    expect(verdict.status).toBe(pass ? "met" : "not_yet");
  });
});

describe("evaluate: prerequisites", () => {
  const press = { rungId: "r-press-4", ladderName: "Press", rungName: "Tuck press rung 4" };

  it("only prerequisites failing → blocked, listing what it waits for", () => {
    const verdict = run([good("2026-03-10"), good("2026-03-11")], {
      prerequisites: [{ ...press, reached: false }, { rungId: "r-l", ladderName: "Compression", rungName: "L-sit", reached: true }],
    });
    expect(verdict.status).toBe("blocked");
    expect(clause(verdict, "prerequisites")).toMatchObject({ pass: false, required: 2, have: 1 });
    expect(verdict.waitingFor).toEqual([press]);
    expect(verdict.readiness).toBe(99);
  });

  it("prerequisites and another clause failing → not_yet", () => {
    const verdict = run([good("2026-03-11")], { prerequisites: [{ ...press, reached: false }] });
    expect(verdict.status).toBe("not_yet");
  });

  it("all reached → met", () => {
    const verdict = run([good("2026-03-10"), good("2026-03-11")], { prerequisites: [{ ...press, reached: true }] });
    expect(verdict.status).toBe("met");
    expect(verdict.readiness).toBe(100);
  });
});

describe("evaluate: step down (design.md §4 default rule; common practice, no source)", () => {
  it("pain in 2 of the last 3 sessions proposes a step down", () => {
    const verdict = run([{ ...good("2026-03-09"), pain: true }, good("2026-03-10"), { ...good("2026-03-11"), pain: true }]);
    expect(verdict.status).toBe("step_down");
    expect(verdict.stepDown).toEqual({ reason: "pain", detail: "Pain flagged in 2 of the last 3 sessions" });
  });

  it("pain in 2 sessions outside the last 3 does not", () => {
    const verdict = run([
      { ...good("2026-03-05"), pain: true },
      { ...good("2026-03-06"), pain: true },
      good("2026-03-09"),
      good("2026-03-10"),
      good("2026-03-11"),
    ]);
    expect(verdict.stepDown).toBeNull();
    expect(verdict.status).toBe("met");
  });

  it.each([
    ["both latest sessions under 70 % of 20 s (14 s) → drop", [13, 13.9], "drop"],
    ["exactly 70 % is not a drop", [14, 13], null],
    ["only the latest session low is not a drop", [20, 10], null],
  ])("%s", (_label, bests, reason) => {
    const [older, newer] = bests as [number, number];
    const verdict = run([good("2026-03-08"), session("2026-03-10", [{ value: older }]), session("2026-03-11", [{ value: newer }])]);
    expect(verdict.stepDown?.reason ?? null).toBe(reason);
    expect(verdict.status === "step_down").toBe(reason !== null);
  });

  it("drop uses the weaker side on each-side measures", () => {
    const verdict = run([session("2026-03-10", [{ left: 30, right: 10 }]), session("2026-03-11", [{ left: 30, right: 12 }])], {
      measure: "hold_seconds_each_side",
      standard: defaultStandard("hold_seconds_each_side"),
    });
    expect(verdict.stepDown?.reason).toBe("drop");
    expect(verdict.stepDown?.detail).toBe("Best set under 14 s each side (70 % of 20 s each side) in each of the last 2 sessions");
  });

  it("stepDown null switches proposals off", () => {
    const verdict = run([session("2026-03-10", [{ value: 1 }], true), session("2026-03-11", [{ value: 1 }], true)], {
      standard: holdStandard({ stepDown: null }),
    });
    expect(verdict.stepDown).toBeNull();
    expect(verdict.status).toBe("not_yet");
  });
});

describe("evaluate: readiness (formula in readiness.ts)", () => {
  it.each([
    // floor(100 × (0.75 × min(1, (met + partial) / 2) + 0.25 × min(1, days / 7)))
    ["no sessions, 11 days", [], 25],
    ["one good session, 11 days: 0.75 × 1/2 + 0.25", ["good"], 62],
    ["one session at 3 × 10 s (partial 0.5), 11 days: 0.75 × 0.25 + 0.25", ["half"], 43],
    ["one good + one half, 11 days: 0.75 × 1.5/2 + 0.25", ["good", "half"], 81],
    ["one good + one at RPE 9 (partial 0.5 for effort): same as half", ["good", "hard"], 81],
  ])("%s → %i", (_label, kinds, expected) => {
    const byKind: Record<string, (date: string) => Session> = {
      good,
      half: (date) => session(date, sets(3, { value: 10, rpe: 6 })),
      hard: (date) => session(date, sets(3, { value: 20, rpe: 9 })),
    };
    const list = kinds.map((kind, i) => (byKind[kind] as (date: string) => Session)(`2026-03-0${i + 2}`));
    expect(run(list).readiness).toBe(expected);
  });

  it("days part: 3 of 7 days with no sessions → floor(25 × 3/7) = 10", () => {
    expect(run([], { asOf: new Date("2026-03-04T08:00:00Z") }).readiness).toBe(10);
  });
});
