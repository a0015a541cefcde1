import { route } from "@/lib/server/http/route";
import { getPositionVerdict } from "@/lib/server/promotions/get-position-verdict";

export const GET = route({ can: "positions.read" }, ({ actor, params }) =>
  getPositionVerdict(actor, { athleteId: params.id!, ladderId: params.ladderId! }),
);
