import { differenceInCalendarDays } from "date-fns";
import { describe, expect, it } from "vitest";
import { addDays, dayNumber, daysBetween, fromDayNumber, isValidDate, parseDate } from "./calendar-date";

describe("calendar dates", () => {
  it("dayNumber agrees with ECMAScript Date.UTC on every day of 1900–2100 (reference: ECMA-262 Date.UTC)", () => {
    for (let ms = Date.UTC(1900, 0, 1); ms <= Date.UTC(2100, 11, 31); ms += 86_400_000) {
      const date = new Date(ms).toISOString().slice(0, 10);
      expect(dayNumber(date)).toBe(ms / 86_400_000);
      expect(fromDayNumber(ms / 86_400_000)).toBe(date);
    }
  });

  it("counts days like date-fns differenceInCalendarDays (reference library)", () => {
    expect(daysBetween("2024-02-28", "2024-03-01")).toBe(differenceInCalendarDays(new Date(2024, 2, 1), new Date(2024, 1, 28)));
    expect(daysBetween("2024-02-28", "2024-03-01")).toBe(2); // 2024 is a leap year (Gregorian rule)
    expect(daysBetween("2026-03-10", "2026-03-01")).toBe(-9);
    expect(addDays("2026-12-31", 1)).toBe("2027-01-01");
  });

  it.each([
    ["2026-02-28", true],
    ["2024-02-29", true], // leap year: divisible by 4 (Gregorian rule)
    ["2100-02-29", false], // not a leap year: divisible by 100, not 400 (Gregorian rule)
    ["2000-02-29", true], // leap year: divisible by 400 (Gregorian rule)
    ["2026-02-30", false],
    ["2026-13-01", false],
    ["2026-3-1", false],
    ["2026-03-01T00:00", false],
  ])("isValidDate(%s) = %s", (date, valid) => {
    expect(isValidDate(date)).toBe(valid);
    expect(parseDate(date) !== null).toBe(valid);
  });

  it("dayNumber refuses malformed text", () => {
    expect(dayNumber("2026-3-01")).toBeNaN();
    expect(dayNumber("2026/03/01")).toBeNaN();
    expect(dayNumber("20x6-03-01")).toBeNaN();
  });
});
