import "server-only";
import type { Tx } from "@/db/client";

/**
 * What every new team starts with, in the sign-up transaction. The starter ladder library hooks in
 * here so new teams and the demo get the same library.
 */
export async function afterTeamCreated(_tx: Tx, _team: { teamId: string; ownerId: string }): Promise<void> {
  // The starter library is installed here once ladders exist.
}
