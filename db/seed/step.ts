import type { Tx } from "../client";

/**
 * One versioned seed step. Steps run in order, each once per database, inside its own transaction;
 * a later change adds a step instead of editing an applied one, so existing databases catch up.
 */
export interface SeedStep {
  name: string;
  run(tx: Tx, context: SeedContext): Promise<void>;
}

export interface SeedContext {
  /** The day the seed runs, so demo history is dated relative to it. */
  now: Date;
}
