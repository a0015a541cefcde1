/**
 * Verdicts in plain words for athletes and coaches, e.g. "2 of 3 sessions met — needs 3 more days
 * on this rung". Reads only the verdict, so the wording always matches what was decided.
 */
import type { Clause, ClauseName, Verdict } from "./types";

function plural(n: number, one: string, many: string): string {
  return `${n} ${n === 1 ? one : many}`;
}

function clauseOf(verdict: Verdict, name: ClauseName): Clause | undefined {
  return verdict.clauses.find((c) => c.clause === name);
}

/** "Tuck press rung 4 on the Press line and L-sit rung 2 on the Compression line". */
export function waitingText(waitingFor: Verdict["waitingFor"]): string {
  return waitingFor.map((w) => `${w.rungName} on the ${w.ladderName} line`).join(" and ");
}

function sessionsSummary(verdict: Verdict): string {
  const sessions = clauseOf(verdict, "sessions");
  if (!sessions) return "";
  return `${sessions.have} of ${plural(sessions.window ?? sessions.required, "session", "sessions")} met`;
}

export function explainVerdict(verdict: Verdict): string {
  switch (verdict.status) {
    case "step_down":
      return `${verdict.stepDown?.detail ?? "Standard slipping"} — step down proposed`;
    case "met":
      return `Ready to move up: ${sessionsSummary(verdict)}, ${plural(verdict.daysOnRung, "day", "days")} on this rung`;
    case "blocked":
      return `Ready: waiting for ${waitingText(verdict.waitingFor)}`;
    case "not_yet":
      return notYetText(verdict);
  }
}

function notYetText(verdict: Verdict): string {
  const needs: string[] = [];
  const notes: string[] = [];
  const sessions = clauseOf(verdict, "sessions");
  if (sessions && !sessions.pass) {
    needs.push(`${plural(sessions.required - sessions.have, "more session", "more sessions")} meeting the standard`);
    const sets = clauseOf(verdict, "sets");
    const effort = clauseOf(verdict, "effort");
    if (sets && !sets.pass && sets.window) notes.push(`best session reached the target in ${sets.have} of ${plural(sets.required, "set", "sets")}`);
    else if (effort && !effort.pass && effort.window) notes.push(`best session had ${effort.have} of ${plural(effort.required, "set", "sets")} ${effort.detail ?? ""}`.trim());
  }
  const days = clauseOf(verdict, "days");
  if (days && !days.pass) needs.push(`${plural(days.required - days.have, "more day", "more days")} on this rung`);
  const pain = clauseOf(verdict, "pain");
  if (pain && !pain.pass) needs.push("a pain-free session (the latest was flagged pain)");
  if (verdict.waitingFor.length > 0) notes.push(`then waits for ${waitingText(verdict.waitingFor)}`);

  let text = sessionsSummary(verdict);
  if (needs.length > 0) text += ` — needs ${needs.join(" and ")}`;
  if (notes.length > 0) text += `; ${notes.join("; ")}`;
  return text;
}

/** One line per clause, for a checklist beside the verdict. */
export function explainClause(clause: Clause): string {
  switch (clause.clause) {
    case "sets":
      return `Best session: ${clause.have} of ${plural(clause.required, "set", "sets")} reached the target`;
    case "effort":
      return `Best session: ${clause.have} of ${plural(clause.required, "set", "sets")} ${clause.detail ?? "within the effort ceiling"}`;
    case "sessions":
      return `${clause.have} of the last ${plural(clause.window ?? clause.required, "session", "sessions")} met (needs ${clause.required})`;
    case "days":
      return `${clause.have} of ${plural(clause.required, "day", "days")} on this rung`;
    case "pain":
      return clause.pass ? "Latest session pain-free" : "Latest session flagged pain";
    case "prerequisites":
      return clause.required === 0
        ? "No prerequisites"
        : `${clause.have} of ${plural(clause.required, "prerequisite", "prerequisites")} reached`;
  }
}
