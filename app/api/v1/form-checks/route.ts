import { createFormCheck } from "@/lib/server/form-checks/create-form-check";
import { listFormChecks } from "@/lib/server/form-checks/list-form-checks";
import { route } from "@/lib/server/http/route";
import { POSTER_MAX_CHARS, ZCreateFormCheck, ZFormCheckListQuery } from "@/lib/validation/form-checks";

export const GET = route({ can: "formChecks.read", query: ZFormCheckListQuery }, ({ actor, query }) =>
  listFormChecks(actor, query),
);

export const POST = route(
  { can: "formChecks.write", body: ZCreateFormCheck, status: 201, maxBodyBytes: POSTER_MAX_CHARS + 8 * 1024 },
  ({ actor, body }) => createFormCheck(actor, body),
);
