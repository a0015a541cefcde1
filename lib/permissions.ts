/**
 * Who may do what, in one table. Handlers ask `can(role, permission)`; the data layer still scopes
 * every query to the actor's team (and, for athletes, to their own record).
 */
export const ROLES = ["owner", "coach", "athlete"] as const;
export type Role = (typeof ROLES)[number];

const STAFF = ["owner", "coach"] as const satisfies readonly Role[];
const EVERYONE = ROLES;

export const PERMISSIONS = {
  "me.read": EVERYONE,
  "tokens.manage": EVERYONE,
  "athletes.read": EVERYONE, // athletes see only their own record (enforced in the query)
  "athletes.write": STAFF,
  "athletes.invite": STAFF,
  "coaches.invite": ["owner"],
  "team.manage": ["owner"],
  "ladders.read": EVERYONE,
  "ladders.write": STAFF,
  "ladders.backtest": STAFF, // what-if replays read every athlete's sessions on a rung
  "positions.read": EVERYONE,
  "positions.write": STAFF,
  "squads.read": STAFF,
  "squads.write": STAFF,
  "blocks.read": EVERYONE,
  "blocks.write": STAFF,
  "plans.read": EVERYONE,
  "plans.write": STAFF,
  "assignments.write": STAFF,
  "logs.read": EVERYONE,
  "logs.write": EVERYONE, // athletes log for themselves; staff for any athlete of the team
  "promotions.read": EVERYONE,
  "promotions.decide": STAFF,
  "readiness.read": STAFF,
  "load.read": EVERYONE,
  "digests.run": STAFF,
  "digests.preview": EVERYONE,
  "jobs.admin": ["owner"],
  "uploads.write": EVERYONE,
  "formChecks.read": EVERYONE,
  "formChecks.write": EVERYONE,
  "formChecks.comment": STAFF,
  "billing.manage": ["owner"],
  "billing.read": EVERYONE,
  "billing.subscribe": ["athlete"],
} as const satisfies Record<string, readonly Role[]>;

export type Permission = keyof typeof PERMISSIONS;

export function can(role: Role, permission: Permission): boolean {
  return (PERMISSIONS[permission] as readonly Role[]).includes(role);
}

export function isStaff(role: Role): boolean {
  return role === "owner" || role === "coach";
}
