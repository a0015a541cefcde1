import { route } from "@/lib/server/http/route";
import { createSquad } from "@/lib/server/squads/create-squad";
import { listSquads } from "@/lib/server/squads/list-squads";
import { ZCreateSquad, ZSquadListQuery } from "@/lib/validation/squads";

export const GET = route({ can: "squads.read", query: ZSquadListQuery }, ({ actor, query }) => listSquads(actor, query));

export const POST = route({ can: "squads.write", body: ZCreateSquad, status: 201 }, ({ actor, body }) => createSquad(actor, body));
