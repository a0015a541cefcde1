import { TZDate } from "@date-fns/tz";
import { differenceInCalendarDays } from "date-fns";
import { describe, expect, it } from "vitest";
import { evaluate } from "./evaluate";
import { holdStandard } from "./test-fixtures";

function daysOnRung(since: string, iso: string, timeZone: string): number {
  return evaluate({
    measure: "hold_seconds",
    standard: holdStandard(),
    sessions: [],
    since,
    asOf: new Date(iso),
    timeZone,
    prerequisites: [],
  }).daysOnRung;
}

/** Reference: date-fns differenceInCalendarDays on @date-fns/tz TZDate values. */
function referenceDays(since: string, iso: string, timeZone: string): number {
  const [y, m, d] = since.split("-").map(Number) as [number, number, number];
  return differenceInCalendarDays(new TZDate(new Date(iso).getTime(), timeZone), new TZDate(y, m - 1, d, timeZone));
}

describe("days on the rung are calendar days in the team's zone", () => {
  it.each([
    // Europe/Berlin spring forward 2026-03-29 01:00 UTC (EU rule). Elapsed-hours counting would
    // give 7 for the 8th local day, since that local day started one hour "early".
    ["Europe/Berlin", "2026-03-22", "2026-03-28T22:59:59Z", 6], // 23:59:59 CET on 03-28
    ["Europe/Berlin", "2026-03-22", "2026-03-28T23:30:00Z", 7], // 00:30 CET on 03-29
    ["Europe/Berlin", "2026-03-22", "2026-03-29T22:30:00Z", 8], // 00:30 CEST on 03-30: 7 d 23.5 h elapsed
    // Europe/Berlin fall back 2026-10-25 01:00 UTC: that local day has 25 hours.
    ["Europe/Berlin", "2026-10-18", "2026-10-24T22:30:00Z", 7], // 00:30 CEST on 10-25
    ["Europe/Berlin", "2026-10-18", "2026-10-25T22:59:00Z", 7], // 23:59 CET on 10-25: 8 d 0 h 59 min elapsed
    ["Europe/Berlin", "2026-10-18", "2026-10-25T23:30:00Z", 8], // 00:30 CET on 10-26
    // America/New_York: EDT from 2026-03-08 07:00 UTC to 2026-11-01 06:00 UTC (US rule).
    ["America/New_York", "2026-03-01", "2026-03-09T03:59:00Z", 7], // 23:59 EDT on 03-08
    ["America/New_York", "2026-03-01", "2026-03-09T04:30:00Z", 8], // 00:30 EDT on 03-09
    ["America/New_York", "2026-10-25", "2026-11-02T04:59:00Z", 7], // 23:59 EST on 11-01
    // East of UTC: the local date runs ahead of the UTC date.
    ["Pacific/Auckland", "2026-03-04", "2026-03-10T11:30:00Z", 7], // 00:30 NZDT on 03-11, UTC date 03-10
    ["Pacific/Auckland", "2026-03-29", "2026-04-05T12:30:00Z", 8], // 00:30 NZST on 04-06, after NZDT ends 04-05
    ["Asia/Tokyo", "2026-04-25", "2026-05-01T15:30:00Z", 7], // 00:30 JST on 05-02, UTC date 05-01
    ["Asia/Tokyo", "2026-04-25", "2026-05-01T14:59:00Z", 6],
  ])("%s since %s at %s → %i days", (zone, since, iso, expected) => {
    expect(daysOnRung(since, iso, zone)).toBe(expected);
    // Cross-check with the reference library.
    expect(referenceDays(since, iso, zone)).toBe(expected);
  });
});
