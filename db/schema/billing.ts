import { sql } from "drizzle-orm";
import { boolean, check, index, integer, pgTable, text, timestamp, uniqueIndex, uuid } from "drizzle-orm/pg-core";
import { createdAt, id, updatedAt } from "./columns";
import { athletes, teamRef, teams } from "./teams";

/** Team-wide billing settings; a team without a row uses the defaults. */
export const billingSettings = pgTable(
  "billing_settings",
  {
    teamId: uuid("team_id")
      .primaryKey()
      .references(() => teams.id, { onDelete: "cascade" }),
    /** Days a lapsed athlete still receives new plan assignments. */
    graceDays: integer("grace_days").notNull().default(7),
    updatedAt: updatedAt(),
  },
  (t) => [check("billing_settings_grace_range", sql`${t.graceDays} between 0 and 90`)],
);

/** A coaching offer the owner sells monthly. Prices are integers in the currency's minor unit. */
export const billingOffers = pgTable(
  "billing_offers",
  {
    id: id(),
    teamId: teamRef(),
    name: text("name").notNull(),
    priceMinor: integer("price_minor").notNull(),
    currency: text("currency").notNull(),
    includes: text("includes").notNull().default(""),
    archivedAt: timestamp("archived_at", { withTimezone: true }),
    createdAt: createdAt(),
    updatedAt: updatedAt(),
  },
  (t) => [
    index("billing_offers_team_idx").on(t.teamId, t.name),
    check("billing_offers_price_range", sql`${t.priceMinor} between 1 and 1000000`),
    check("billing_offers_currency_code", sql`${t.currency} ~ '^[A-Z]{3}$'`),
  ],
);

/**
 * An athlete's membership: one row per athlete, mirroring the provider's subscription. Status is
 * re-read from the provider on every webhook; `lapsedAt` starts the grace period.
 */
export const billingSubscriptions = pgTable(
  "billing_subscriptions",
  {
    id: id(),
    teamId: teamRef(),
    athleteId: uuid("athlete_id")
      .notNull()
      .references(() => athletes.id, { onDelete: "cascade" }),
    offerId: uuid("offer_id")
      .notNull()
      .references(() => billingOffers.id),
    /** pending (checkout open), active, past_due, cancelled. */
    status: text("status").notNull().default("pending"),
    providerCustomerId: text("provider_customer_id"),
    providerSubscriptionId: text("provider_subscription_id"),
    checkoutSessionId: text("checkout_session_id"),
    currentPeriodEnd: timestamp("current_period_end", { withTimezone: true }),
    cancelAtPeriodEnd: boolean("cancel_at_period_end").notNull().default(false),
    /** When the membership stopped being active; null while active (or never active). */
    lapsedAt: timestamp("lapsed_at", { withTimezone: true }),
    createdAt: createdAt(),
    updatedAt: updatedAt(),
  },
  (t) => [
    uniqueIndex("billing_subscriptions_athlete_key").on(t.athleteId),
    uniqueIndex("billing_subscriptions_provider_key").on(t.providerSubscriptionId),
    index("billing_subscriptions_team_idx").on(t.teamId, t.status),
    check("billing_subscriptions_status", sql`${t.status} in ('pending', 'active', 'past_due', 'cancelled')`),
  ],
);

/** Each paid invoice once, for revenue figures. */
export const billingPayments = pgTable(
  "billing_payments",
  {
    invoiceId: text("invoice_id").primaryKey(),
    teamId: teamRef(),
    subscriptionId: uuid("subscription_id")
      .notNull()
      .references(() => billingSubscriptions.id, { onDelete: "cascade" }),
    amountMinor: integer("amount_minor").notNull(),
    currency: text("currency").notNull(),
    paidAt: timestamp("paid_at", { withTimezone: true }).notNull(),
  },
  (t) => [index("billing_payments_team_paid_idx").on(t.teamId, t.paidAt)],
);

/** Every provider event id handled, so a replayed delivery changes nothing. */
export const billingEvents = pgTable("billing_events", {
  eventId: text("event_id").primaryKey(),
  type: text("type").notNull(),
  receivedAt: createdAt(),
});
