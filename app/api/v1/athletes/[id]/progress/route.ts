import { route } from "@/lib/server/http/route";
import { getAthleteProgress } from "@/lib/server/progress/get-athlete-progress";

export const GET = route({ can: "positions.read" }, ({ actor, params }) => getAthleteProgress(actor, params.id!));
