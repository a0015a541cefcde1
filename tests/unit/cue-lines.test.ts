import { describe, expect, it } from "vitest";
import { cueLines } from "@/lib/cue-lines";

describe("cueLines", () => {
  it("splits cues written one per line, trimming and dropping blank lines", () => {
    expect(cueLines("Set the grip first\r\n  Pull to the ribs \n\nKeep the grip\n")).toEqual(["Set the grip first", "Pull to the ribs", "Keep the grip"]);
  });

  it("has no lines for missing or blank cues", () => {
    expect(cueLines(null)).toEqual([]);
    expect(cueLines("  \n ")).toEqual([]);
  });
});
