import { NotFound } from "@/lib/errors";
import { route } from "@/lib/server/http/route";
import { getToday } from "@/lib/server/logs/get-today";
import { ZTodayQuery } from "@/lib/validation/logs";

export const GET = route({ can: "logs.read", query: ZTodayQuery }, async ({ actor, query }) => {
  if (!actor.athleteId) throw new NotFound("athlete record for this account");
  return getToday(actor, actor.athleteId, query.date);
});
