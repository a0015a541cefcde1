import { route } from "@/lib/server/http/route";
import { inviteAthlete } from "@/lib/server/invites/invite-athlete";

export const POST = route({ can: "athletes.invite", status: 201 }, ({ actor, params }) => inviteAthlete(actor, params.id!));
