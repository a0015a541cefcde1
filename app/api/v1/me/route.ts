import { route } from "@/lib/server/http/route";

export const GET = route({ can: "me.read" }, async ({ actor }) => ({
  id: actor.userId,
  email: actor.email,
  name: actor.name,
  role: actor.role,
  teamId: actor.teamId,
  athleteId: actor.athleteId,
  timeZone: actor.timeZone,
}));
