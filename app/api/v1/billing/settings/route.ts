import { getBillingSettings } from "@/lib/server/billing/get-billing-settings";
import { updateBillingSettings } from "@/lib/server/billing/update-billing-settings";
import { route } from "@/lib/server/http/route";
import { ZBillingSettings } from "@/lib/validation/billing";

export const GET = route({ can: "billing.manage" }, ({ actor }) => getBillingSettings(actor));

export const PATCH = route({ can: "billing.manage", body: ZBillingSettings }, ({ actor, body }) => updateBillingSettings(actor, body));
