import { route } from "@/lib/server/http/route";
import { placeAthlete } from "@/lib/server/positions/place-athlete";
import { ZPlacement } from "@/lib/validation/ladders";

export const PUT = route({ can: "positions.write", body: ZPlacement }, ({ actor, params, body }) =>
  placeAthlete(actor, params.id!, params.ladderId!, body),
);
