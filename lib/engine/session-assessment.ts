/** One session judged against a standard. */
import { setFraction, setMeetsValue, setQualifies, setValue } from "./set-value";
import type { Measure, Session, Standard } from "./types";

export interface SessionAssessment {
  /** Sets whose value (and lowerings) reached the standard, effort aside. */
  valueSets: number;
  /** Sets that also stayed within the effort ceiling. */
  qualifyingSets: number;
  /** At least `standard.sets` qualifying sets and, for painFree standards, no pain flag. */
  meets: boolean;
}

export function assessSession(measure: Measure, standard: Standard, session: Session): SessionAssessment {
  let valueSets = 0;
  let qualifyingSets = 0;
  for (const set of session.sets) {
    if (setMeetsValue(measure, standard, set)) {
      valueSets += 1;
      if (setQualifies(measure, standard, set)) qualifyingSets += 1;
    }
  }
  const meets = qualifyingSets >= standard.sets && !(standard.painFree && session.pain);
  return { valueSets, qualifyingSets, meets };
}

/**
 * How close a session that did not meet the standard came, 0 to 0.99: the mean of its best
 * `standard.sets` set fractions. A pain session on a painFree standard earns nothing, as it never
 * counts.
 */
export function sessionPartial(measure: Measure, standard: Standard, session: Session): number {
  if (standard.painFree && session.pain) return 0;
  const wanted = Math.max(1, standard.sets);
  let sum = 0;
  if (session.sets.length <= wanted) {
    for (const set of session.sets) sum += setFraction(measure, standard, set);
  } else {
    const fractions = session.sets.map((set) => setFraction(measure, standard, set)).sort((a, b) => b - a);
    for (let i = 0; i < wanted; i += 1) sum += fractions[i] as number;
  }
  return Math.min(sum / wanted, 0.99);
}

/** Best judged value of a session (weaker side for each-side measures), or null when none logged. */
export function sessionBest(measure: Measure, session: Session): number | null {
  let best: number | null = null;
  for (const set of session.sets) {
    const value = setValue(measure, set);
    if (value !== null && (best === null || value > best)) best = value;
  }
  return best;
}
