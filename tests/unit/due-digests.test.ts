import { getISOWeek, getISOWeekYear } from "date-fns";
import { describe, expect, it } from "vitest";
import { dueDigestWeek } from "@/lib/server/jobs/due-digests";

// ISO 8601 week numbering, cross-checked with date-fns getISOWeek/getISOWeekYear as the reference.
const isoLabel = (y: number, m: number, d: number) => {
  const date = new Date(y, m - 1, d);
  return `${getISOWeekYear(date)}-W${String(getISOWeek(date)).padStart(2, "0")}`;
};

const MONDAY_7 = { digestWeekday: 1, digestHour: 7 };

describe("dueDigestWeek", () => {
  it("is not due before Monday 07:00 team time, then covers the week just ended", () => {
    // 2026-11-30 is a Monday (2026-W49). 06:59 in Amsterdam (UTC+1 in winter) is 05:59 UTC.
    expect(dueDigestWeek(new Date("2026-11-30T05:59:00Z"), "Europe/Amsterdam", MONDAY_7)).toBeNull();
    expect(dueDigestWeek(new Date("2026-11-30T06:00:00Z"), "Europe/Amsterdam", MONDAY_7)).toBe(isoLabel(2026, 11, 29));
    expect(isoLabel(2026, 11, 29)).toBe("2026-W48");
  });

  it("uses the team's zone, not UTC, for the weekday", () => {
    // Sunday 2026-11-29 23:30 UTC is already Monday 08:30 in Tokyo (UTC+9).
    expect(dueDigestWeek(new Date("2026-11-29T23:30:00Z"), "Asia/Tokyo", MONDAY_7)).toBe("2026-W48");
    expect(dueDigestWeek(new Date("2026-11-29T23:30:00Z"), "America/New_York", MONDAY_7)).toBe("2026-W47");
  });

  it("catches up later in the week after an outage, for the same week", () => {
    expect(dueDigestWeek(new Date("2026-12-03T12:00:00Z"), "Europe/Amsterdam", MONDAY_7)).toBe("2026-W48");
  });

  it("a Sunday choice covers the week ending that day; across the year end weeks follow ISO 8601", () => {
    // 2027-01-03 is a Sunday of 2026-W53 (2027-01-01 → 2026-W53-5, design.md §8).
    const sunday = { digestWeekday: 7, digestHour: 18 };
    expect(dueDigestWeek(new Date("2027-01-03T18:00:00Z"), "UTC", sunday)).toBe(isoLabel(2027, 1, 2));
    expect(isoLabel(2027, 1, 2)).toBe("2026-W53");
    expect(dueDigestWeek(new Date("2027-01-03T17:59:00Z"), "UTC", sunday)).toBeNull();
  });
});
