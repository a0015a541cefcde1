import { route } from "@/lib/server/http/route";
import { deleteSquad } from "@/lib/server/squads/delete-squad";
import { getSquad } from "@/lib/server/squads/get-squad";
import { updateSquad } from "@/lib/server/squads/update-squad";
import { ZUpdateSquad } from "@/lib/validation/squads";

export const GET = route({ can: "squads.read" }, ({ actor, params }) => getSquad(actor, params.id!));

export const PATCH = route({ can: "squads.write", body: ZUpdateSquad }, ({ actor, params, body }) => updateSquad(actor, params.id!, body));

export const DELETE = route({ can: "squads.write" }, ({ actor, params }) => deleteSquad(actor, params.id!));
