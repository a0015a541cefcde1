import { route } from "@/lib/server/http/route";
import { forecastPosition } from "@/lib/server/promotions/forecast-position";

export const GET = route({ can: "positions.read" }, ({ actor, params }) => forecastPosition(actor, params.id!, params.ladderId!));
