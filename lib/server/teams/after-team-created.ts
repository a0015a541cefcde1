import "server-only";
import type { Tx } from "@/db/client";
import { installStarterLibrary } from "@/lib/server/ladders/install-starter-library";

/**
 * What every new team starts with, inside the sign-up transaction: the starter ladder library, so a
 * coach can place athletes on day one.
 */
export async function afterTeamCreated(tx: Tx, team: { teamId: string; ownerId: string }): Promise<void> {
  await installStarterLibrary(tx, team.teamId);
}
