import { describe, expect, it } from "vitest";
import { checkPrerequisites, type PrerequisiteRung } from "./prerequisites";

// Graph rules are our own (design.md §3 "Prerequisite": a rung on another ladder); cycle detection
// is textbook depth-first search with a back edge (Cormen et al., Introduction to Algorithms,
// Lemma 22.11: a directed graph is acyclic iff DFS finds no back edge — from memory).
function ladder(ladderId: string, count: number, needs: Record<number, string[]> = {}): PrerequisiteRung[] {
  return Array.from({ length: count }, (_, i) => ({
    id: `${ladderId}${i + 1}`,
    ladderId,
    position: i + 1,
    prerequisites: needs[i + 1] ?? [],
  }));
}

describe("checkPrerequisites", () => {
  it("accepts prerequisites across ladders that form no cycle", () => {
    expect(checkPrerequisites([...ladder("P", 5, { 3: ["R2"] }), ...ladder("R", 4, { 4: ["P1"] })])).toEqual([]);
  });

  it("flags a prerequisite on the rung's own ladder", () => {
    expect(checkPrerequisites(ladder("P", 3, { 3: ["P1"] }))).toEqual([{ rungId: "P3", problem: "same_ladder", path: ["P3", "P1"] }]);
  });

  it("flags an unknown rung", () => {
    expect(checkPrerequisites(ladder("P", 2, { 2: ["X9"] }))).toEqual([{ rungId: "P2", problem: "unknown_rung", path: ["P2", "X9"] }]);
  });

  it("finds a cycle that runs through ladder order: P3 needs R2, R2 needs P5 (after P3)", () => {
    const problems = checkPrerequisites([...ladder("P", 5, { 3: ["R2"] }), ...ladder("R", 3, { 2: ["P5"] })]);
    expect(problems).toEqual([{ rungId: "P3", problem: "cycle", path: ["P3", "R2", "P5", "P4", "P3"] }]);
  });

  it("finds a direct two-rung cycle across ladders once", () => {
    const problems = checkPrerequisites([
      { id: "a", ladderId: "L1", prerequisites: ["b"] },
      { id: "b", ladderId: "L2", prerequisites: ["a"] },
    ]);
    expect(problems).toEqual([{ rungId: "a", problem: "cycle", path: ["a", "b", "a"] }]);
  });

  it("finds a cycle over three ladders and uses input order when positions are absent", () => {
    const problems = checkPrerequisites([
      { id: "x1", ladderId: "X", prerequisites: [] },
      { id: "x2", ladderId: "X", prerequisites: ["y2"] },
      { id: "y1", ladderId: "Y", prerequisites: [] },
      { id: "y2", ladderId: "Y", prerequisites: ["z1"] },
      { id: "z1", ladderId: "Z", prerequisites: ["x2"] },
    ]);
    expect(problems).toHaveLength(1);
    expect(problems[0]).toMatchObject({ problem: "cycle", rungId: "x2", path: ["x2", "y2", "z1", "x2"] });
  });

  it("does not call a same-ladder forward prerequisite a cycle as well", () => {
    const problems = checkPrerequisites(ladder("P", 3, { 1: ["P3"] }));
    expect(problems.map((p) => p.problem)).toEqual(["same_ladder"]);
  });

  it("handles a long ladder without recursion limits", () => {
    // L1 needs M1; M1 needs L20000, which needs every earlier L rung.
    const long = ladder("L", 20_000, { 1: ["M1"] });
    const other = ladder("M", 1, { 1: ["L20000"] });
    const problems = checkPrerequisites([...long, ...other]);
    expect(problems).toHaveLength(1);
    expect(problems[0]?.path).toHaveLength(20_002);
  });
});
