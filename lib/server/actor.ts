import type { Role } from "@/lib/permissions";

/**
 * Who is acting, resolved once per request (session cookie or API token) and passed explicitly to
 * every operation, so the same code serves handlers, server actions, jobs and tests.
 */
export interface Actor {
  userId: string;
  teamId: string;
  role: Role;
  /** The athlete record linked to this account, if any. */
  athleteId: string | null;
  name: string;
  email: string;
  timeZone: string;
}
