import { z } from "zod";
import { zId, zName, zPageQuery } from "./common";

/** Currencies an offer may be priced in (ISO 4217). Amounts are integers in the minor unit. */
export const CURRENCIES = ["EUR", "USD", "GBP", "CHF", "SEK", "NOK", "DKK", "PLN", "CAD", "AUD", "NZD", "JPY"] as const;
export const PRICE_MIN = 1;
export const PRICE_MAX = 1_000_000;

const zCurrency = z
  .string()
  .trim()
  .toUpperCase()
  .pipe(z.enum(CURRENCIES, { error: `Choose one of ${CURRENCIES.join(", ")}.` }));
const zPriceMinor = z
  .int("Enter a whole number in the currency's smallest unit (e.g. cents).")
  .min(PRICE_MIN, "The price must be at least 1.")
  .max(PRICE_MAX, `The price must be at most ${PRICE_MAX.toLocaleString("en")}.`);
const zIncludes = z.string().trim().max(1000, "Keep it under 1,000 characters.");

export const ZCreateOffer = z.strictObject({
  name: zName,
  priceMinor: zPriceMinor,
  currency: zCurrency,
  includes: zIncludes.default(""),
});
export type CreateOfferInput = z.input<typeof ZCreateOffer>;
export type CreateOffer = z.output<typeof ZCreateOffer>;

export const ZUpdateOffer = z
  .strictObject({
    name: zName.optional(),
    priceMinor: zPriceMinor.optional(),
    currency: zCurrency.optional(),
    includes: zIncludes.optional(),
    archived: z.boolean().optional(),
  })
  .refine((v) => Object.keys(v).length > 0, { message: "Send at least one field to change." });
export type UpdateOffer = z.output<typeof ZUpdateOffer>;

export const ZBillingSettings = z.strictObject({
  graceDays: z.int("Enter a whole number of days.").min(0, "At least 0 days.").max(90, "At most 90 days."),
});
export type BillingSettingsInput = z.output<typeof ZBillingSettings>;

export const SUBSCRIPTION_STATUSES = ["pending", "active", "past_due", "cancelled"] as const;
export type SubscriptionStatus = (typeof SUBSCRIPTION_STATUSES)[number];

export const ZOffer = z.object({
  id: zId,
  name: z.string(),
  priceMinor: z.number().int(),
  currency: z.string(),
  includes: z.string(),
  archived: z.boolean(),
  createdAt: z.string(),
});
export type OfferDto = z.infer<typeof ZOffer>;

export const ZCheckout = z.object({ url: z.url() });

export const ZSubscriber = z.object({
  athleteId: zId,
  athleteName: z.string(),
  offerId: zId,
  offerName: z.string(),
  priceMinor: z.number().int(),
  currency: z.string(),
  status: z.enum(SUBSCRIPTION_STATUSES),
  currentPeriodEnd: z.string().nullable(),
  cancelAtPeriodEnd: z.boolean(),
  lapsedAt: z.string().nullable(),
  /** False once a lapsed athlete is past the grace period: no new plan assignments. */
  canReceiveAssignments: z.boolean(),
});
export type SubscriberDto = z.infer<typeof ZSubscriber>;

/** GET /api/v1/billing/subscribers: a page at a time, by athlete name. */
export const ZSubscribersQuery = zPageQuery;

export const ZRevenue = z.object({
  month: z.string(),
  totals: z.array(z.object({ currency: z.string(), amountMinor: z.number().int(), payments: z.number().int() })),
});
export type RevenueDto = z.infer<typeof ZRevenue>;

export const ZMembership = z.object({
  billingEnabled: z.boolean(),
  testMode: z.boolean(),
  subscription: z
    .object({
      offerId: zId,
      offerName: z.string(),
      priceMinor: z.number().int(),
      currency: z.string(),
      status: z.enum(SUBSCRIPTION_STATUSES),
      nextChargeAt: z.string().nullable(),
      currentPeriodEnd: z.string().nullable(),
      cancelAtPeriodEnd: z.boolean(),
    })
    .nullable(),
});
export type MembershipDto = z.infer<typeof ZMembership>;

export const ZBillingSettingsDto = z.object({ graceDays: z.number().int(), billingEnabled: z.boolean(), testMode: z.boolean() });
export type BillingSettingsDto = z.infer<typeof ZBillingSettingsDto>;

export const ZMembershipPatch = z.strictObject({ cancelAtPeriodEnd: z.boolean() });
