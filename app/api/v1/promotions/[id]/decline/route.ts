import { route } from "@/lib/server/http/route";
import { declinePromotion } from "@/lib/server/promotions/decline-promotion";

export const POST = route({ can: "promotions.decide" }, ({ actor, params }) => declinePromotion(actor, params.id!));
