/** Builders shared by the engine's tests: a set, a session, a hold standard. */
import { defaultStandard } from "./defaults";
import type { Session, SetEntry, Standard } from "./types";

export function sets(count: number, entry: SetEntry): SetEntry[] {
  return Array.from({ length: count }, () => ({ ...entry }));
}

export function session(date: string, entries: SetEntry[], pain = false): Session {
  return { date, sets: entries, pain };
}

/** design.md §4 hold default with optional overrides (common practice, no source). */
export function holdStandard(overrides: Partial<Standard> = {}): Standard {
  return { ...defaultStandard("hold_seconds"), ...overrides };
}
