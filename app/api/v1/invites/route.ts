import { route } from "@/lib/server/http/route";
import { inviteCoach } from "@/lib/server/invites/invite-coach";
import { ZInviteCoach } from "@/lib/validation/auth";

export const POST = route({ can: "coaches.invite", body: ZInviteCoach, status: 201 }, ({ actor, body }) =>
  inviteCoach(actor, body.email),
);
