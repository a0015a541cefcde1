/**
 * The demo scenario: an invented club with invented people. Demo data only; the shared password
 * below is printed by `npm start` and must never be used for real accounts.
 */
export const DEMO_PASSWORD = "rungwise-demo";

export const DEMO_CLUB = { name: "Cobbleyard Hand Balance Club", timeZone: "Europe/Amsterdam" } as const;

export const DEMO_OWNER = { name: "Maren Okafor", email: "coach@rungwise.test" } as const;
export const DEMO_COACH = { name: "Teo Lindqvist", email: "teo@rungwise.test" } as const;

/** Eight athletes; two train in person only and have no sign-in. */
export const DEMO_ATHLETES = [
  { key: "priya", name: "Priya Dalgaard", email: "athlete@rungwise.test", account: true, coach: "owner" },
  { key: "jonas", name: "Jonas Whitfield", email: "jonas@rungwise.test", account: true, coach: "owner" },
  { key: "amara", name: "Amara Castell", email: "amara@rungwise.test", account: true, coach: "owner" },
  { key: "felix", name: "Felix Nakamura", email: "felix@rungwise.test", account: true, coach: "coach" },
  { key: "ines", name: "Ines Brodeur", email: "ines@rungwise.test", account: true, coach: "coach" },
  { key: "sol", name: "Sol Marquez", email: "sol@rungwise.test", account: true, coach: "owner" },
  { key: "hugo", name: "Hugo Tamsin", email: null, account: false, coach: "coach" },
  { key: "lotte", name: "Lotte Varga", email: null, account: false, coach: "owner" },
] as const;

export type DemoAthleteKey = (typeof DEMO_ATHLETES)[number]["key"];
