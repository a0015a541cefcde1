import { listSubscribers } from "@/lib/server/billing/list-subscribers";
import { route } from "@/lib/server/http/route";

export const GET = route({ can: "billing.manage" }, ({ actor }) => listSubscribers(actor));
