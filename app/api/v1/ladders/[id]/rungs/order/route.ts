import { route } from "@/lib/server/http/route";
import { reorderRungs } from "@/lib/server/ladders/reorder-rungs";
import { ZRungOrder } from "@/lib/validation/ladders";

export const PUT = route({ can: "ladders.write", body: ZRungOrder }, ({ actor, params, body }) =>
  reorderRungs(actor, params.id!, body.rungIds),
);
