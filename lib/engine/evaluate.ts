/**
 * The verdict for one athlete on one rung: which clauses of the standard pass, whether to promote,
 * wait for a prerequisite or propose a step down, and how ready the athlete is.
 */
import { daysBetween, isValidDate } from "./calendar-date";
import { localDateOf } from "./local-date";
import { sessionsInRange } from "./merge-sessions";
import { readinessScore } from "./readiness";
import { assessSession, sessionPartial } from "./session-assessment";
import { effortCeilingText } from "./standard-text";
import { checkStepDown } from "./step-down";
import type { Clause, EvaluationInput, Session, Verdict, VerdictStatus } from "./types";

export function evaluate(input: EvaluationInput): Verdict {
  const { measure, standard, since } = input;
  if (!isValidDate(since)) throw new RangeError(`since must be a YYYY-MM-DD date, got "${since}"`);
  const today = localDateOf(input.asOf, input.timeZone);
  const sessions = sessionsInRange(input.sessions, since, today);

  // Window: the last n sessions by date.
  const windowSize = Math.min(Math.max(0, standard.sessionsWindow), sessions.length);
  let met = 0;
  let bestValueSets = 0;
  let bestQualifyingSets = 0;
  // How close the best non-meeting session came; feeds readiness only.
  let bestPartial = 0;
  for (let i = 0; i < windowSize; i += 1) {
    const session = sessions[i] as Session;
    const assessment = assessSession(measure, standard, session);
    if (assessment.meets) met += 1;
    else bestPartial = Math.max(bestPartial, sessionPartial(measure, standard, session));
    if (assessment.valueSets > bestValueSets) bestValueSets = assessment.valueSets;
    if (assessment.qualifyingSets > bestQualifyingSets) bestQualifyingSets = assessment.qualifyingSets;
  }

  const latest = sessions[0];
  const latestPain = latest?.pain === true;
  const daysOnRung = Math.max(0, daysBetween(since, today));
  let reached = 0;
  const waitingFor: Verdict["waitingFor"] = [];
  for (const p of input.prerequisites) {
    if (p.reached) reached += 1;
    else waitingFor.push({ rungId: p.rungId, ladderName: p.ladderName, rungName: p.rungName });
  }

  const clauses: Clause[] = [
    { clause: "sets", pass: bestValueSets >= standard.sets, required: standard.sets, have: bestValueSets, window: windowSize },
    {
      clause: "effort",
      pass: bestQualifyingSets >= standard.sets,
      required: standard.sets,
      have: bestQualifyingSets,
      window: windowSize,
      detail: effortCeilingText(standard) ?? "no effort ceiling",
    },
    {
      clause: "sessions",
      pass: met >= standard.sessionsRequired,
      required: standard.sessionsRequired,
      have: met,
      window: standard.sessionsWindow,
    },
    { clause: "days", pass: daysOnRung >= standard.minDaysOnRung, required: standard.minDaysOnRung, have: daysOnRung },
    // Never promote on a pain-flagged latest session, whatever painFree says (design.md §4).
    {
      clause: "pain",
      pass: !latestPain,
      required: 0,
      have: latestPain ? 1 : 0,
      window: 1,
      ...(latestPain && latest ? { detail: `pain flagged on ${latest.date}` } : {}),
    },
    {
      clause: "prerequisites",
      pass: waitingFor.length === 0,
      required: input.prerequisites.length,
      have: reached,
    },
  ];

  const stepDown = checkStepDown(measure, standard, sessions);
  const status = statusOf(clauses, stepDown !== null);

  return {
    status,
    clauses,
    readiness: readinessScore({
      met: status === "met",
      sessionsMet: met,
      sessionsRequired: standard.sessionsRequired,
      bestPartial,
      daysOnRung,
      minDaysOnRung: standard.minDaysOnRung,
    }),
    stepDown,
    waitingFor,
    daysOnRung,
    lastSessionDate: latest ? latest.date : null,
    sessionsMet: met,
  };
}

function statusOf(clauses: readonly Clause[], stepDown: boolean): VerdictStatus {
  if (stepDown) return "step_down";
  let failing = 0;
  let prerequisitesFail = false;
  for (const c of clauses) {
    if (c.pass) continue;
    failing += 1;
    if (c.clause === "prerequisites") prerequisitesFail = true;
  }
  if (failing === 0) return "met";
  return failing === 1 && prerequisitesFail ? "blocked" : "not_yet";
}
