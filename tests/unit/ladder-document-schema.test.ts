import fs from "node:fs";
import path from "node:path";
import { describe, expect, it } from "vitest";
import { ladderDocumentJsonSchema, ZLadderDocument } from "@/lib/validation/ladder-document";

// Rewrite after changing the document schema:
// npx tsx -e 'import("./lib/validation/ladder-document.ts").then(m => require("fs").writeFileSync("docs/ladder-document.schema.json", JSON.stringify(m.ladderDocumentJsonSchema(), null, 2) + "\n"))'
const FILE = path.resolve(import.meta.dirname, "../../docs/ladder-document.schema.json");

describe("the ladder document's JSON Schema", () => {
  it("matches the zod schema the import endpoint validates with", () => {
    const committed: unknown = JSON.parse(fs.readFileSync(FILE, "utf8"));
    expect(committed).toEqual(ladderDocumentJsonSchema());
  });

  it("closes every object (unknown fields are refused, as in the endpoint)", () => {
    const text = fs.readFileSync(FILE, "utf8");
    const objects = (text.match(/"type": "object"/g) ?? []).length;
    const closed = (text.match(/"additionalProperties": false/g) ?? []).length;
    expect(objects).toBeGreaterThan(3);
    expect(closed).toBe(objects);
  });

  it("accepts a minimal valid document and refuses an in-document prerequisite on the same ladder", () => {
    const standard = { sets: 3, minValue: 20, sessionsRequired: 2, sessionsWindow: 3, minDaysOnRung: 7, painFree: true };
    const doc = {
      format: "rungwise.ladder",
      version: 1,
      ladder: { name: "Press", targetSkill: "Press to handstand", promotionMode: "auto" },
      rungs: [
        { key: "a", name: "A", measure: "hold_seconds", standard },
        { key: "b", name: "B", measure: "reps", standard: { ...standard, minValue: 8 }, prerequisites: [{ ladder: "Rings", rung: "Support" }] },
      ],
    };
    expect(ZLadderDocument.safeParse(doc).success).toBe(true);
    const bad = ZLadderDocument.safeParse({ ...doc, rungs: [doc.rungs[0], { ...doc.rungs[1], prerequisites: [{ rung: "a" }] }] });
    expect(bad.success).toBe(false);
    expect(bad.error?.issues.map((i) => i.path.join("."))).toEqual(["rungs.1.prerequisites.0.rung"]);
  });
});
