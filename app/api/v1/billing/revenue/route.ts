import { revenueThisMonth } from "@/lib/server/billing/revenue-this-month";
import { route } from "@/lib/server/http/route";

export const GET = route({ can: "billing.manage" }, ({ actor }) => revenueThisMonth(actor));
