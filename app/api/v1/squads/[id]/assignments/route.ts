import { createSquadAssignments } from "@/lib/server/assignments/create-squad-assignments";
import { route } from "@/lib/server/http/route";
import { ZCreateAssignment } from "@/lib/validation/plans";

export const POST = route({ can: "assignments.write", body: ZCreateAssignment, status: 201 }, ({ actor, params, body }) =>
  createSquadAssignments(actor, params.id!, body),
);
