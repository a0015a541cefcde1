import { route } from "@/lib/server/http/route";
import { idempotencyKeyOf } from "@/lib/server/http/idempotency";
import { createLog } from "@/lib/server/logs/create-log";
import { LOG_MAX_BODY_BYTES, ZCreateLog } from "@/lib/validation/logs";

export const POST = route({ can: "logs.write", body: ZCreateLog, maxBodyBytes: LOG_MAX_BODY_BYTES, confirmsActor: true }, ({ actor, body, request }) =>
  createLog(actor, idempotencyKeyOf(request), body),
);
