import "server-only";
import { eq, and, isNull, sql } from "drizzle-orm";
import type { Tx } from "@/db/client";
import { ladders, rungPrerequisites, rungs } from "@/db/schema";
import { checkPrerequisites, type PrerequisiteProblem, type PrerequisiteRung } from "@/lib/engine";
import { Unprocessable, type FieldIssue } from "@/lib/errors";

/**
 * Serialises structural edits of one team's ladders (rungs, order, prerequisites), so two edits
 * that are each fine alone cannot together close a prerequisite cycle.
 */
export async function lockTeamLadders(tx: Tx, teamId: string): Promise<void> {
  await tx.execute(sql`select pg_advisory_xact_lock(hashtextextended(${`rungwise.ladders:${teamId}`}, 0))`);
}

interface GraphRung extends PrerequisiteRung {
  name: string;
  ladderName: string;
  prerequisites: string[];
  /** Where this rung's prerequisites came from in the request body, when it is being edited. */
  path?: string;
}

export interface GraphEdit {
  /** Rungs added or changed by the request; ids of new rungs may be placeholders such as "new:0". */
  upsert?: { id: string; ladderId: string; ladderName?: string; name: string; position: number; prerequisites?: string[]; path: string }[];
  /** Rungs leaving the live graph (archived or deleted). */
  remove?: string[];
  /** New positions of a ladder's rungs (a reorder), and the body path to blame. */
  reorder?: { positions: Map<string, number>; path: string };
}

/** The team's live rungs and their prerequisites, as the engine's graph input. */
async function loadGraph(tx: Tx, teamId: string): Promise<Map<string, GraphRung>> {
  const rows = await tx
    .select({ id: rungs.id, ladderId: rungs.ladderId, position: rungs.position, name: rungs.name, ladderName: ladders.name })
    .from(rungs)
    .innerJoin(ladders, eq(ladders.id, rungs.ladderId))
    .where(and(eq(rungs.teamId, teamId), isNull(rungs.archivedAt)));
  const graph = new Map<string, GraphRung>(rows.map((r) => [r.id, { ...r, prerequisites: [] }]));
  const edges = await tx
    .select({ rungId: rungPrerequisites.rungId, requiresRungId: rungPrerequisites.requiresRungId })
    .from(rungPrerequisites)
    .where(eq(rungPrerequisites.teamId, teamId));
  for (const edge of edges) graph.get(edge.rungId)?.prerequisites.push(edge.requiresRungId);
  return graph;
}

function label(graph: Map<string, GraphRung>, id: string): string {
  const rung = graph.get(id);
  return rung ? `${rung.ladderName} › ${rung.name}` : id;
}

function issueOf(graph: Map<string, GraphRung>, problem: PrerequisiteProblem, reorderPath?: string): FieldIssue {
  const blamed = problem.problem === "cycle" ? problem.path.find((id) => graph.get(id)?.path) : undefined;
  const rung = graph.get(blamed ?? problem.rungId);
  const needed = problem.path[1] ?? "";
  const index = rung ? rung.prerequisites.indexOf(needed) : -1;
  const at = rung?.path ? (index >= 0 && problem.problem !== "cycle" ? `${rung.path}.${index}` : rung.path) : (reorderPath ?? "(root)");
  switch (problem.problem) {
    case "unknown_rung":
      return { path: at, message: `Prerequisite ${needed} is not a live rung of another ladder in your team.` };
    case "same_ladder":
      return { path: at, message: `${label(graph, needed)} is on the same ladder: ladder order already covers it.` };
    case "cycle":
      return { path: at, message: `This would make a cycle no athlete could finish: ${problem.path.map((id) => label(graph, id)).join(" → ")}.` };
  }
}

/**
 * Checks the team's prerequisite graph as it would be after an edit (engine's checkPrerequisites:
 * same-ladder prerequisites, unknown rungs, cycles through ladder order) and throws a 422 naming each
 * problem's body path. Call inside the write's transaction, after lockTeamLadders.
 */
export async function assertPrerequisiteGraph(tx: Tx, teamId: string, edit: GraphEdit): Promise<void> {
  const graph = await loadGraph(tx, teamId);
  for (const id of edit.remove ?? []) graph.delete(id);
  for (const rung of graph.values()) rung.prerequisites = rung.prerequisites.filter((id) => !(edit.remove ?? []).includes(id));
  for (const change of edit.upsert ?? []) {
    const existing = graph.get(change.id);
    graph.set(change.id, {
      id: change.id,
      ladderId: change.ladderId,
      ladderName: change.ladderName ?? existing?.ladderName ?? "",
      name: change.name,
      position: change.position,
      prerequisites: change.prerequisites ?? existing?.prerequisites ?? [],
      path: change.path,
    });
  }
  for (const [id, position] of edit.reorder?.positions ?? []) {
    const rung = graph.get(id);
    if (rung) rung.position = position;
  }
  const problems = checkPrerequisites([...graph.values()]);
  if (problems.length === 0) return;
  throw new Unprocessable(
    "The prerequisites are not valid.",
    problems.map((p) => issueOf(graph, p, edit.reorder?.path)),
  );
}
