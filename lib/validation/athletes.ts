import { z } from "zod";
import { zEmail, zId, zName, zPageQuery } from "./common";

export const ZCreateAthlete = z
  .strictObject({
    name: zName,
    email: zEmail.optional(),
    primaryCoachId: zId.optional(),
    invite: z.boolean().optional(),
    notes: z.string().trim().max(2000).optional(),
  })
  .refine((v) => !v.invite || v.email, { path: ["email"], message: "An invite needs an e-mail address." });
export type CreateAthleteInput = z.infer<typeof ZCreateAthlete>;

export const ZUpdateAthlete = z
  .strictObject({
    name: zName.optional(),
    email: zEmail.nullable().optional(),
    primaryCoachId: zId.nullable().optional(),
    notes: z.string().trim().max(2000).nullable().optional(),
    archived: z.boolean().optional(),
  })
  .refine((v) => Object.keys(v).length > 0, { message: "Send at least one field to change." });
export type UpdateAthleteInput = z.infer<typeof ZUpdateAthlete>;

export const ZAthleteListQuery = zPageQuery.extend({
  q: z.string().trim().max(100).optional(),
  mine: z.stringbool().optional(),
  archived: z.stringbool().optional(),
});

export const ZAthlete = z.object({
  id: zId,
  name: z.string(),
  email: z.string().nullable(),
  primaryCoachId: zId.nullable(),
  primaryCoachName: z.string().nullable(),
  hasAccount: z.boolean(),
  invitePending: z.boolean(),
  notes: z.string().nullable(),
  archived: z.boolean(),
  createdAt: z.string(),
});
export type AthleteDto = z.infer<typeof ZAthlete>;
