import { getAthlete } from "@/lib/server/athletes/get-athlete";
import { updateAthlete } from "@/lib/server/athletes/update-athlete";
import { route } from "@/lib/server/http/route";
import { ZUpdateAthlete } from "@/lib/validation/athletes";

export const GET = route({ can: "athletes.read" }, ({ actor, params }) => getAthlete(actor, params.id!));

export const PATCH = route({ can: "athletes.write", body: ZUpdateAthlete }, ({ actor, params, body }) =>
  updateAthlete(actor, params.id!, body),
);
