import { deleteFormCheck } from "@/lib/server/form-checks/delete-form-check";
import { getFormCheck } from "@/lib/server/form-checks/get-form-check";
import { route } from "@/lib/server/http/route";

export const GET = route({ can: "formChecks.read" }, ({ actor, params }) => getFormCheck(actor, params.id!));

export const DELETE = route({ can: "formChecks.write" }, ({ actor, params }) => deleteFormCheck(actor, params.id!));
