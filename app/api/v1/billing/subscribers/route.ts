import { listSubscribers } from "@/lib/server/billing/list-subscribers";
import { route } from "@/lib/server/http/route";
import { ZSubscribersQuery } from "@/lib/validation/billing";

export const GET = route({ can: "billing.manage", query: ZSubscribersQuery }, ({ actor, query }) => listSubscribers(actor, query));
