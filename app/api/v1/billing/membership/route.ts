import { getMembership } from "@/lib/server/billing/get-membership";
import { setCancelAtPeriodEnd } from "@/lib/server/billing/set-cancel-at-period-end";
import { route } from "@/lib/server/http/route";
import { ZMembershipPatch } from "@/lib/validation/billing";

export const GET = route({ can: "billing.subscribe" }, ({ actor }) => getMembership(actor));

export const PATCH = route({ can: "billing.subscribe", body: ZMembershipPatch }, ({ actor, body }) =>
  setCancelAtPeriodEnd(actor, body.cancelAtPeriodEnd),
);
