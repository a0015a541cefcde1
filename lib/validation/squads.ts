import { z } from "zod";
import { zId, zName, zPageQuery } from "./common";

const zDescription = z.string().trim().max(500, "Keep it under 500 characters.");

/** Member ids of a squad; each must be an athlete of the team (checked in the operation, 422 by index). */
export const zAthleteIds = z
  .array(zId)
  .max(500, "A squad holds at most 500 athletes.")
  .superRefine((ids, ctx) => {
    const seen = new Set<string>();
    ids.forEach((id, index) => {
      if (seen.has(id)) ctx.addIssue({ code: "custom", path: [index], message: "This athlete is already in the list." });
      seen.add(id);
    });
  });

export const ZCreateSquad = z.strictObject({
  name: zName,
  description: zDescription.optional(),
  athleteIds: zAthleteIds.optional(),
});
export type CreateSquadInput = z.infer<typeof ZCreateSquad>;

export const ZUpdateSquad = z
  .strictObject({
    name: zName.optional(),
    description: zDescription.nullable().optional(),
  })
  .refine((v) => Object.keys(v).length > 0, { message: "Send at least one field to change." });
export type UpdateSquadInput = z.infer<typeof ZUpdateSquad>;

export const ZSquadMembers = z.strictObject({ athleteIds: zAthleteIds });
export type SquadMembersInput = z.infer<typeof ZSquadMembers>;

export const ZSquadListQuery = zPageQuery;

export const ZSquad = z.object({
  id: zId,
  name: z.string(),
  description: z.string().nullable(),
  memberCount: z.number().int(),
  members: z.array(z.object({ id: zId, name: z.string() })),
  createdAt: z.string(),
});
export type SquadDto = z.infer<typeof ZSquad>;
