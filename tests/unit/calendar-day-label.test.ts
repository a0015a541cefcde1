import { describe, expect, it } from "vitest";
import { calendarDayLabel } from "@/lib/calendar-day-label";

describe("calendarDayLabel", () => {
  // Weekdays checked against the ISO calendar: 2026-11-30 is a Monday (ISO week 49 starts that day),
  // 2024-02-29 a Thursday.
  it("names the weekday, day, month and year of a calendar date", () => {
    expect(calendarDayLabel("2026-11-30")).toBe("Mon 30 Nov 2026");
    expect(calendarDayLabel("2024-02-29")).toBe("Thu 29 Feb 2024");
  });
});
