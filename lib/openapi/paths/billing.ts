import type { OpenAPIRegistry } from "@asteasolutions/zod-to-openapi";
import {
  ZBillingSettings,
  ZBillingSettingsDto,
  ZCheckout,
  ZCreateOffer,
  ZMembership,
  ZMembershipPatch,
  ZOffer,
  ZRevenue,
  ZSubscriber,
  ZSubscribersQuery,
  ZUpdateOffer,
} from "@/lib/validation/billing";
import { defineOperation, pageOf, zIdParam } from "../define";

/** Coaching offers, checkout, memberships and the owner's billing figures. */
export function registerBillingPaths(registry: OpenAPIRegistry): void {
  const tag = "Billing";
  defineOperation(registry, { method: "get", path: "/api/v1/offers", tag, summary: "The team's coaching offers by name (athletes see live ones only)", ok: { status: 200, schema: pageOf(ZOffer) } });
  defineOperation(registry, {
    method: "post",
    path: "/api/v1/offers",
    tag,
    summary: "Create a monthly offer (owner). `priceMinor` is an integer in the currency's minor unit, 1–1,000,000",
    body: ZCreateOffer,
    ok: { status: 201, schema: ZOffer },
  });
  defineOperation(registry, {
    method: "patch",
    path: "/api/v1/offers/{id}",
    tag,
    summary: "Change or archive an offer (owner); running memberships are not touched",
    params: zIdParam,
    body: ZUpdateOffer,
    ok: { status: 200, schema: ZOffer },
    errors: [404],
  });
  defineOperation(registry, {
    method: "post",
    path: "/api/v1/offers/{id}/checkout",
    tag,
    summary: "Start the provider's hosted checkout for the signed-in athlete; 404 for another team's offer, 409 when already active, 503 when the provider does not answer",
    params: zIdParam,
    ok: { status: 200, schema: ZCheckout },
    errors: [404, 409, 503],
  });
  defineOperation(registry, {
    method: "get",
    path: "/api/v1/billing/subscribers",
    tag,
    summary: "The team's memberships by athlete name, a page at a time, with status and whether new plans can still be assigned (owner)",
    query: ZSubscribersQuery,
    ok: { status: 200, schema: pageOf(ZSubscriber) },
  });
  defineOperation(registry, { method: "get", path: "/api/v1/billing/revenue", tag, summary: "Paid this calendar month (team time zone), per currency (owner)", ok: { status: 200, schema: ZRevenue } });
  defineOperation(registry, { method: "get", path: "/api/v1/billing/settings", tag, summary: "Grace period and whether payments are set up (owner)", ok: { status: 200, schema: ZBillingSettingsDto } });
  defineOperation(registry, {
    method: "patch",
    path: "/api/v1/billing/settings",
    tag,
    summary: "Set the grace period (days a lapsed athlete still receives new plans), 0–90 (owner)",
    body: ZBillingSettings,
    ok: { status: 200, schema: ZBillingSettingsDto },
  });
  defineOperation(registry, { method: "get", path: "/api/v1/billing/membership", tag, summary: "The signed-in athlete's membership and next charge date", ok: { status: 200, schema: ZMembership } });
  defineOperation(registry, {
    method: "patch",
    path: "/api/v1/billing/membership",
    tag,
    summary: "Cancel at the end of the paid period, or take the cancellation back (athlete); 503 when the provider does not answer",
    body: ZMembershipPatch,
    ok: { status: 200, schema: ZMembership },
    errors: [404, 409, 503],
  });
}
