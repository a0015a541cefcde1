import { route } from "@/lib/server/http/route";
import { listPromotions } from "@/lib/server/promotions/list-promotions";
import { ZPromotionListQuery } from "@/lib/validation/promotions";

export const GET = route({ can: "promotions.read", query: ZPromotionListQuery }, ({ actor, query }) => listPromotions(actor, query));
