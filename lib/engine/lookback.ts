/**
 * How far back a verdict looks. The engine judges the latest sessions only: the standard's
 * sessions window, and its step-down rule's pain window and run of drops. Readers that feed it
 * may stop there, so a log on a rung costs the same after a year of training as on the first day.
 */
import { stepDownRuleOf } from "./step-down";
import type { Standard } from "./types";

/**
 * The most recent sessions (up to today) a verdict under this standard depends on: the verdict on
 * any longer history equals the verdict on that many of its latest sessions (property-tested).
 */
export function lookbackSessions(standard: Standard): number {
  const rule = stepDownRuleOf(standard);
  return Math.max(1, standard.sessionsWindow, rule?.painWindow ?? 0, rule?.dropSessions ?? 0);
}
