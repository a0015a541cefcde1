import { route } from "@/lib/server/http/route";
import { enqueueWeekDigests } from "@/lib/server/notifications/enqueue-week-digests";
import { ZDigestRunQuery } from "@/lib/validation/notifications";

export const POST = route({ can: "digests.run", query: ZDigestRunQuery, status: 202 }, ({ actor, query }) =>
  enqueueWeekDigests(actor, query.week),
);
