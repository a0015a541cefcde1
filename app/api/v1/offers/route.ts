import { createOffer } from "@/lib/server/billing/create-offer";
import { listOffers } from "@/lib/server/billing/list-offers";
import { route } from "@/lib/server/http/route";
import { ZCreateOffer } from "@/lib/validation/billing";

export const GET = route({ can: "billing.read" }, ({ actor }) => listOffers(actor));

export const POST = route({ can: "billing.manage", body: ZCreateOffer, status: 201 }, ({ actor, body }) => createOffer(actor, body));
