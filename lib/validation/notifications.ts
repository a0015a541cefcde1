import { z } from "zod";

export const ZNotificationPreferences = z.strictObject({
  promotionNotices: z.boolean(),
  approvalNotices: z.boolean(),
  weeklyDigest: z.boolean(),
  digestWeekday: z.number().int().min(1, "Choose a weekday.").max(7, "Choose a weekday."),
  digestHour: z.number().int().min(0, "Choose an hour from 0 to 23.").max(23, "Choose an hour from 0 to 23."),
  athleteSummary: z.boolean(),
});
export type NotificationPreferencesInput = z.infer<typeof ZNotificationPreferences>;

export const ZIsoWeek = z.string().regex(/^\d{4}-W\d{2}$/, "Use an ISO week like 2026-W49.");

export const ZDigestPreview = z.strictObject({ week: ZIsoWeek });
export const ZDigestRunQuery = z.strictObject({ week: ZIsoWeek });

/** Which kinds of mail a person can turn off (security mail cannot be). */
export const OPTIONAL_MAIL_KINDS = ["promotion", "approval_needed", "digest", "athlete_summary"] as const;
export type OptionalMailKind = (typeof OPTIONAL_MAIL_KINDS)[number];

export const WEEKDAYS = ["Monday", "Tuesday", "Wednesday", "Thursday", "Friday", "Saturday", "Sunday"] as const;
