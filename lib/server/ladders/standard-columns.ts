import "server-only";
import { standards } from "@/db/schema";

/** The columns of a rung's readiness rule, selected as one nested `standard` object. */
export const standardRuleColumns = {
  sets: standards.sets,
  minValue: standards.minValue,
  minReps: standards.minReps,
  maxRpe: standards.maxRpe,
  minRir: standards.minRir,
  sessionsRequired: standards.sessionsRequired,
  sessionsWindow: standards.sessionsWindow,
  minDaysOnRung: standards.minDaysOnRung,
  painFree: standards.painFree,
};

/** The rule with its step-down settings: what the engine and the rung editor need. */
export const standardColumns = { ...standardRuleColumns, stepDown: standards.stepDown };
