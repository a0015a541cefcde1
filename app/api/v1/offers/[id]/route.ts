import { updateOffer } from "@/lib/server/billing/update-offer";
import { route } from "@/lib/server/http/route";
import { ZUpdateOffer } from "@/lib/validation/billing";

export const PATCH = route({ can: "billing.manage", body: ZUpdateOffer }, ({ actor, params, body }) => updateOffer(actor, params.id!, body));
