/**
 * Checks the prerequisite graph of a team's ladders before it is saved.
 *
 * Edges: "rung A needs rung B" for every explicit prerequisite, plus ladder order — every rung
 * needs the rung before it on its own ladder (so, transitively, all earlier rungs). A cycle among
 * these edges means no athlete could ever reach some rung: e.g. Press rung 3 needs Rings rung 2,
 * and Rings rung 2 needs Press rung 5, which comes after Press rung 3.
 *
 * Problems: a prerequisite on the rung's own ladder ("same_ladder": ladder order already covers
 * it), an id that isn't among the rungs ("unknown_rung"), and cycles ("cycle", with the rung ids
 * along it, first id repeated at the end). Flagged edges are left out of the cycle search so one
 * mistake is reported once.
 */

export interface PrerequisiteRung {
  id: string;
  ladderId: string;
  /** Order on the ladder; when absent, the order of the input array is used. */
  position?: number;
  prerequisites: readonly string[];
}

export type PrerequisiteProblemKind = "same_ladder" | "cycle" | "unknown_rung";

export interface PrerequisiteProblem {
  rungId: string;
  problem: PrerequisiteProblemKind;
  path: string[];
}

interface Edge {
  to: string;
  explicit: boolean;
}

export function checkPrerequisites(rungs: readonly PrerequisiteRung[]): PrerequisiteProblem[] {
  const problems: PrerequisiteProblem[] = [];
  const byId = new Map(rungs.map((r) => [r.id, r]));
  const edges = new Map<string, Edge[]>(rungs.map((r) => [r.id, []]));

  for (const rung of rungs) {
    for (const needed of rung.prerequisites) {
      const target = byId.get(needed);
      if (!target) problems.push({ rungId: rung.id, problem: "unknown_rung", path: [rung.id, needed] });
      else if (target.ladderId === rung.ladderId) problems.push({ rungId: rung.id, problem: "same_ladder", path: [rung.id, needed] });
      else edges.get(rung.id)?.push({ to: needed, explicit: true });
    }
  }
  for (const ladder of laddersInOrder(rungs)) {
    for (let i = 1; i < ladder.length; i += 1) edges.get((ladder[i] as PrerequisiteRung).id)?.push({ to: (ladder[i - 1] as PrerequisiteRung).id, explicit: false });
  }

  for (const cycle of findCycles(rungs, edges)) problems.push({ rungId: cycle[0] as string, problem: "cycle", path: cycle });
  return problems;
}

function laddersInOrder(rungs: readonly PrerequisiteRung[]): PrerequisiteRung[][] {
  const ladders = new Map<string, { rung: PrerequisiteRung; index: number }[]>();
  rungs.forEach((rung, index) => {
    const list = ladders.get(rung.ladderId) ?? [];
    list.push({ rung, index });
    ladders.set(rung.ladderId, list);
  });
  return [...ladders.values()].map((list) =>
    list.sort((a, b) => (a.rung.position ?? a.index) - (b.rung.position ?? b.index) || a.index - b.index).map((x) => x.rung),
  );
}

/**
 * Depth-first search (iterative: ladders can be long) reporting one cycle per back edge, each
 * rotated to start at the smallest id that owns an explicit edge on it, and deduplicated.
 */
function findCycles(rungs: readonly PrerequisiteRung[], edges: Map<string, Edge[]>): string[][] {
  const state = new Map<string, "open" | "done">();
  const found = new Map<string, string[]>();

  for (const root of rungs) {
    if (state.has(root.id)) continue;
    const stack: { id: string; next: number }[] = [{ id: root.id, next: 0 }];
    const onPath: string[] = [root.id];
    state.set(root.id, "open");
    while (stack.length > 0) {
      const frame = stack[stack.length - 1] as { id: string; next: number };
      const out = edges.get(frame.id) ?? [];
      if (frame.next >= out.length) {
        state.set(frame.id, "done");
        stack.pop();
        onPath.pop();
        continue;
      }
      const edge = out[frame.next] as Edge;
      frame.next += 1;
      const seen = state.get(edge.to);
      if (seen === "open") {
        const cycle = onPath.slice(onPath.indexOf(edge.to));
        const normalised = rotate(cycle, edges);
        found.set(normalised.join("\u0000"), [...normalised, normalised[0] as string]);
      } else if (seen === undefined) {
        state.set(edge.to, "open");
        stack.push({ id: edge.to, next: 0 });
        onPath.push(edge.to);
      }
    }
  }
  return [...found.values()];
}

/** Start the cycle at the smallest id with an explicit edge to its successor on the cycle. */
function rotate(cycle: string[], edges: Map<string, Edge[]>): string[] {
  let start = -1;
  cycle.forEach((id, i) => {
    const next = cycle[(i + 1) % cycle.length] as string;
    const explicit = (edges.get(id) ?? []).some((e) => e.explicit && e.to === next);
    if (explicit && (start === -1 || id < (cycle[start] as string))) start = i;
  });
  if (start <= 0) return cycle;
  return [...cycle.slice(start), ...cycle.slice(0, start)];
}
