import { parse } from "csv-parse/sync";
import { describe, expect, it } from "vitest";
import { csvField, readinessCsv } from "@/lib/server/readiness/readiness-csv";

// RFC 4180 §2: fields with commas, quotes or line breaks are enclosed in double quotes, and a quote
// inside is written twice. csv-parse (reference library) reads the text back.
describe("readiness CSV", () => {
  it("quotes only the fields that need it", () => {
    expect(csvField("plain")).toBe("plain");
    expect(csvField('Quinn, Ana "Ace"')).toBe('"Quinn, Ana ""Ace"""');
    expect(csvField("two\nlines")).toBe('"two\nlines"');
    expect(csvField(null)).toBe("");
    expect(csvField(42)).toBe("42");
  });

  it("round-trips awkward names and keeps a formula sign from running in a spreadsheet", () => {
    const text = readinessCsv("2026-W49", [
      { athleteId: "a1", athleteName: 'Quinn, Ana "Ace"', ladders: [] },
      // OWASP "CSV injection": a leading = + - @ is prefixed with an apostrophe.
      { athleteId: "a2", athleteName: "=HYPERLINK(\"x\")", ladders: [] },
    ]);
    expect(text.endsWith("\r\n")).toBe(true);
    const rows = parse(text, { columns: true }) as Record<string, string>[];
    expect(rows.map((r) => r.athlete)).toEqual(['Quinn, Ana "Ace"', "'=HYPERLINK(\"x\")"]);
    expect(rows[0]!.ladder).toBe("");
  });
});
