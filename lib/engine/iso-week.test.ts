import { addDays, format, getISODay, getISOWeek, getISOWeeksInYear, getISOWeekYear, startOfISOWeek } from "date-fns";
import { describe, expect, it } from "vitest";
import { isoWeekDate, isoWeekday, isoWeekOf, isoWeekOfChecked, isoWeeksInYear, parseIsoWeek, weekOfInstant } from "./iso-week";

describe("ISO 8601 week dates", () => {
  it.each([
    // ISO 8601 week-date examples (design.md §8).
    ["2005-01-01", "2004-W53-6"],
    ["2012-12-31", "2013-W01-1"],
    ["2021-01-03", "2020-W53-7"],
    ["2024-12-30", "2025-W01-1"],
    ["2027-01-01", "2026-W53-5"],
  ])("%s → %s (ISO 8601)", (date, expected) => {
    expect(isoWeekDate(date)).toBe(expected);
    expect(isoWeekOf(date)).toBe(expected.slice(0, 8));
    expect(isoWeekday(date)).toBe(Number(expected.slice(-1)));
  });

  it("agrees with date-fns getISOWeek/getISOWeekYear/getISODay on every day of 2000–2040 (reference library)", () => {
    let day = new Date(2000, 0, 1, 12); // local noon: date-fns works in the process zone
    let checked = 0;
    let week53 = 0;
    while (day.getFullYear() <= 2040) {
      const date = format(day, "yyyy-MM-dd");
      const expected = `${getISOWeekYear(day)}-W${String(getISOWeek(day)).padStart(2, "0")}-${getISODay(day)}`;
      expect(isoWeekDate(date)).toBe(expected);
      if (expected.includes("-W53-")) week53 += 1;
      checked += 1;
      day = addDays(day, 1);
    }
    expect(checked).toBe(14_976); // 41 years, 10 of them leap years
    expect(week53).toBeGreaterThan(0); // the awkward weeks were exercised
  });
});

describe("parseIsoWeek", () => {
  it("2026-W49 → Monday 2026-11-30 to Sunday 2026-12-06 (ISO 8601)", () => {
    expect(parseIsoWeek("2026-W49")).toEqual({ year: 2026, week: 49, start: "2026-11-30", end: "2026-12-06" });
    expect(parseIsoWeek("2026-W53")).toEqual({ year: 2026, week: 53, start: "2026-12-28", end: "2027-01-03" });
    expect(parseIsoWeek("2020-W01")?.start).toBe("2019-12-30");
  });

  it.each(["2025-W53", "2026-W00", "2026-W54", "2026-W5", "2026W49", "26-W49", "2026-w49", ""])("%s → null", (text) => {
    expect(parseIsoWeek(text)).toBeNull();
  });

  it("matches date-fns startOfISOWeek and getISOWeeksInYear for every week of 2000–2040 (reference library)", () => {
    for (let year = 2000; year <= 2040; year += 1) {
      const jan4 = new Date(year, 0, 4, 12);
      expect(isoWeeksInYear(year)).toBe(getISOWeeksInYear(jan4));
      for (let week = 1; week <= isoWeeksInYear(year); week += 1) {
        const parsed = parseIsoWeek(`${year}-W${String(week).padStart(2, "0")}`);
        const monday = startOfISOWeek(addDays(jan4, 7 * (week - 1)));
        expect(parsed?.start).toBe(format(monday, "yyyy-MM-dd"));
        expect(parsed?.end).toBe(format(addDays(monday, 6), "yyyy-MM-dd"));
      }
      expect(parseIsoWeek(`${year}-W${isoWeeksInYear(year) + 1}`)).toBeNull();
    }
  });
});

describe("weeks in the team's zone", () => {
  it("Sunday 23:30 UTC is already Monday of the next ISO week in Asia/Tokyo", () => {
    // 2026-12-06 is a Sunday (2026-W49-7, ISO 8601; checked against date-fns above).
    const instant = new Date("2026-12-06T23:30:00Z");
    expect(weekOfInstant(instant, "UTC")).toBe("2026-W49");
    expect(weekOfInstant(instant, "Asia/Tokyo")).toBe("2026-W50");
  });

  it("refuses malformed dates when asked to check", () => {
    expect(isoWeekOfChecked("2026-02-30")).toBeNull();
    expect(isoWeekOfChecked("2026-02-28")).toBe("2026-W09");
  });
});
