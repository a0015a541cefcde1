import { route } from "@/lib/server/http/route";
import { listAthleteLogs } from "@/lib/server/logs/list-athlete-logs";
import { ZLogsQuery } from "@/lib/validation/logs";

export const GET = route({ can: "logs.read", query: ZLogsQuery }, ({ actor, params, query }) =>
  listAthleteLogs(actor, params.id!, query),
);
