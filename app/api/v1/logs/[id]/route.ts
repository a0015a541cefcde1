import { route } from "@/lib/server/http/route";
import { deleteLog } from "@/lib/server/logs/delete-log";
import { updateLog } from "@/lib/server/logs/update-log";
import { LOG_MAX_BODY_BYTES, ZUpdateLog } from "@/lib/validation/logs";

export const PATCH = route({ can: "logs.write", body: ZUpdateLog, maxBodyBytes: LOG_MAX_BODY_BYTES }, ({ actor, params, body }) =>
  updateLog(actor, params.id!, body),
);

export const DELETE = route({ can: "logs.write" }, ({ actor, params }) => deleteLog(actor, params.id!));
