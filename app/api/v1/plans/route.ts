import { route } from "@/lib/server/http/route";
import { createPlan } from "@/lib/server/plans/create-plan";
import { listPlans } from "@/lib/server/plans/list-plans";
import { ZCreatePlan, ZPlanListQuery } from "@/lib/validation/plans";

export const GET = route({ can: "plans.read", query: ZPlanListQuery }, ({ actor, query }) => listPlans(actor, query));

export const POST = route({ can: "plans.write", body: ZCreatePlan, status: 201 }, ({ actor, body }) => createPlan(actor, body));
