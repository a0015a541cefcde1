import { route } from "@/lib/server/http/route";
import { getAthleteLoad } from "@/lib/server/load/get-athlete-load";
import { ZLoadQuery } from "@/lib/validation/load";

export const GET = route({ can: "load.read", query: ZLoadQuery }, ({ actor, params, query }) => getAthleteLoad(actor, params.id!, query));
