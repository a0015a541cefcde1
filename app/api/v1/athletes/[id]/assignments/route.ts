import { createAthleteAssignment } from "@/lib/server/assignments/create-athlete-assignment";
import { listAssignments } from "@/lib/server/assignments/list-assignments";
import { route } from "@/lib/server/http/route";
import { ZAssignmentListQuery, ZCreateAssignment } from "@/lib/validation/plans";

// Athletes may read their own assignments (scoped in the query); only staff assign.
export const GET = route({ can: "plans.read", query: ZAssignmentListQuery }, ({ actor, params, query }) =>
  listAssignments(actor, params.id!, query),
);

export const POST = route({ can: "assignments.write", body: ZCreateAssignment, status: 201 }, ({ actor, params, body }) =>
  createAthleteAssignment(actor, params.id!, body),
);
