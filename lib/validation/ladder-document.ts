import { z } from "zod";
import { standardIssues, zLabel, zMeasure, zPromotionMode, zRungTag, ZStandardInput, zTargetSkill, zText } from "./ladders";

/**
 * Our own file format for sharing one ladder between teams: `rungwise.ladder` version 1. Rungs carry
 * a local `key`; prerequisites refer to another rung of the same document by key, or to a rung
 * outside it by ladder name + rung name (ids mean nothing in another team).
 * docs/ladder-document.schema.json is generated from this schema (a test keeps them in step).
 */
export const LADDER_DOCUMENT_FORMAT = "rungwise.ladder";
export const LADDER_DOCUMENT_VERSION = 1;

export const ZDocumentPrerequisite = z.union([
  z.strictObject({ rung: z.string().min(1).max(60).describe("Key of a rung in this document") }),
  z.strictObject({
    ladder: zLabel.describe("Name of a ladder outside this document"),
    rung: zLabel.describe("Name of a rung on that ladder"),
  }),
]);
export type DocumentPrerequisite = z.infer<typeof ZDocumentPrerequisite>;

const zKey = z
  .string()
  .regex(/^[a-z0-9][a-z0-9-]{0,59}$/, "Use lower-case letters, digits and dashes (up to 60).");

export const ZDocumentRung = z.strictObject({
  key: zKey.describe("Local to this document; unique among its rungs"),
  name: zLabel,
  measure: zMeasure,
  setting: zText(200).nullable().optional(),
  cues: zText(2000).nullable().optional(),
  caution: zText(500).nullable().optional(),
  demoVideoUrl: z.url({ protocol: /^https?$/ }).max(500).nullable().optional(),
  tags: z.array(zRungTag).max(20).optional(),
  standard: ZStandardInput,
  prerequisites: z.array(ZDocumentPrerequisite).max(20).optional(),
});
export type DocumentRung = z.infer<typeof ZDocumentRung>;

export const ZLadderDocument = z
  .strictObject({
    format: z.literal(LADDER_DOCUMENT_FORMAT),
    version: z.literal(LADDER_DOCUMENT_VERSION),
    ladder: z.strictObject({
      name: zLabel,
      targetSkill: zTargetSkill,
      promotionMode: zPromotionMode,
      notes: zText(2000).nullable().optional(),
    }),
    rungs: z.array(ZDocumentRung).max(50, "At most 50 rungs on a ladder."),
  })
  .superRefine((doc, ctx) => {
    const keys = new Map<string, number>();
    doc.rungs.forEach((rung, i) => {
      if (keys.has(rung.key)) ctx.addIssue({ code: "custom", path: ["rungs", i, "key"], message: `Key "${rung.key}" is used twice.` });
      else keys.set(rung.key, i);
      if (rung.tags && new Set(rung.tags).size !== rung.tags.length) {
        ctx.addIssue({ code: "custom", path: ["rungs", i, "tags"], message: "Each tag once." });
      }
      for (const issue of standardIssues(rung.measure, rung.standard)) {
        ctx.addIssue({ code: "custom", path: ["rungs", i, "standard", ...issue.path], message: issue.message });
      }
    });
    doc.rungs.forEach((rung, i) => {
      (rung.prerequisites ?? []).forEach((ref, j) => {
        if ("ladder" in ref) return;
        const path = ["rungs", i, "prerequisites", j, "rung"];
        if (!keys.has(ref.rung)) ctx.addIssue({ code: "custom", path, message: `No rung with key "${ref.rung}" in this document.` });
        else ctx.addIssue({ code: "custom", path, message: "A prerequisite on the same ladder: ladder order already covers it." });
      });
    });
  })
  .meta({ id: "LadderDocument", title: "Rungwise ladder document, version 1" });
export type LadderDocument = z.infer<typeof ZLadderDocument>;

/**
 * The JSON Schema committed as docs/ladder-document.schema.json; the command that rewrites it is in
 * tests/unit/ladder-document-schema.test.ts. Cross-field rules (unique keys, sessions required ≤
 * window, per-measure limits) live in the zod refinements only.
 */
export function ladderDocumentJsonSchema(): Record<string, unknown> {
  return {
    $id: "https://rungwise.app/schemas/ladder-document-v1.json",
    ...z.toJSONSchema(ZLadderDocument, { io: "input", target: "draft-2020-12" }),
  };
}
