import { route } from "@/lib/server/http/route";
import { listPositions } from "@/lib/server/positions/list-positions";

export const GET = route({ can: "positions.read" }, ({ actor, params }) => listPositions(actor, params.id!));
