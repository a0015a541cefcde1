import type { Role } from "./permissions";

/**
 * Navigation as data: every entry names the roles that see it. Shells render what the role allows;
 * pages still check access in the data layer.
 */
export interface NavItem {
  href: string;
  label: string;
  roles: readonly Role[];
  /** Short label for the phone tab bar. */
  short?: string;
  /** Coach navigation is grouped by the kind of work, so a dozen entries still read at a glance. */
  group?: NavGroup;
}

export type NavGroup = "week" | "build" | "club";

export const NAV_GROUP_LABELS: Record<NavGroup, string> = {
  week: "This week's work",
  build: "Build training",
  club: "Run the club",
};

export const COACH_NAV: readonly NavItem[] = [
  { href: "/coach/readiness", label: "This week", roles: ["owner", "coach"], group: "week" },
  { href: "/coach/athletes", label: "Athletes", roles: ["owner", "coach"], group: "week" },
  { href: "/coach/form-checks", label: "Form checks", roles: ["owner", "coach"], group: "week" },
  { href: "/coach/approvals", label: "Approvals", roles: ["owner", "coach"], group: "week" },
  { href: "/coach/ladders", label: "Ladders", roles: ["owner", "coach"], group: "build" },
  { href: "/coach/squads", label: "Squads", roles: ["owner", "coach"], group: "build" },
  { href: "/coach/blocks", label: "Blocks", roles: ["owner", "coach"], group: "build" },
  { href: "/coach/plans", label: "Plans", roles: ["owner", "coach"], group: "build" },
  { href: "/coach/team", label: "Team", roles: ["owner", "coach"], group: "club" },
  { href: "/settings", label: "Settings", roles: ["owner", "coach"], group: "club" },
  { href: "/coach/admin/jobs", label: "Mail jobs", roles: ["owner"], group: "club" },
  { href: "/coach/billing", label: "Billing", roles: ["owner"], group: "club" },
];

export const ATHLETE_NAV: readonly NavItem[] = [
  { href: "/today", label: "Today", short: "Today", roles: ["athlete"] },
  { href: "/progress", label: "Progress", short: "Progress", roles: ["athlete"] },
  { href: "/history", label: "History", short: "History", roles: ["athlete"] },
  { href: "/form-checks", label: "Form checks", short: "Form", roles: ["athlete"] },
  { href: "/billing", label: "Membership", short: "Member", roles: ["athlete"] },
  { href: "/settings", label: "Settings", short: "Me", roles: ["athlete"] },
];

export function navFor(role: Role): readonly NavItem[] {
  const source = role === "athlete" ? ATHLETE_NAV : COACH_NAV;
  return source.filter((item) => item.roles.includes(role));
}

export function homeFor(role: Role): string {
  return role === "athlete" ? "/today" : "/coach";
}
