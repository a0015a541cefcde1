import { TZDate } from "@date-fns/tz";
import { format } from "date-fns";
import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { endOfLocalDay, instantOfLocal, localDateOf } from "./local-date";

const ZONES = ["UTC", "Europe/Berlin", "America/New_York", "Pacific/Auckland", "Asia/Tokyo", "Asia/Kolkata", "Pacific/Chatham", "America/St_Johns", "Australia/Lord_Howe"];

describe("localDateOf", () => {
  it.each([
    // Zone offsets from the IANA tz database (reference: @date-fns/tz TZDate in the property below).
    ["2026-05-01T15:30:00Z", "Asia/Tokyo", "2026-05-02"], // +09:00: UTC date differs
    ["2026-05-01T14:59:59Z", "Asia/Tokyo", "2026-05-01"],
    ["2026-03-10T11:30:00Z", "Pacific/Auckland", "2026-03-11"], // NZDT +13:00
    ["2026-03-29T00:59:59Z", "Europe/Berlin", "2026-03-29"], // 01:59:59 CET, just before the jump
    ["2026-11-01T04:30:00Z", "America/New_York", "2026-11-01"], // 00:30 EDT
    ["2026-11-01T03:59:59Z", "America/New_York", "2026-10-31"],
  ])("%s in %s → %s", (iso, zone, expected) => {
    expect(localDateOf(new Date(iso), zone)).toBe(expected);
  });

  it("matches @date-fns/tz TZDate + date-fns format for random instants and zones (reference library)", () => {
    fc.assert(
      fc.property(
        fc.integer({ min: Date.UTC(2000, 0, 1), max: Date.UTC(2040, 11, 31) }),
        fc.constantFrom(...ZONES),
        (ms, zone) => {
          expect(localDateOf(new Date(ms), zone)).toBe(format(new TZDate(ms, zone), "yyyy-MM-dd"));
        },
      ),
      { numRuns: 2000 },
    );
  });

  it("matches the reference library minute by minute through DST days, where a remembered day must not reach (reference library)", () => {
    // Transitions from the IANA tz database: Berlin and New York in spring and autumn 2026, Lord
    // Howe's half-hour change, Chatham's +12:45/+13:45, and Santiago, whose clocks skip midnight.
    const days = [
      ["2026-03-28T00:00:00Z", "Europe/Berlin"],
      ["2026-10-24T00:00:00Z", "Europe/Berlin"],
      ["2026-03-07T12:00:00Z", "America/New_York"],
      ["2026-10-31T12:00:00Z", "America/New_York"],
      ["2026-04-04T00:00:00Z", "Australia/Lord_Howe"],
      ["2026-09-26T00:00:00Z", "Pacific/Chatham"],
      ["2026-09-05T12:00:00Z", "America/Santiago"],
    ] as const;
    for (const [start, zone] of days) {
      for (let ms = Date.parse(start); ms < Date.parse(start) + 3 * 86_400_000; ms += 7 * 60_000) {
        expect(localDateOf(new Date(ms), zone)).toBe(format(new TZDate(ms, zone), "yyyy-MM-dd"));
      }
    }
  });

  it("answers repeated calls at one instant from its memo without mixing zones", () => {
    const instant = new Date("2026-05-01T15:30:00Z");
    expect(localDateOf(instant, "Asia/Tokyo")).toBe("2026-05-02");
    expect(localDateOf(instant, "UTC")).toBe("2026-05-01");
    expect(localDateOf(instant, "Asia/Tokyo")).toBe("2026-05-02");
  });

  it("throws on an unknown zone", () => {
    expect(() => localDateOf(new Date(0), "Mars/Olympus_Mons")).toThrow(RangeError);
  });
});

describe("instantOfLocal / endOfLocalDay", () => {
  it("matches TZDate built from wall-clock parts (reference library), across DST days", () => {
    fc.assert(
      fc.property(
        fc.integer({ min: Date.UTC(2000, 0, 1), max: Date.UTC(2040, 11, 31) }).map((ms) => format(new Date(ms), "yyyy-MM-dd")),
        fc.constantFrom(...ZONES),
        (date, zone) => {
          const [y, m, d] = date.split("-").map(Number) as [number, number, number];
          const expected = new TZDate(y, m - 1, d, 12, 0, 0, zone).getTime();
          expect(instantOfLocal(date, { hour: 12, minute: 0, second: 0 }, zone).getTime()).toBe(expected);
          expect(localDateOf(endOfLocalDay(date, zone), zone)).toBe(date);
          expect(localDateOf(new Date(endOfLocalDay(date, zone).getTime() + 1), zone)).not.toBe(date);
        },
      ),
      { numRuns: 1000 },
    );
  });

  it.each([
    // Europe/Berlin: CEST starts 2026-03-29 01:00 UTC, ends 2026-10-25 01:00 UTC (EU rule).
    ["2026-03-29", "Europe/Berlin", "2026-03-29T21:59:59.999Z"],
    ["2026-10-25", "Europe/Berlin", "2026-10-25T22:59:59.999Z"],
    ["2026-05-02", "Asia/Tokyo", "2026-05-02T14:59:59.999Z"],
  ])("end of %s in %s is %s", (date, zone, iso) => {
    expect(endOfLocalDay(date, zone).toISOString()).toBe(iso);
  });
});
