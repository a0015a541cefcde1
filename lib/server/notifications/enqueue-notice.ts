import "server-only";
import type { Tx } from "@/db/client";

/** A notice the e-mail side sends after the transaction that caused it commits. */
export type Notice =
  /** An athlete moved: an auto promotion, or a coach approved a proposal. */
  | { kind: "promotion"; promotionId: string }
  /** A proposal (up or step down) now waits for a coach. */
  | { kind: "approval_needed"; promotionId: string };

/**
 * Enqueues a notice inside the caller's transaction, so a rolled-back promotion sends nothing.
 *
 * Contract stub: the e-mail integration replaces this body (an outbox row or a pg-boss job sent
 * with the transaction's client). Until then notices are dropped.
 */
export async function enqueueNotice(_tx: Tx, _notice: Notice): Promise<void> {}
