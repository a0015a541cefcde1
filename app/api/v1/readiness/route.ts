import { route } from "@/lib/server/http/route";
import { exportReadiness, wantsCsv } from "@/lib/server/readiness/export-readiness";
import { listReadiness } from "@/lib/server/readiness/list-readiness";
import { ZReadinessQuery } from "@/lib/validation/readiness";

export const GET = route({ can: "readiness.read", query: ZReadinessQuery }, ({ actor, query, request }) =>
  wantsCsv(query, request.headers.get("accept")) ? exportReadiness(actor, query) : listReadiness(actor, query),
);
