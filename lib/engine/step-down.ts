/**
 * When to propose moving the athlete one rung down: repeated pain, or a clear and lasting drop
 * below the standard. A proposal, never an automatic move; the coach decides.
 */
import { DEFAULT_STEP_DOWN } from "./defaults";
import { formatValue } from "./format-value";
import { sessionBest } from "./session-assessment";
import type { Measure, Session, Standard, StepDownProposal, StepDownRule } from "./types";

/** Omitted rule → the default; null → the coach switched proposals off. */
export function stepDownRuleOf(standard: Standard): StepDownRule | null {
  return standard.stepDown === undefined ? DEFAULT_STEP_DOWN : standard.stepDown;
}

/** `newestFirst`: the rung's sessions, merged per date, newest first. Pain is checked before drop. */
export function checkStepDown(measure: Measure, standard: Standard, newestFirst: readonly Session[]): StepDownProposal | null {
  const rule = stepDownRuleOf(standard);
  if (!rule) return null;
  return painProposal(rule, newestFirst) ?? dropProposal(measure, standard, rule, newestFirst);
}

function painProposal(rule: StepDownRule, newestFirst: readonly Session[]): StepDownProposal | null {
  if (rule.painSessions < 1 || rule.painWindow < 1) return null;
  const looked = Math.min(rule.painWindow, newestFirst.length);
  let pain = 0;
  for (let i = 0; i < looked; i += 1) if ((newestFirst[i] as Session).pain) pain += 1;
  if (pain < rule.painSessions) return null;
  return { reason: "pain", detail: `Pain flagged in ${pain} of the last ${looked} sessions` };
}

/**
 * Every one of the `dropSessions` most recent sessions has its best below the threshold. A session
 * with no usable value is no evidence of a drop, so it breaks the run.
 */
function dropProposal(
  measure: Measure,
  standard: Standard,
  rule: StepDownRule,
  newestFirst: readonly Session[],
): StepDownProposal | null {
  if (rule.dropSessions < 1 || newestFirst.length < rule.dropSessions) return null;
  const threshold = (standard.minValue * rule.dropBelowPct) / 100;
  for (let i = 0; i < rule.dropSessions; i += 1) {
    const best = sessionBest(measure, newestFirst[i] as Session);
    if (best === null || best >= threshold) return null;
  }
  const sessions = rule.dropSessions === 1 ? "the latest session" : `each of the last ${rule.dropSessions} sessions`;
  return {
    reason: "drop",
    detail: `Best set under ${formatValue(measure, threshold)} (${rule.dropBelowPct} % of ${formatValue(measure, standard.minValue)}) in ${sessions}`,
  };
}
