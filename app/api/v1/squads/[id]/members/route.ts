import { route } from "@/lib/server/http/route";
import { setSquadMembers } from "@/lib/server/squads/set-squad-members";
import { ZSquadMembers } from "@/lib/validation/squads";

export const PUT = route({ can: "squads.write", body: ZSquadMembers }, ({ actor, params, body }) => setSquadMembers(actor, params.id!, body));
