import { route } from "@/lib/server/http/route";
import { deletePlan } from "@/lib/server/plans/delete-plan";
import { getPlan } from "@/lib/server/plans/get-plan";
import { updatePlan } from "@/lib/server/plans/update-plan";
import { ZUpdatePlan } from "@/lib/validation/plans";

export const GET = route({ can: "plans.read" }, ({ actor, params }) => getPlan(actor, params.id!));

export const PATCH = route({ can: "plans.write", body: ZUpdatePlan }, ({ actor, params, body }) => updatePlan(actor, params.id!, body));

export const DELETE = route({ can: "plans.write" }, ({ actor, params }) => deletePlan(actor, params.id!));
