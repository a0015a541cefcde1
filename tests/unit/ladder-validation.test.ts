import { describe, expect, it } from "vitest";
import { checkPrerequisites, defaultStandard, describeStandard } from "@/lib/engine";
import { ZCreateLadder, ZRungInput, ZRungOrder, ZStandardInput } from "@/lib/validation/ladders";

const paths = (result: { success: boolean; error?: { issues: { path: PropertyKey[] }[] } }) =>
  (result.error?.issues ?? []).map((i) => i.path.join("."));

const hold = () => {
  const { stepDown: _s, ...standard } = defaultStandard("hold_seconds");
  return standard;
};

describe("standard validation", () => {
  it("accepts the default standards of every measure", () => {
    for (const measure of ["hold_seconds", "reps", "eccentric_seconds", "distance_m", "hold_seconds_each_side", "reps_each_side"] as const) {
      expect(ZRungInput.safeParse({ name: "R", measure, standard: defaultStandard(measure) }).success, measure).toBe(true);
    }
  });

  it("refuses zero sets, a 10,000 s hold, more sessions required than looked at, and both effort ceilings", () => {
    expect(paths(ZStandardInput.safeParse({ ...hold(), sets: 0 }))).toEqual(["sets"]);
    expect(paths(ZStandardInput.safeParse({ ...hold(), minValue: 10_000 }))).toEqual(["minValue"]);
    expect(paths(ZStandardInput.safeParse({ ...hold(), sessionsRequired: 4, sessionsWindow: 3 }))).toEqual(["sessionsRequired"]);
    expect(paths(ZStandardInput.safeParse({ ...hold(), maxRpe: 7, minRir: 3 }))).toEqual(["minRir"]);
    expect(paths(ZStandardInput.safeParse({ ...hold(), minDaysOnRung: -1 }))).toEqual(["minDaysOnRung"]);
    expect(paths(ZStandardInput.safeParse({ ...hold(), sets: 2.5 }))).toEqual(["sets"]);
  });

  it("judges the target against the measure: 300 reps is a typo, a 300 s hold is not", () => {
    // common practice, no source: per-set targets above MAX_MIN_VALUE are treated as typos
    expect(ZRungInput.safeParse({ name: "R", measure: "hold_seconds", standard: { ...hold(), minValue: 300 } }).success).toBe(true);
    expect(paths(ZRungInput.safeParse({ name: "R", measure: "reps", standard: { ...hold(), minValue: 300 } }))).toEqual(["standard.minValue"]);
  });

  it("refuses unknown fields and empty names with their paths", () => {
    const body = { name: " ", targetSkill: "Lever", promotionMode: "auto", rungs: [{ name: "R", measure: "reps", standard: hold(), color: "x" }] };
    expect(paths(ZCreateLadder.safeParse(body)).sort()).toEqual(["name", "rungs.0"]);
  });

  it("refuses an order list that names a rung twice", () => {
    const id = "5b0c6f55-9f57-4c0f-9d8e-2a2f7a4d8b11";
    expect(paths(ZRungOrder.safeParse({ rungIds: [id, id] }))).toEqual(["rungIds"]);
  });
});

describe("plain-language standards on rungs", () => {
  // common practice, no source: the default standards of design brief §4, said in words
  it("describes the default hold and eccentric standards", () => {
    expect(describeStandard("hold_seconds", defaultStandard("hold_seconds"))).toBe(
      "3 sets of at least 20 s at RPE 7 or easier, in 2 of the last 3 sessions, at least 7 days on this rung, pain-free",
    );
    expect(describeStandard("reps", { ...defaultStandard("reps"), maxRpe: null, minRir: 2, sessionsRequired: 3, sessionsWindow: 3, minDaysOnRung: 0, painFree: false })).toBe(
      "3 sets of at least 8 reps with at least 2 reps in reserve, in each of the last 3 sessions",
    );
  });
});

describe("prerequisites across a team's ladders", () => {
  const rung = (id: string, ladderId: string, position: number, prerequisites: string[] = []) => ({ id, ladderId, position, prerequisites });

  it("finds a cycle closed through ladder order, and a same-ladder prerequisite", () => {
    // Press 3 needs Rings 2; Rings 1 needs Press 3 → Rings 2 needs Rings 1 by order → cycle.
    const problems = checkPrerequisites([
      rung("p1", "press", 1),
      rung("p2", "press", 2),
      rung("p3", "press", 3, ["r2"]),
      rung("r1", "rings", 1, ["p3"]),
      rung("r2", "rings", 2),
    ]);
    expect(problems.map((p) => p.problem)).toEqual(["cycle"]);
    expect(problems[0]!.path[0]).toBe(problems[0]!.path.at(-1));
    expect(new Set(problems[0]!.path)).toEqual(new Set(["p3", "r2", "r1"]));
    expect(checkPrerequisites([rung("p1", "press", 1), rung("p2", "press", 2, ["p1"])]).map((p) => p.problem)).toEqual(["same_ladder"]);
  });

  it("sees a reorder create a cycle that the old order did not have", () => {
    const before = [rung("a1", "a", 1), rung("a2", "a", 2, ["b1"]), rung("b1", "b", 1), rung("b2", "b", 2, ["a1"])];
    expect(checkPrerequisites(before)).toEqual([]);
    // ladder b reversed: b1 needs b2 (order), b2 needs a1, a2 needs a1 (order) and b1 — still acyclic
    const swappedB = [rung("a1", "a", 1), rung("a2", "a", 2, ["b1"]), rung("b1", "b", 2), rung("b2", "b", 1, ["a1"])];
    expect(checkPrerequisites(swappedB)).toEqual([]);
    const cyclic = [rung("a1", "a", 2), rung("a2", "a", 1, ["b1"]), rung("b1", "b", 2), rung("b2", "b", 1, ["a1"])];
    // both reversed: a1 needs a2 (order), a2 needs b1, b1 needs b2 (order), b2 needs a1
    expect(checkPrerequisites(cyclic).map((p) => p.problem)).toEqual(["cycle"]);
  });
});

describe("text the database cannot store", () => {
  it("refuses NUL characters in names and notes with the field's path (never a database error)", () => {
    const body = { name: "Lever\u0000", targetSkill: "Front lever", promotionMode: "auto", notes: "a\u0000b", rungs: [] };
    expect(paths(ZCreateLadder.safeParse(body)).sort()).toEqual(["name", "notes"]);
  });
});
