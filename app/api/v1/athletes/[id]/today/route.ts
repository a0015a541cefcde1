import { route } from "@/lib/server/http/route";
import { getToday } from "@/lib/server/logs/get-today";
import { ZTodayQuery } from "@/lib/validation/logs";

export const GET = route({ can: "logs.read", query: ZTodayQuery }, ({ actor, params, query }) =>
  getToday(actor, params.id!, query.date),
);
