import { startCheckout } from "@/lib/server/billing/start-checkout";
import { route } from "@/lib/server/http/route";

export const POST = route({ can: "billing.subscribe" }, ({ actor, params }) => startCheckout(actor, params.id!));
