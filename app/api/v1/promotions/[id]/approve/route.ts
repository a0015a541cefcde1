import { route } from "@/lib/server/http/route";
import { approvePromotion } from "@/lib/server/promotions/approve-promotion";

export const POST = route({ can: "promotions.decide" }, ({ actor, params }) => approvePromotion(actor, params.id!));
