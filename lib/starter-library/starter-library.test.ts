/**
 * Structural checks on the starter library. Tests marked "common practice, no source" encode
 * coaching judgement, not a published rule.
 */
import { describe, expect, it } from "vitest";
import { RUNG_TAGS } from "../engine/tags";
import { MEASURES, PROMOTION_MODES } from "../engine/types";
import { STARTER_LADDERS, findStarterRung } from "./index";
import type { StarterLadder, StarterRung } from "./types";

const SLUG = /^[a-z0-9]+(?:-[a-z0-9]+)*$/;

interface LadderRung {
  ladder: StarterLadder;
  rung: StarterRung;
  index: number;
}

const ALL_RUNGS: LadderRung[] = STARTER_LADDERS.flatMap((ladder) =>
  ladder.rungs.map((rung, index) => ({ ladder, rung, index })),
);

function label({ ladder, rung }: { ladder: StarterLadder; rung: StarterRung }): string {
  return `${ladder.key}/${rung.key}`;
}

/**
 * A prerequisite cycle, as a list of "ladder/rung" nodes, or null. Edges: each rung needs its
 * prerequisites, and each rung needs the rung before it on its own ladder (ladder order).
 */
function findPrerequisiteCycle(ladders: readonly StarterLadder[]): string[] | null {
  const edges = new Map<string, string[]>();
  for (const ladder of ladders) {
    ladder.rungs.forEach((rung, index) => {
      const needs = (rung.prerequisites ?? []).map((ref) => `${ref.ladder}/${ref.rung}`);
      const previous = index > 0 ? ladder.rungs[index - 1] : undefined;
      if (previous) needs.push(`${ladder.key}/${previous.key}`);
      edges.set(`${ladder.key}/${rung.key}`, needs);
    });
  }
  const state = new Map<string, "visiting" | "done">();
  const path: string[] = [];
  const visit = (node: string): string[] | null => {
    const seen = state.get(node);
    if (seen === "done") return null;
    if (seen === "visiting") return [...path.slice(path.indexOf(node)), node];
    state.set(node, "visiting");
    path.push(node);
    for (const next of edges.get(node) ?? []) {
      const cycle = visit(next);
      if (cycle) return cycle;
    }
    path.pop();
    state.set(node, "done");
    return null;
  };
  for (const node of edges.keys()) {
    const cycle = visit(node);
    if (cycle) return cycle;
  }
  return null;
}

describe("starter library: ladders", () => {
  it("has at least six ladders", () => {
    expect(STARTER_LADDERS.length).toBeGreaterThanOrEqual(6);
  });

  it("has unique, kebab-case ladder keys and unique names", () => {
    const keys = STARTER_LADDERS.map((ladder) => ladder.key);
    expect(new Set(keys).size).toBe(keys.length);
    for (const key of keys) expect(key).toMatch(SLUG);
    const names = STARTER_LADDERS.map((ladder) => ladder.name);
    expect(new Set(names).size).toBe(names.length);
  });

  it("gives every ladder 6–10 rungs, a target skill, short notes and a known promotion mode", () => {
    for (const ladder of STARTER_LADDERS) {
      expect(ladder.rungs.length, ladder.key).toBeGreaterThanOrEqual(6);
      expect(ladder.rungs.length, ladder.key).toBeLessThanOrEqual(10);
      expect(ladder.targetSkill.trim(), ladder.key).not.toBe("");
      expect(ladder.notes.trim(), ladder.key).not.toBe("");
      const sentences = ladder.notes.split(/[.!?](?:\s|$)/).filter((part) => part.trim() !== "");
      expect(sentences.length, ladder.key).toBeLessThanOrEqual(2);
      expect(PROMOTION_MODES, ladder.key).toContain(ladder.promotionMode);
    }
  });

  // common practice, no source: the press and rings lines are the riskier ones; a coach confirms.
  it("asks the coach to approve promotions on the press and rings lines, and auto-promotes most", () => {
    const approve = STARTER_LADDERS.filter((ladder) => ladder.promotionMode === "approve");
    expect(approve.map((ladder) => ladder.key).sort()).toEqual(["press-to-handstand", "ring-muscle-up"]);
    expect(approve.length * 2).toBeLessThan(STARTER_LADDERS.length);
  });
});

describe("starter library: rungs", () => {
  it("has unique, kebab-case rung keys and unique names within each ladder", () => {
    for (const ladder of STARTER_LADDERS) {
      const keys = ladder.rungs.map((rung) => rung.key);
      expect(new Set(keys).size, ladder.key).toBe(keys.length);
      for (const key of keys) expect(key, ladder.key).toMatch(SLUG);
      const names = ladder.rungs.map((rung) => rung.name);
      expect(new Set(names).size, ladder.key).toBe(names.length);
    }
  });

  it("uses only known measures, and both an eccentric and an each-side measure somewhere", () => {
    for (const entry of ALL_RUNGS) expect(MEASURES, label(entry)).toContain(entry.rung.measure);
    const measures = new Set(ALL_RUNGS.map(({ rung }) => rung.measure));
    expect(measures.has("eccentric_seconds")).toBe(true);
    expect(measures.has("hold_seconds_each_side") || measures.has("reps_each_side")).toBe(true);
  });

  it("gives every rung 2–4 short single-line cues and a non-empty name", () => {
    for (const entry of ALL_RUNGS) {
      const { rung } = entry;
      expect(rung.name.trim(), label(entry)).not.toBe("");
      expect(rung.cues.length, label(entry)).toBeGreaterThanOrEqual(2);
      expect(rung.cues.length, label(entry)).toBeLessThanOrEqual(4);
      for (const cue of rung.cues) {
        expect(cue.trim(), label(entry)).not.toBe("");
        expect(cue, label(entry)).not.toMatch(/\n/);
        expect(cue.length, label(entry)).toBeLessThanOrEqual(80);
      }
      if (rung.setting !== undefined) expect(rung.setting.trim(), label(entry)).not.toBe("");
      if (rung.caution !== undefined) {
        expect(rung.caution.trim(), label(entry)).not.toBe("");
        expect(rung.caution.length, label(entry)).toBeLessThanOrEqual(140);
      }
    }
  });

  it("uses only tags from RUNG_TAGS, at least one per rung, without repeats", () => {
    const known: readonly string[] = RUNG_TAGS;
    for (const entry of ALL_RUNGS) {
      const { tags } = entry.rung;
      expect(tags.length, label(entry)).toBeGreaterThan(0);
      expect(new Set(tags).size, label(entry)).toBe(tags.length);
      for (const tag of tags) expect(known, label(entry)).toContain(tag);
    }
  });

  // common practice, no source: tag pairings a coach expects.
  it("tags rings work with grip, hand support with wrist, and every inversion on the hands", () => {
    for (const entry of ALL_RUNGS) {
      const tags: readonly string[] = entry.rung.tags;
      if (tags.includes("rings")) expect(tags, label(entry)).toContain("grip");
      if (tags.includes("hand_support")) expect(tags, label(entry)).toContain("wrist");
      if (tags.includes("inversion")) expect(tags, label(entry)).toContain("hand_support");
    }
  });

  // common practice, no source: each line ends on its hardest rung, near-maximal except balance work.
  it("tags the last rung max_effort on every strength line", () => {
    for (const ladder of STARTER_LADDERS.filter((l) => l.key !== "freestanding-handstand")) {
      const last = ladder.rungs[ladder.rungs.length - 1];
      expect(last?.tags, ladder.key).toContain("max_effort");
    }
  });

  // common practice, no source (design brief §5).
  it("gives every inverted rung a caution that names a wall or a spotter", () => {
    for (const entry of ALL_RUNGS.filter(({ rung }) => rung.tags.includes("inversion"))) {
      expect(entry.rung.caution ?? "", label(entry)).toMatch(/\b(wall|spotter)\b/i);
    }
  });

  // common practice, no source (design brief §5): grip, wrist and elbow load on rings.
  it("gives every rings rung a caution", () => {
    const rings = ALL_RUNGS.filter(({ rung }) => rung.tags.includes("rings"));
    expect(rings.length).toBeGreaterThan(0);
    for (const entry of rings) expect(entry.rung.caution?.trim() ?? "", label(entry)).not.toBe("");
  });
});

describe("starter library: standards", () => {
  it("keeps sets, values and counts positive integers under sane limits", () => {
    for (const entry of ALL_RUNGS) {
      const { measure, standard } = entry.rung;
      const at = label(entry);
      expect(Number.isInteger(standard.sets), at).toBe(true);
      expect(standard.sets, at).toBeGreaterThanOrEqual(1);
      expect(standard.sets, at).toBeLessThanOrEqual(10);
      expect(standard.minValue, at).toBeGreaterThan(0);
      switch (measure) {
        case "hold_seconds":
        case "hold_seconds_each_side":
          expect(standard.minValue, at).toBeLessThanOrEqual(600);
          expect(standard.minReps ?? null, at).toBeNull();
          break;
        case "reps":
        case "reps_each_side":
          expect(Number.isInteger(standard.minValue), at).toBe(true);
          expect(standard.minValue, at).toBeLessThanOrEqual(100);
          expect(standard.minReps ?? null, at).toBeNull();
          break;
        case "eccentric_seconds":
          expect(standard.minValue, at).toBeLessThanOrEqual(60);
          expect(Number.isInteger(standard.minReps), at).toBe(true);
          expect(standard.minReps ?? 0, at).toBeGreaterThanOrEqual(1);
          expect(standard.minReps ?? 0, at).toBeLessThanOrEqual(20);
          break;
        case "distance_m":
          expect(standard.minValue, at).toBeLessThanOrEqual(1000);
          expect(standard.minReps ?? null, at).toBeNull();
          break;
      }
    }
  });

  it("sets exactly one effort ceiling or none, within its scale", () => {
    for (const entry of ALL_RUNGS) {
      const { maxRpe, minRir } = entry.rung.standard;
      const hasRpe = maxRpe !== undefined && maxRpe !== null;
      const hasRir = minRir !== undefined && minRir !== null;
      expect(hasRpe && hasRir, label(entry)).toBe(false);
      if (hasRpe) {
        expect(maxRpe, label(entry)).toBeGreaterThanOrEqual(1);
        expect(maxRpe, label(entry)).toBeLessThanOrEqual(10);
      }
      if (hasRir) {
        expect(minRir, label(entry)).toBeGreaterThanOrEqual(0);
        expect(minRir, label(entry)).toBeLessThanOrEqual(10);
      }
    }
  });

  it("needs k of the last n sessions with 1 ≤ k ≤ n, a sane minimum of days, and no pain", () => {
    for (const entry of ALL_RUNGS) {
      const s = entry.rung.standard;
      const at = label(entry);
      expect(Number.isInteger(s.sessionsRequired) && Number.isInteger(s.sessionsWindow), at).toBe(true);
      expect(s.sessionsRequired, at).toBeGreaterThanOrEqual(1);
      expect(s.sessionsRequired, at).toBeLessThanOrEqual(s.sessionsWindow);
      expect(s.sessionsWindow, at).toBeLessThanOrEqual(10);
      expect(Number.isInteger(s.minDaysOnRung), at).toBe(true);
      expect(s.minDaysOnRung, at).toBeGreaterThanOrEqual(0);
      expect(s.minDaysOnRung, at).toBeLessThanOrEqual(90);
      expect(s.painFree, at).toBe(true);
    }
  });

  it("has no step-down rule on a ladder's first rung and a well-formed one elsewhere", () => {
    for (const entry of ALL_RUNGS) {
      const rule = entry.rung.standard.stepDown ?? null;
      if (entry.index === 0) {
        expect(rule, label(entry)).toBeNull();
        continue;
      }
      if (rule === null) continue;
      expect(rule.painSessions, label(entry)).toBeGreaterThanOrEqual(1);
      expect(rule.painSessions, label(entry)).toBeLessThanOrEqual(rule.painWindow);
      expect(rule.dropBelowPct, label(entry)).toBeGreaterThan(0);
      expect(rule.dropBelowPct, label(entry)).toBeLessThan(100);
      expect(rule.dropSessions, label(entry)).toBeGreaterThanOrEqual(1);
    }
  });

  // common practice, no source: defaults from design brief §4, adapted per rung.
  it("keeps hold rungs near the §4 default of 3 sets at RPE ≤ 7 unless the rung is near-maximal", () => {
    for (const entry of ALL_RUNGS.filter(({ rung }) => rung.measure === "hold_seconds")) {
      const { standard, tags } = entry.rung;
      const ceiling = tags.includes("max_effort") || standard.minDaysOnRung >= 14 ? 8 : 7;
      if (standard.maxRpe !== null && standard.maxRpe !== undefined) {
        expect(standard.maxRpe, label(entry)).toBeLessThanOrEqual(ceiling);
      }
    }
  });
});

describe("starter library: prerequisites", () => {
  it("resolves every prerequisite to an existing rung on a different ladder", () => {
    for (const entry of ALL_RUNGS) {
      for (const ref of entry.rung.prerequisites ?? []) {
        expect(ref.ladder, label(entry)).not.toBe(entry.ladder.key);
        expect(findStarterRung(ref.ladder, ref.rung), `${label(entry)} → ${ref.ladder}/${ref.rung}`).toBeDefined();
      }
    }
  });

  it("has no prerequisite cycles, counting ladder order", () => {
    expect(findPrerequisiteCycle(STARTER_LADDERS)).toBeNull();
  });

  it("lists ladders so that every prerequisite points to an earlier ladder (seed order)", () => {
    STARTER_LADDERS.forEach((ladder, position) => {
      for (const rung of ladder.rungs) {
        for (const ref of rung.prerequisites ?? []) {
          const target = STARTER_LADDERS.findIndex((other) => other.key === ref.ladder);
          expect(target, `${ladder.key}/${rung.key}`).toBeGreaterThanOrEqual(0);
          expect(target, `${ladder.key}/${rung.key}`).toBeLessThan(position);
        }
      }
    });
  });

  it("the cycle check finds a cycle that goes through ladder order", () => {
    const rung = (key: string, needs?: { ladder: string; rung: string }): StarterRung => ({
      key,
      name: key,
      measure: "reps",
      cues: ["one", "two"],
      tags: ["core"],
      ...(needs ? { prerequisites: [needs] } : {}),
      standard: {
        sets: 3,
        minValue: 8,
        sessionsRequired: 2,
        sessionsWindow: 3,
        minDaysOnRung: 7,
        painFree: true,
      },
    });
    const ladder = (key: string, rungs: StarterRung[]): StarterLadder => ({
      key,
      name: key,
      targetSkill: key,
      notes: key,
      promotionMode: "auto",
      rungs,
    });
    // a/first needs b/second; b/second comes after b/first, which needs a/second, after a/first.
    const cyclic = [
      ladder("a", [rung("first", { ladder: "b", rung: "second" }), rung("second")]),
      ladder("b", [rung("first", { ladder: "a", rung: "second" }), rung("second")]),
    ];
    expect(findPrerequisiteCycle(cyclic)).not.toBeNull();
    const acyclic = [
      ladder("a", [rung("first"), rung("second")]),
      ladder("b", [rung("first", { ladder: "a", rung: "second" }), rung("second")]),
    ];
    expect(findPrerequisiteCycle(acyclic)).toBeNull();
  });
});
